import { Op } from 'sequelize';
import type { SunDay } from '@shared/schedule/evaluate.ts';
import { followsTheSun, venueSunDays } from './feed-sun.ts';
import { Channel, ChannelScreen, ChannelSlide, KioskScreen, Media, MediaRendition, Page, Venue } from '../../models/index.ts';

/** What the channels list shows beside one channel. */
export interface ChannelRowContext {
  venueName: string;
  slideCount: number;
  /** The screens showing this channel, by name. */
  screens: KioskScreen[];
}

/** What a channel's page shows beside the channel: its slides with what they show, and its venue's screens. */
export interface ChannelDetailContext {
  row: ChannelRowContext;
  slides: ChannelSlide[];
  /** Pages and images the slides show, by id (a slide whose page or image is gone finds nothing). */
  pages: Map<string, Page>;
  media: Map<string, Media>;
  /** Every screen at the channel's venue, by name, with the channel each shows (if any) and its name. */
  venueScreens: KioskScreen[];
  channelOfScreen: Map<string, string>;
  channelNames: Map<string, string>;
  /** The venue's time zone and, when a schedule follows the Sun, its sunrises and sunsets: whether each slide is on schedule now. */
  timeZone: string;
  sunDays: SunDay[];
}

/**
 * Loads what the list shows for each channel (venue name, slide count, its screens) in four queries.
 * @returns one context per channel id
 */
export async function loadChannelRows(channels: Channel[]): Promise<Map<string, ChannelRowContext>> {
  const ids = channels.map((c) => c.id);
  if (!ids.length) return new Map();
  const [venues, counts, links] = await Promise.all([
    Venue.findAll({ where: { id: { [Op.in]: [...new Set(channels.map((c) => c.venueId))] } } }),
    ChannelSlide.count({ where: { channelId: { [Op.in]: ids } }, group: ['channelId'] }),
    ChannelScreen.findAll({ where: { channelId: { [Op.in]: ids } } }),
  ]);
  const screens = links.length
    ? await KioskScreen.findAll({ where: { id: { [Op.in]: links.map((l) => l.screenId) } }, order: [['name', 'ASC']] })
    : [];
  const venueName = new Map(venues.map((v) => [v.id, v.name]));
  const count = new Map(counts.map((c) => [String(c.channelId), Number(c.count)]));
  const channelOf = new Map(links.map((l) => [l.screenId, l.channelId]));
  return new Map(
    channels.map((c) => [
      c.id,
      {
        venueName: venueName.get(c.venueId) ?? '',
        slideCount: count.get(c.id) ?? 0,
        screens: screens.filter((s) => channelOf.get(s.id) === c.id),
      },
    ]),
  );
}

/** The channels of a venue (all of them without one), by name. */
export async function listChannels(venueId?: string): Promise<Channel[]> {
  return Channel.findAll({ where: venueId ? { venueId } : {}, order: [['name', 'ASC']] });
}

/** Loads everything a channel's page shows: its row, slides, the pages and images they show, the venue's screens. */
export async function loadChannelDetail(channel: Channel): Promise<ChannelDetailContext> {
  const [rows, slides, venueScreens] = await Promise.all([
    loadChannelRows([channel]),
    ChannelSlide.findAll({ where: { channelId: channel.id }, order: [['position', 'ASC']] }),
    KioskScreen.findAll({ where: { venueId: channel.venueId }, order: [['name', 'ASC']] }),
  ]);
  const links = venueScreens.length
    ? await ChannelScreen.findAll({ where: { screenId: { [Op.in]: venueScreens.map((s) => s.id) } } })
    : [];
  const pageIds = slides.flatMap((s) => (s.pageId ? [s.pageId] : []));
  const mediaIds = slides.flatMap((s) => (s.mediaId ? [s.mediaId] : []));
  const venue = await Venue.findByPk(channel.venueId, { rejectOnEmpty: true });
  const sunDays = slides.some((s) => followsTheSun(s.schedule)) ? venueSunDays(venue, Date.now()) : [];
  const [pages, media, channels] = await Promise.all([
    pageIds.length
      ? Page.findAll({ where: { id: { [Op.in]: pageIds } }, attributes: ['id', 'title', 'publishedSnapshot', 'archivedAt'] })
      : [],
    mediaIds.length
      ? Media.findAll({ where: { id: { [Op.in]: mediaIds } }, include: [{ model: MediaRendition, as: 'renditions' }] })
      : [],
    Channel.findAll({ where: { venueId: channel.venueId }, attributes: ['id', 'name'] }),
  ]);
  return {
    row: rows.get(channel.id)!,
    slides,
    pages: new Map(pages.map((p) => [p.id, p])),
    media: new Map(media.map((m) => [m.id, m])),
    venueScreens,
    channelOfScreen: new Map(links.map((l) => [l.screenId, l.channelId])),
    channelNames: new Map(channels.map((c) => [c.id, c.name])),
    timeZone: venue.timeZone,
    sunDays,
  };
}
