import { isShowingAt } from '@shared/schedule/evaluate.ts';
import { describeSchedule } from '@shared/schemas/slide-schedule.ts';
import type { ChannelDetailDto, ChannelRowDto, ChannelScreenRef, SlideDto, SlideState } from '@shared/schemas/channel.ts';
import { renditionUrl } from '../media/keys.ts';
import type { Channel, ChannelSlide, KioskScreen, Media, Page, User } from '../models/index.ts';
import { can } from '../policies/index.ts';
import { inWindow } from '../services/publishing/index.ts';
import { missingForPublishing } from '../services/media/index.ts';
import type { ChannelDetailContext, ChannelRowContext } from '../services/publishing/index.ts';
import { screenHealth } from './kiosk-screen.ts';

const screenRef = (s: KioskScreen): ChannelScreenRef => ({ id: s.id, name: s.name, health: screenHealth(s) });

/** A row of the channels list: venue, slide count and the screens that show it (loaded by loadChannelRows). */
export function presentChannelRow(channel: Channel, context: ChannelRowContext): ChannelRowDto {
  return {
    id: channel.id,
    name: channel.name,
    venue: { id: channel.venueId, name: context.venueName },
    slideCount: context.slideCount,
    languages: channel.languages ?? [],
    screens: context.screens.map(screenRef),
    updatedAt: channel.updatedAt.toISOString(),
  };
}

function slideState(
  slide: ChannelSlide,
  page: Page | undefined,
  media: Media | undefined,
  now: number,
  onSchedule: boolean,
): { state: SlideState; stateText: string | null } {
  if (slide.kind === 'page' && page?.archivedAt)
    return { state: 'page_archived', stateText: 'Not shown: the page is archived (restore and publish it to show it again)' };
  if (slide.kind === 'page' && !page?.publishedSnapshot)
    return { state: 'page_unpublished', stateText: 'Not shown: the page is not published' };
  if (slide.kind === 'image' && (!media || missingForPublishing(media).length))
    return { state: 'image_not_ready', stateText: 'Not shown: the image lacks a credit, licence or screen sizes' };
  if (slide.startsAt && slide.startsAt.getTime() > now)
    return { state: 'scheduled', stateText: `Starts ${slide.startsAt.toISOString()}` };
  if (!inWindow(slide, now)) return { state: 'ended', stateText: 'Not shown: its end date has passed' };
  if (!onSchedule) return { state: 'off_schedule', stateText: `Not on screen now: shown ${describeSchedule(slide.schedule)}` };
  return { state: 'showing', stateText: null };
}

/**
 * A channel with its slides (and whether each is on the screens now, and why not), its screens
 * and every screen at its venue, with the viewer's `can` flags; what it shows is loaded by
 * loadChannelDetail.
 */
export function presentChannelDetail(
  channel: Channel,
  context: ChannelDetailContext,
  viewer: User,
  now = Date.now(),
): ChannelDetailDto {
  const slideDtos: SlideDto[] = context.slides.map((s) => {
    const page = s.pageId ? context.pages.get(s.pageId) : undefined;
    const m = s.mediaId ? context.media.get(s.mediaId) : undefined;
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
      schedule: s.schedule ?? null,
      scheduleText: describeSchedule(s.schedule ?? null),
      caption: s.caption,
      page: page ? { id: page.id, title: page.publishedSnapshot?.title ?? page.title } : null,
      statementIds: s.statementIds ?? [],
      media: m
        ? { id: m.id, thumbnailUrl: thumb ? renditionUrl(thumb.storageKey) : null, altText: m.altText, fileName: m.fileName }
        : null,
      ...slideState(s, page, m, now, isShowingAt(s.schedule, now, context.timeZone, context.sunDays)),
    };
  });
  return {
    ...presentChannelRow(channel, context.row),
    version: channel.version,
    showQr: channel.showQr,
    silenceAlertMinutes: channel.silenceAlertMinutes ?? null,
    slides: slideDtos,
    venueScreens: context.venueScreens.map((s) => {
      const showing = context.channelOfScreen.get(s.id) ?? null;
      return { ...screenRef(s), channelId: showing, channelName: showing ? (context.channelNames.get(showing) ?? null) : null };
    }),
    can: { update: can(viewer, 'channel', 'update', channel), delete: can(viewer, 'channel', 'delete', channel) },
  };
}
