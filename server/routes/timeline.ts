import { Router } from 'express';
import { TimelineEntryCreateSchema, TimelineEntryUpdateSchema } from '@shared/schemas/timeline.ts';
import { currentUser, requireUser } from '../middlewares/authenticate.ts';
import { validate } from '../middlewares/validate.ts';
import { authorize } from '../policies/index.ts';
import { presentTimelineEntry } from '../presenters/timeline-entry.ts';
import {
  createTimelineEntry,
  deleteTimelineEntry,
  listTimelineEntries,
  updateTimelineEntry,
} from '../services/settings/index.ts';
import { loadTimelineEntry } from './load.ts';

/** Earth's timeline for "when the light set out": read by staff, edited by admins. */
export const timelineRouter = Router();
timelineRouter.use(requireUser);

timelineRouter.get('/', async (req, res) => {
  const viewer = currentUser(req);
  authorize(viewer, 'timeline', 'list');
  res.json({ data: (await listTimelineEntries()).map((e) => presentTimelineEntry(e, viewer)) });
});

timelineRouter.post('/', validate(TimelineEntryCreateSchema), async (req, res) => {
  const viewer = currentUser(req);
  authorize(viewer, 'timeline', 'create');
  const entry = await createTimelineEntry(req.body, viewer, req.ip);
  res.status(201).json({ data: presentTimelineEntry(entry, viewer) });
});

timelineRouter.patch('/:id', validate(TimelineEntryUpdateSchema), async (req, res) => {
  const viewer = currentUser(req);
  const entry = await loadTimelineEntry(req.params.id);
  authorize(viewer, 'timeline', 'update', entry);
  res.json({ data: presentTimelineEntry(await updateTimelineEntry(entry, req.body, viewer, req.ip), viewer) });
});

timelineRouter.delete('/:id', async (req, res) => {
  const viewer = currentUser(req);
  const entry = await loadTimelineEntry(req.params.id);
  authorize(viewer, 'timeline', 'delete', entry);
  await deleteTimelineEntry(entry, viewer, req.ip);
  res.status(204).end();
});
