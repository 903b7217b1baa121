import { Router } from 'express';
import {
  ChannelCreateSchema,
  ChannelListQuerySchema,
  ChannelScreensSchema,
  ChannelUpdateSchema,
  SlideCreateSchema,
  SlideOrderSchema,
  SlideUpdateSchema,
} from '@shared/schemas/channel.ts';
import { currentUser, requireUser } from '../middlewares/authenticate.ts';
import { sendCached } from '../middlewares/http-cache.ts';
import { validate, validateQuery } from '../middlewares/validate.ts';
import type { Channel, User } from '../models/index.ts';
import { authorize } from '../policies/index.ts';
import { presentChannelDetail, presentChannelRow } from '../presenters/channel.ts';
import {
  createChannel,
  deleteChannel,
  updateChannel,
  assignScreens,
  addSlide,
  removeSlide,
  reorderSlides,
  updateSlide,
  loadSlideSources,
  getKioskFeed,
  listChannels,
  loadChannelDetail,
  loadChannelRows,
} from '../services/publishing/index.ts';
import { FEED_CONTENT_TYPE } from './kiosk-feed.ts';
import { loadChannel } from './load.ts';

/** The channel as its page shows it, read fresh after a change. */
async function present(channel: Channel, viewer: User) {
  return presentChannelDetail(channel, await loadChannelDetail(channel), viewer);
}

/** Kiosk channels, for editors and admins: slides, their order and timing, and the screens that show them. */
export const channelsRouter = Router();
channelsRouter.use(requireUser);

channelsRouter.get('/', validateQuery(ChannelListQuerySchema), async (req, res) => {
  const viewer = currentUser(req);
  authorize(viewer, 'channel', 'list');
  const { venueId } = req.query;
  const channels = await listChannels(venueId);
  const rows = await loadChannelRows(channels);
  res.json({ data: channels.map((c) => presentChannelRow(c, rows.get(c.id)!)) });
});

channelsRouter.post('/', validate(ChannelCreateSchema), async (req, res) => {
  const viewer = currentUser(req);
  authorize(viewer, 'channel', 'create');
  const channel = await createChannel(req.body, viewer, req.ip);
  res.status(201).json({ data: await present(channel, viewer) });
});

/** Published pages and publishable images to make slides from. */
channelsRouter.get('/slide-sources', async (req, res) => {
  authorize(currentUser(req), 'channel', 'list');
  res.json({ data: await loadSlideSources() });
});

channelsRouter.get('/:id', async (req, res) => {
  const viewer = currentUser(req);
  const channel = await loadChannel(req.params.id);
  authorize(viewer, 'channel', 'read', channel);
  res.json({ data: await present(channel, viewer) });
});

channelsRouter.patch('/:id', validate(ChannelUpdateSchema), async (req, res) => {
  const viewer = currentUser(req);
  const channel = await loadChannel(req.params.id);
  authorize(viewer, 'channel', 'update', channel);
  const updated = await updateChannel(channel, req.body, viewer, req.ip);
  res.json({ data: await present(updated, viewer) });
});

channelsRouter.delete('/:id', async (req, res) => {
  const viewer = currentUser(req);
  const channel = await loadChannel(req.params.id);
  authorize(viewer, 'channel', 'delete', channel);
  await deleteChannel(channel, viewer, req.ip);
  res.status(204).end();
});

channelsRouter.post('/:id/slides', validate(SlideCreateSchema), async (req, res) => {
  const viewer = currentUser(req);
  const channel = await loadChannel(req.params.id);
  authorize(viewer, 'channel', 'update', channel);
  await addSlide(channel, req.body, viewer, req.ip);
  res.status(201).json({ data: await present(await channel.reload(), viewer) });
});

channelsRouter.patch('/:id/slides/:slideId', validate(SlideUpdateSchema), async (req, res) => {
  const viewer = currentUser(req);
  const channel = await loadChannel(req.params.id);
  authorize(viewer, 'channel', 'update', channel);
  await updateSlide(channel, String(req.params.slideId), req.body, viewer, req.ip);
  res.json({ data: await present(await channel.reload(), viewer) });
});

channelsRouter.delete('/:id/slides/:slideId', async (req, res) => {
  const viewer = currentUser(req);
  const channel = await loadChannel(req.params.id);
  authorize(viewer, 'channel', 'update', channel);
  await removeSlide(channel, req.params.slideId, viewer, req.ip);
  res.json({ data: await present(await channel.reload(), viewer) });
});

channelsRouter.put('/:id/slide-order', validate(SlideOrderSchema), async (req, res) => {
  const viewer = currentUser(req);
  const channel = await loadChannel(req.params.id);
  authorize(viewer, 'channel', 'update', channel);
  await reorderSlides(channel, req.body.slideIds, viewer, req.ip);
  res.json({ data: await present(await channel.reload(), viewer) });
});

channelsRouter.put('/:id/screens', validate(ChannelScreensSchema), async (req, res) => {
  const viewer = currentUser(req);
  const channel = await loadChannel(req.params.id);
  authorize(viewer, 'channel', 'update', channel);
  await assignScreens(channel, req.body.screenIds, viewer, req.ip);
  res.json({ data: await present(await channel.reload(), viewer) });
});

/** The feed exactly as the channel's screens get it, for the staff preview (signed-in session, no kiosk token). */
channelsRouter.get('/:id/preview-feed', async (req, res) => {
  const viewer = currentUser(req);
  const channel = await loadChannel(req.params.id);
  authorize(viewer, 'channel', 'read', channel);
  const feed = await getKioskFeed({ channelId: channel.id, venueId: channel.venueId });
  sendCached(req, res, feed.body, feed.etag, FEED_CONTENT_TYPE, 'private, no-cache');
});
