import { Op } from 'sequelize';
import type { ChannelDetailDto, ChannelRowDto, ChannelScreenRef, SlideDto, SlideState } from '@shared/schemas/channel.ts';
import { renditionUrl } from '../media/keys.ts';
import {
  Channel,
  ChannelScreen,
  ChannelSlide,
  KioskScreen,
  Media,
  MediaRendition,
  Page,
  Venue,
  type User,
} from '../models/index.ts';
import { can } from '../policies/index.ts';
import { inWindow } from '../services/publishing/index.ts';
import { missingForPublishing } from '../services/media/index.ts';
import { screenHealth } from './kiosk-screen.ts';

const screenRef = (s: KioskScreen): ChannelScreenRef => ({ id: s.id, name: s.name, health: screenHealth(s) });

/** Rows for the channels list: venue, slide count and the screens that show each channel. */
export async function presentChannelRows(channels: Channel[]): Promise<ChannelRowDto[]> {
  const ids = channels.map((c) => c.id);
  if (!ids.length) return [];
  const [venues, counts, links] = await Promise.all([
    Venue.findAll({ where: { id: { [Op.in]: [...new Set(channels.map((c) => c.venueId))] } } }),
    ChannelSlide.count({ where: { channelId: { [Op.in]: ids } }, group: ['channelId'] }) as unknown as Promise<
      Array<{ channelId: string; count: number }>
    >,
    ChannelScreen.findAll({ where: { channelId: { [Op.in]: ids } } }),
  ]);
  const screens = links.length
    ? await KioskScreen.findAll({ where: { id: { [Op.in]: links.map((l) => l.screenId) } }, order: [['name', 'ASC']] })
    : [];
  const venueName = new Map(venues.map((v) => [v.id, v.name]));
  const count = new Map(counts.map((c) => [c.channelId, Number(c.count)]));
  const channelOf = new Map(links.map((l) => [l.screenId, l.channelId]));
  return channels.map((c) => ({
    id: c.id,
    name: c.name,
    venue: { id: c.venueId, name: venueName.get(c.venueId) ?? '' },
    slideCount: count.get(c.id) ?? 0,
    screens: screens.filter((s) => channelOf.get(s.id) === c.id).map(screenRef),
    updatedAt: c.updatedAt.toISOString(),
  }));
}

function slideState(
  slide: ChannelSlide,
  page: Page | undefined,
  media: Media | undefined,
  now: number,
): { state: SlideState; stateText: string | null } {
  if (slide.kind === 'page' && !page?.publishedSnapshot)
    return { state: 'page_unpublished', stateText: 'Not shown: the page is not published' };
  if (slide.kind === 'image' && (!media || missingForPublishing(media).length))
    return { state: 'image_not_ready', stateText: 'Not shown: the image lacks a credit, licence or screen sizes' };
  if (slide.startsAt && slide.startsAt.getTime() > now)
    return { state: 'scheduled', stateText: `Starts ${slide.startsAt.toISOString()}` };
  if (!inWindow(slide, now)) return { state: 'ended', stateText: 'Not shown: its end date has passed' };
  return { state: 'showing', stateText: null };
}

/**
 * A channel with its slides (and whether each is on the screens now, and why not), its screens
 * and every screen at its venue, with the viewer's `can` flags.
 */
export async function presentChannelDetail(channel: Channel, viewer: User, now = Date.now()): Promise<ChannelDetailDto> {
  const [[row], slides, venueScreens] = await Promise.all([
    presentChannelRows([channel]),
    ChannelSlide.findAll({ where: { channelId: channel.id }, order: [['position', 'ASC']] }),
    KioskScreen.findAll({ where: { venueId: channel.venueId }, order: [['name', 'ASC']] }),
  ]);
  const links = venueScreens.length
    ? await ChannelScreen.findAll({ where: { screenId: { [Op.in]: venueScreens.map((s) => s.id) } } })
    : [];
  const pageIds = slides.flatMap((s) => (s.pageId ? [s.pageId] : []));
  const mediaIds = slides.flatMap((s) => (s.mediaId ? [s.mediaId] : []));
  const [pages, media, channels] = await Promise.all([
    pageIds.length ? Page.findAll({ where: { id: { [Op.in]: pageIds } }, attributes: ['id', 'title', 'publishedSnapshot'] }) : [],
    mediaIds.length
      ? Media.findAll({ where: { id: { [Op.in]: mediaIds } }, include: [{ model: MediaRendition, as: 'renditions' }] })
      : [],
    Channel.findAll({ where: { venueId: channel.venueId }, attributes: ['id', 'name'] }),
  ]);
  const pageById = new Map(pages.map((p) => [p.id, p]));
  const mediaById = new Map(media.map((m) => [m.id, m]));
  const channelName = new Map(channels.map((c) => [c.id, c.name]));
  const channelOf = new Map(links.map((l) => [l.screenId, l.channelId]));
  const slideDtos: SlideDto[] = slides.map((s) => {
    const page = s.pageId ? pageById.get(s.pageId) : undefined;
    const m = s.mediaId ? mediaById.get(s.mediaId) : undefined;
    const thumb =
      m?.renditions?.find((r) => r.name === 'thumbnail' && r.format === 'jpeg') ??
      m?.renditions?.find((r) => r.name === 'thumbnail');
    return {
      id: s.id,
      position: s.position,
      kind: s.kind,
      durationS: s.durationS,
      startsAt: s.startsAt?.toISOString() ?? null,
      endsAt: s.endsAt?.toISOString() ?? null,
      caption: s.caption,
      page: page ? { id: page.id, title: page.publishedSnapshot?.title ?? page.title } : null,
      statementIds: s.statementIds ?? [],
      media: m ? { id: m.id, thumbnailUrl: thumb ? renditionUrl(thumb.storageKey) : null, altText: m.altText } : null,
      ...slideState(s, page, m, now),
    };
  });
  return {
    ...row,
    version: channel.version,
    slides: slideDtos,
    venueScreens: venueScreens.map((s) => {
      const showing = channelOf.get(s.id) ?? null;
      return { ...screenRef(s), channelId: showing, channelName: showing ? (channelName.get(showing) ?? null) : null };
    }),
    can: { update: can(viewer, 'channel', 'update', channel), delete: can(viewer, 'channel', 'delete', channel) },
  };
}
