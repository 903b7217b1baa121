import { Router } from 'express';
import { QueryTypes } from 'sequelize';
import {
  ChannelCreateSchema,
  ChannelListQuerySchema,
  ChannelScreensSchema,
  ChannelUpdateSchema,
  SlideCreateSchema,
  SlideOrderSchema,
  SlideUpdateSchema,
} from '@shared/schemas/channel.ts';
import { IdSchema } from '@shared/schemas/common.ts';
import { getSequelize } from '../db.ts';
import { currentUser, requireUser } from '../middlewares/authenticate.ts';
import { sendCached } from '../middlewares/http-cache.ts';
import { validate, validateQuery } from '../middlewares/validate.ts';
import { Channel } from '../models/index.ts';
import { authorize } from '../policies/index.ts';
import { presentChannelDetail, presentChannelRows } from '../presenters/channel.ts';
import { createChannel, deleteChannel, updateChannel } from '../services/channel-save.ts';
import { assignScreens } from '../services/channel-screens.ts';
import { addSlide, removeSlide, reorderSlides, updateSlide } from '../services/channel-slides.ts';
import { loadSlideSources } from '../services/channel-sources.ts';
import { getKioskFeed, listenForFeedChanges } from '../services/feed-cache.ts';
import { registerMediaUsageProvider } from '../services/media-usage.ts';
import { FEED_CONTENT_TYPE } from './kiosk-feed.ts';
import { loadChannel } from './load.ts';

listenForFeedChanges();

/** The library lists the channels that show an image, and refuses to delete it while they do. */
registerMediaUsageProvider('channels', async (mediaId) => {
  if (!IdSchema.safeParse(mediaId).success) return [];
  const rows = await getSequelize().query<{ id: string; name: string }>(
    'SELECT DISTINCT c.id, c.name FROM channels c JOIN channel_slides s ON s.channel_id = c.id WHERE s.media_id = :mediaId ORDER BY c.name',
    { replacements: { mediaId }, type: QueryTypes.SELECT },
  );
  return rows.map((r) => ({ kind: 'channel', id: r.id, title: `Kiosk channel: ${r.name}` }));
});

const params = (p: unknown) => p as { id: string; slideId: string };

/** Kiosk channels, for editors and admins: slides, their order and timing, and the screens that show them. */
export const channelsRouter = Router();
channelsRouter.use(requireUser);

channelsRouter.get('/', validateQuery(ChannelListQuerySchema), async (req, res) => {
  const viewer = currentUser(req);
  authorize(viewer, 'channel', 'list');
  const { venueId } = req.query;
  const channels = await Channel.findAll({ where: venueId ? { venueId } : {}, order: [['name', 'ASC']] });
  res.json({ data: await presentChannelRows(channels) });
});

channelsRouter.post('/', validate(ChannelCreateSchema), async (req, res) => {
  const viewer = currentUser(req);
  authorize(viewer, 'channel', 'create');
  const channel = await createChannel(req.body, viewer, req.ip);
  res.status(201).json({ data: await presentChannelDetail(channel, viewer) });
});

/** Published pages and publishable images to make slides from. */
channelsRouter.get('/slide-sources', async (req, res) => {
  authorize(currentUser(req), 'channel', 'list');
  res.json({ data: await loadSlideSources() });
});

channelsRouter.get('/:id', async (req, res) => {
  const viewer = currentUser(req);
  const channel = await loadChannel(params(req.params).id);
  authorize(viewer, 'channel', 'read', channel);
  res.json({ data: await presentChannelDetail(channel, viewer) });
});

channelsRouter.patch('/:id', validate(ChannelUpdateSchema), async (req, res) => {
  const viewer = currentUser(req);
  const channel = await loadChannel(params(req.params).id);
  authorize(viewer, 'channel', 'update', channel);
  const updated = await updateChannel(channel, req.body, viewer, req.ip);
  res.json({ data: await presentChannelDetail(updated, viewer) });
});

channelsRouter.delete('/:id', async (req, res) => {
  const viewer = currentUser(req);
  const channel = await loadChannel(params(req.params).id);
  authorize(viewer, 'channel', 'delete', channel);
  await deleteChannel(channel, viewer, req.ip);
  res.status(204).end();
});

channelsRouter.post('/:id/slides', validate(SlideCreateSchema), async (req, res) => {
  const viewer = currentUser(req);
  const channel = await loadChannel(params(req.params).id);
  authorize(viewer, 'channel', 'update', channel);
  await addSlide(channel, req.body, viewer, req.ip);
  res.status(201).json({ data: await presentChannelDetail(await channel.reload(), viewer) });
});

channelsRouter.patch('/:id/slides/:slideId', validate(SlideUpdateSchema), async (req, res) => {
  const viewer = currentUser(req);
  const channel = await loadChannel(params(req.params).id);
  authorize(viewer, 'channel', 'update', channel);
  await updateSlide(channel, params(req.params).slideId, req.body, viewer, req.ip);
  res.json({ data: await presentChannelDetail(await channel.reload(), viewer) });
});

channelsRouter.delete('/:id/slides/:slideId', async (req, res) => {
  const viewer = currentUser(req);
  const channel = await loadChannel(params(req.params).id);
  authorize(viewer, 'channel', 'update', channel);
  await removeSlide(channel, params(req.params).slideId, viewer, req.ip);
  res.json({ data: await presentChannelDetail(await channel.reload(), viewer) });
});

channelsRouter.put('/:id/slide-order', validate(SlideOrderSchema), async (req, res) => {
  const viewer = currentUser(req);
  const channel = await loadChannel(params(req.params).id);
  authorize(viewer, 'channel', 'update', channel);
  await reorderSlides(channel, req.body.slideIds, viewer, req.ip);
  res.json({ data: await presentChannelDetail(await channel.reload(), viewer) });
});

channelsRouter.put('/:id/screens', validate(ChannelScreensSchema), async (req, res) => {
  const viewer = currentUser(req);
  const channel = await loadChannel(params(req.params).id);
  authorize(viewer, 'channel', 'update', channel);
  await assignScreens(channel, req.body.screenIds, viewer, req.ip);
  res.json({ data: await presentChannelDetail(await channel.reload(), viewer) });
});

/** The feed exactly as the channel's screens get it, for the staff preview (signed-in session, no kiosk token). */
channelsRouter.get('/:id/preview-feed', async (req, res) => {
  const viewer = currentUser(req);
  const channel = await loadChannel(params(req.params).id);
  authorize(viewer, 'channel', 'read', channel);
  const feed = await getKioskFeed({ channelId: channel.id, venueId: channel.venueId });
  sendCached(req, res, feed.body, feed.etag, FEED_CONTENT_TYPE, 'private, no-cache');
});
