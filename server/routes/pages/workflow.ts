import { Router } from 'express';
import {
  FlagResolveSchema,
  PageCommentSchema,
  ScheduleSchema,
  SendBackSchema,
  StatementSignoffSchema,
} from '@shared/schemas/page.ts';
import { currentUser } from '../../middlewares/authenticate.ts';
import { validate } from '../../middlewares/validate.ts';
import { PageComment, PageRevision, User } from '../../models/index.ts';
import { authorize } from '../../policies/index.ts';
import { loadPageDetail } from '../../services/pages/page-detail.ts';
import { publishPage, schedulePublish, unpublishPage } from '../../services/pages/page-publish.ts';
import { resolveNumberFlag, signOffPage, signOffStatement } from '../../services/pages/page-signoff.ts';
import { currentApprovalProblems, sendBackPage, submitPage } from '../../services/pages/page-workflow.ts';
import { recordAudit } from '../../services/audit.ts';
import { loadPage } from '../load.ts';

/** Workflow steps on one page (mounted under /api/pages/:id). Each answers with the page as it is now. */
export const workflowRouter = Router({ mergeParams: true });

const pageId = (req: { params: Record<string, string | string[]> }) => req.params.id;

async function detail(req: Parameters<Parameters<typeof workflowRouter.get>[1]>[0], id: string) {
  return loadPageDetail(await loadPage(id), currentUser(req));
}

workflowRouter.post('/submit', async (req, res) => {
  const viewer = currentUser(req);
  const page = await loadPage(pageId(req));
  authorize(viewer, 'page', 'submit', page);
  const version = typeof req.body?.version === 'number' ? (req.body.version as number) : undefined;
  await submitPage(page.id, version, viewer);
  res.json({ data: await detail(req, page.id) });
});

workflowRouter.post('/send-back', validate(SendBackSchema), async (req, res) => {
  const viewer = currentUser(req);
  const page = await loadPage(pageId(req));
  authorize(viewer, 'page', 'review', page);
  await sendBackPage(page.id, req.body.comment, viewer);
  res.json({ data: await detail(req, page.id) });
});

workflowRouter.get('/approval-problems', async (req, res) => {
  const viewer = currentUser(req);
  const page = await loadPage(pageId(req));
  authorize(viewer, 'page', 'read', page);
  res.json({ data: { problems: await currentApprovalProblems(page) } });
});

workflowRouter.post('/signoffs/statements', validate(StatementSignoffSchema), async (req, res) => {
  const viewer = currentUser(req);
  const page = await loadPage(pageId(req));
  authorize(viewer, 'page', 'review', page);
  await signOffStatement(page.id, req.body.statementId, viewer);
  res.json({ data: await detail(req, page.id) });
});

workflowRouter.post('/signoffs/page', async (req, res) => {
  const viewer = currentUser(req);
  const page = await loadPage(pageId(req));
  authorize(viewer, 'page', 'review', page);
  await signOffPage(page.id, viewer);
  res.json({ data: await detail(req, page.id) });
});

workflowRouter.post('/flags', validate(FlagResolveSchema), async (req, res) => {
  const viewer = currentUser(req);
  const page = await loadPage(pageId(req));
  authorize(viewer, 'page', 'review', page);
  const { text, reason } = req.body;
  await resolveNumberFlag(page.id, text, reason, viewer);
  res.json({ data: await detail(req, page.id) });
});

workflowRouter.post('/publish', async (req, res) => {
  const viewer = currentUser(req);
  const page = await loadPage(pageId(req));
  authorize(viewer, 'page', 'publish', page);
  await publishPage(page.id, viewer);
  res.json({ data: await detail(req, page.id) });
});

workflowRouter.post('/unpublish', async (req, res) => {
  const viewer = currentUser(req);
  const page = await loadPage(pageId(req));
  authorize(viewer, 'page', 'publish', page);
  await unpublishPage(page.id, viewer);
  res.json({ data: await detail(req, page.id) });
});

workflowRouter.put('/schedule', validate(ScheduleSchema), async (req, res) => {
  const viewer = currentUser(req);
  const page = await loadPage(pageId(req));
  authorize(viewer, 'page', 'publish', page);
  const at = req.body.at;
  await schedulePublish(page.id, at ? new Date(at) : null, viewer);
  res.json({ data: await detail(req, page.id) });
});

workflowRouter.get('/comments', async (req, res) => {
  const viewer = currentUser(req);
  const page = await loadPage(pageId(req));
  authorize(viewer, 'page', 'read', page);
  const comments = await PageComment.findAll({
    where: { pageId: page.id },
    include: [{ model: User, as: 'author', attributes: ['name'] }],
    order: [['createdAt', 'ASC']],
  });
  res.json({
    data: comments.map((c) => ({
      id: c.id,
      body: c.body,
      author: c.author?.name ?? null,
      revisionNumber: c.revisionNumber,
      createdAt: c.createdAt.toISOString(),
    })),
  });
});

workflowRouter.post('/comments', validate(PageCommentSchema), async (req, res) => {
  const viewer = currentUser(req);
  const page = await loadPage(pageId(req));
  authorize(viewer, 'page', 'comment', page);
  const revision = await PageRevision.findByPk(page.currentRevisionId!, { attributes: ['number'] });
  const comment = await PageComment.create({
    pageId: page.id,
    revisionNumber: revision?.number ?? null,
    authorId: viewer.id,
    body: req.body.body,
  });
  await recordAudit({
    actorId: viewer.id,
    action: 'page.commented',
    subjectType: 'page',
    subjectId: page.id,
    data: { commentId: comment.id },
  });
  res.status(201).json({
    data: {
      id: comment.id,
      body: comment.body,
      author: viewer.name,
      revisionNumber: comment.revisionNumber,
      createdAt: comment.createdAt.toISOString(),
    },
  });
});
