import { Router } from 'express';
import { PageVersionCreateSchema } from '@shared/schemas/page-version.ts';
import { currentUser } from '../../middlewares/authenticate.ts';
import { validate } from '../../middlewares/validate.ts';
import { authorize } from '../../policies/index.ts';
import { createPageVersion, listPageVersions, loadPageDetail } from '../../services/pages/index.ts';
import { loadPage, parentParam } from '../load.ts';

/** Language versions of the page in the URL; requireUser runs in the parent router. */
export const versionsRouter = Router({ mergeParams: true });

versionsRouter.get('/', async (req, res) => {
  const viewer = currentUser(req);
  const page = await loadPage(parentParam(req, 'id'));
  authorize(viewer, 'page', 'read', page);
  res.json({ data: await listPageVersions(page, viewer) });
});

/** "Add a French version": a new draft in that locale, with this page's structure and statements. */
versionsRouter.post('/', validate(PageVersionCreateSchema), async (req, res) => {
  const viewer = currentUser(req);
  const page = await loadPage(parentParam(req, 'id'));
  authorize(viewer, 'page', 'read', page);
  authorize(viewer, 'page', 'create');
  const created = await createPageVersion(page, req.body.locale, viewer);
  res.status(201).json({ data: await loadPageDetail(created, viewer) });
});
