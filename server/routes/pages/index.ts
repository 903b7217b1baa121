import { Router } from 'express';
import type { JSONContent } from '@tiptap/core';
import { validateDoc } from '@shared/editor/schema.ts';
import {
  DigestSchema,
  docBytes,
  PageCreateSchema,
  PageListQuerySchema,
  PageReasonSchema,
  PageSaveSchema,
} from '@shared/schemas/page.ts';
import { PageLimits } from '@shared/validations.ts';
import { HttpError, ValidationError } from '../../errors.ts';
import { currentUser, requireUser } from '../../middlewares/authenticate.ts';
import { validate, validateQuery } from '../../middlewares/validate.ts';
import { PageRevision } from '../../models/index.ts';
import { authorize } from '../../policies/index.ts';
import {
  renderPublishedPage,
  renderWithLookups,
  dashboardFor,
  setDigest,
  loadPageDetail,
  listPages,
  createPage,
  deletePage,
  savePage,
  currentText,
  loadStatements,
} from '../../services/pages/index.ts';
import { getPublicPages } from '../../services/publishing/index.ts';
import { loadPage } from '../load.ts';
import { revisionsRouter } from './revisions.ts';
import { versionsRouter } from './versions.ts';
import { workflowRouter } from './workflow.ts';

const tooLarge = () =>
  new HttpError(
    413,
    'page_too_large',
    `This page is larger than ${PageLimits.docMaxBytes / 1024 / 1024} MB and cannot be saved. Split it into shorter pages, or remove pasted material you do not need.`,
  );

/**
 * Checks a document sent by a client: size first (before walking it), then the editor schema.
 * @throws HttpError 413 too large, 400 not a valid page document
 */
export function checkedDoc(doc: unknown): JSONContent {
  if (docBytes(doc) > PageLimits.docMaxBytes) throw tooLarge();
  const result = validateDoc(doc);
  if (!result.ok) throw ValidationError(result.message, { doc: result.message });
  return doc as JSONContent;
}

export const pagesRouter = Router();
pagesRouter.use(requireUser);

pagesRouter.get('/', validateQuery(PageListQuerySchema), async (req, res) => {
  const viewer = currentUser(req);
  authorize(viewer, 'page', 'list');
  const q = req.query;
  const { rows, total } = await listPages(q, viewer);
  res.json({ data: rows, meta: { total, page: q.page, pageSize: q.pageSize } });
});

pagesRouter.post('/', validate(PageCreateSchema), async (req, res) => {
  const viewer = currentUser(req);
  authorize(viewer, 'page', 'create');
  const page = await createPage(req.body, viewer);
  res.status(201).json({ data: await loadPageDetail(page, viewer) });
});

pagesRouter.get('/dashboard', async (req, res) => {
  const viewer = currentUser(req);
  authorize(viewer, 'page', 'list');
  res.json({ data: await dashboardFor(viewer) });
});

pagesRouter.put('/digest', validate(DigestSchema), async (req, res) => {
  const viewer = currentUser(req);
  await setDigest(viewer.id, req.body.enabled);
  res.json({ data: { digest: req.body.enabled } });
});

pagesRouter.get('/:id', async (req, res) => {
  const viewer = currentUser(req);
  const page = await loadPage(req.params.id);
  authorize(viewer, 'page', 'read', page);
  res.json({ data: await loadPageDetail(page, viewer) });
});

/** Autosave: the version the writer started from must still be the server's, else 409 with the server's version in the error. */
pagesRouter.put('/:id', validate(PageSaveSchema), async (req, res) => {
  const viewer = currentUser(req);
  const page = await loadPage(req.params.id);
  authorize(viewer, 'page', 'edit', page);
  const input = req.body;
  const doc = checkedDoc(input.doc);
  // A stale version throws PageConflictError: a 409 whose error carries the server's version (`error.current`).
  const { page: saved, saved: changed } = await savePage(page.id, { version: input.version, title: input.title, doc }, viewer);
  res.json({ data: await loadPageDetail(saved, viewer), meta: { saved: changed } });
});

/** Deletes a page that was never published; the reason comes in the query, as for every delete (409 `page_was_published` otherwise: archive it instead). */
pagesRouter.delete('/:id', validateQuery(PageReasonSchema), async (req, res) => {
  const viewer = currentUser(req);
  const page = await loadPage(req.params.id);
  authorize(viewer, 'page', 'delete', page);
  await deletePage(page.id, req.query.reason, viewer);
  res.status(204).end();
});

/** The working copy rendered as the public would see it, with each statement's current wording. */
pagesRouter.get('/:id/preview', async (req, res) => {
  const viewer = currentUser(req);
  const page = await loadPage(req.params.id);
  authorize(viewer, 'page', 'read', page);
  const revision = (await PageRevision.findByPk(page.currentRevisionId!))!;
  const statements = await loadStatements(revision.statementIds);
  const html = await renderWithLookups(revision.doc, revision.mediaIds, (id) => {
    const s = statements.get(id)?.statement;
    return s ? currentText(s, page.locale) : null;
  });
  res.json({ data: { title: revision.title, html, revisionNumber: revision.number } });
});

/**
 * What the public sees now: the published version, unchanged by later edits or recomputes, with
 * its public address (`publicUrl`, the same builder the public site, feeds and kiosks use).
 */
pagesRouter.get('/:id/published', async (req, res) => {
  const viewer = currentUser(req);
  const page = await loadPage(req.params.id);
  authorize(viewer, 'page', 'read', page);
  const live = await renderPublishedPage(page.id);
  const publicUrl = live ? ((await getPublicPages()).pages.find((p) => p.id === page.id)?.url ?? null) : null;
  res.json({ data: live ? { ...live, publicUrl } : null });
});

pagesRouter.use('/:id', workflowRouter);
pagesRouter.use('/:id/revisions', revisionsRouter);
pagesRouter.use('/:id/versions', versionsRouter);
