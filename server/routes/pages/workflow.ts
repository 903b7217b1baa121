import { Router } from 'express';
import {
  FlagResolveSchema,
  PageCommentSchema,
  PageReasonSchema,
  PageSubmitSchema,
  ScheduleSchema,
  SendBackSchema,
  StatementSignoffSchema,
} from '@shared/schemas/page.ts';
import { currentUser } from '../../middlewares/authenticate.ts';
import { validate } from '../../middlewares/validate.ts';
import { authorize } from '../../policies/index.ts';
import { presentPageComment } from '../../presenters/page-comment.ts';
import {
  addPageComment,
  archivePage,
  restorePage,
  listPageComments,
  loadPageDetail,
  publishPage,
  schedulePublish,
  unpublishPage,
  resolveNumberFlag,
  signOffPage,
  signOffStatement,
  currentApprovalProblems,
  sendBackPage,
  submitPage,
  withdrawPage,
} from '../../services/pages/index.ts';
import { loadPage, parentParam } from '../load.ts';

/** Workflow steps on one page (mounted under /api/pages/:id). Each answers with the page as it is now. */
export const workflowRouter = Router({ mergeParams: true });

async function detail(req: Parameters<Parameters<typeof workflowRouter.get>[1]>[0], id: string) {
  return loadPageDetail(await loadPage(id), currentUser(req));
}

workflowRouter.post('/submit', validate(PageSubmitSchema), async (req, res) => {
  const viewer = currentUser(req);
  const page = await loadPage(parentParam(req, 'id'));
  authorize(viewer, 'page', 'submit', page);
  const { version, flagNotes } = req.body;
  await submitPage(page.id, version, viewer, flagNotes);
  res.json({ data: await detail(req, page.id) });
});

workflowRouter.post('/withdraw', async (req, res) => {
  const viewer = currentUser(req);
  const page = await loadPage(parentParam(req, 'id'));
  authorize(viewer, 'page', 'submit', page);
  await withdrawPage(page.id, viewer);
  res.json({ data: await detail(req, page.id) });
});

workflowRouter.post('/send-back', validate(SendBackSchema), async (req, res) => {
  const viewer = currentUser(req);
  const page = await loadPage(parentParam(req, 'id'));
  authorize(viewer, 'page', 'review', page);
  await sendBackPage(page.id, req.body.comment, viewer);
  res.json({ data: await detail(req, page.id) });
});

workflowRouter.get('/approval-problems', async (req, res) => {
  const viewer = currentUser(req);
  const page = await loadPage(parentParam(req, 'id'));
  authorize(viewer, 'page', 'read', page);
  res.json({ data: { problems: await currentApprovalProblems(page) } });
});

workflowRouter.post('/signoffs/statements', validate(StatementSignoffSchema), async (req, res) => {
  const viewer = currentUser(req);
  const page = await loadPage(parentParam(req, 'id'));
  authorize(viewer, 'page', 'review', page);
  await signOffStatement(page.id, req.body.statementId, viewer);
  res.json({ data: await detail(req, page.id) });
});

workflowRouter.post('/signoffs/page', async (req, res) => {
  const viewer = currentUser(req);
  const page = await loadPage(parentParam(req, 'id'));
  authorize(viewer, 'page', 'review', page);
  await signOffPage(page.id, viewer);
  res.json({ data: await detail(req, page.id) });
});

workflowRouter.post('/flags', validate(FlagResolveSchema), async (req, res) => {
  const viewer = currentUser(req);
  const page = await loadPage(parentParam(req, 'id'));
  authorize(viewer, 'page', 'review', page);
  const { text, reason } = req.body;
  await resolveNumberFlag(page.id, text, reason, viewer);
  res.json({ data: await detail(req, page.id) });
});

workflowRouter.post('/publish', async (req, res) => {
  const viewer = currentUser(req);
  const page = await loadPage(parentParam(req, 'id'));
  authorize(viewer, 'page', 'publish', page);
  await publishPage(page.id, viewer);
  res.json({ data: await detail(req, page.id) });
});

workflowRouter.post('/unpublish', async (req, res) => {
  const viewer = currentUser(req);
  const page = await loadPage(parentParam(req, 'id'));
  authorize(viewer, 'page', 'publish', page);
  await unpublishPage(page.id, viewer);
  res.json({ data: await detail(req, page.id) });
});

workflowRouter.put('/schedule', validate(ScheduleSchema), async (req, res) => {
  const viewer = currentUser(req);
  const page = await loadPage(parentParam(req, 'id'));
  authorize(viewer, 'page', 'publish', page);
  const at = req.body.at;
  await schedulePublish(page.id, at ? new Date(at) : null, viewer);
  res.json({ data: await detail(req, page.id) });
});

workflowRouter.get('/comments', async (req, res) => {
  const viewer = currentUser(req);
  const page = await loadPage(parentParam(req, 'id'));
  authorize(viewer, 'page', 'read', page);
  res.json({ data: (await listPageComments(page)).map(presentPageComment) });
});

workflowRouter.post('/comments', validate(PageCommentSchema), async (req, res) => {
  const viewer = currentUser(req);
  const page = await loadPage(parentParam(req, 'id'));
  authorize(viewer, 'page', 'comment', page);
  res.status(201).json({ data: presentPageComment(await addPageComment(page, req.body.body, viewer)) });
});

/** Hides the page from the desk's lists and every public output (a live page is taken down). */
workflowRouter.post('/archive', validate(PageReasonSchema), async (req, res) => {
  const viewer = currentUser(req);
  const page = await loadPage(parentParam(req, 'id'));
  authorize(viewer, 'page', 'archive', page);
  await archivePage(page.id, req.body.reason, viewer);
  res.json({ data: await detail(req, page.id) });
});

/** Brings an archived page back to the desk; it goes live again only when an editor publishes it. */
workflowRouter.post('/restore', validate(PageReasonSchema), async (req, res) => {
  const viewer = currentUser(req);
  const page = await loadPage(parentParam(req, 'id'));
  authorize(viewer, 'page', 'restore', page);
  await restorePage(page.id, req.body.reason, viewer);
  res.json({ data: await detail(req, page.id) });
});
