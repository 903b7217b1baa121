import { Op } from 'sequelize';
import {
  FEED_EXTENSION_VERSION,
  JSON_FEED_VERSION,
  type FeedItem,
  type FeedSlide,
  type KioskFeed,
} from '@shared/schemas/kiosk-feed.ts';
import { localDateOf, localToMs, nextDate, nightDateAt } from '@shared/sky/time-zone.ts';
import { NotFoundError } from '../../errors.ts';
import { Channel, ChannelSlide, Page, Venue } from '../../models/index.ts';
import type { FeedDeps } from './feed-fingerprint.ts';
import { loadPublishedImages, type PublishedImage } from './feed-media.ts';
import { feedSky, skyHtml } from './feed-sky.ts';
import { escapeMarkup as e, firstParagraphText, mediaIdsInHtml } from './feed-text.ts';
import { followsTheSun, venueSunDays } from './feed-sun.ts';
import { qrFor } from './feed-qr.ts';
import { getSkySnapshot } from '../sky/index.ts';
import { publicPageTexts } from '../pages/index.ts';
import { publicStatements } from '../statements/index.ts';
import { getPublicPages } from './public-pages.ts';

/** What the feed is for: a channel at its venue, or a screen with no channel (a holding feed). */
export interface FeedTarget {
  channelId: string | null;
  venueId: string;
  /** The screen's own language (it plays only that one), or null/absent to follow the channel's languages. */
  language?: string | null;
}

export interface BuiltFeed {
  feed: KioskFeed;
  deps: FeedDeps;
  /** Epoch ms by which the feed must be rebuilt (a window opens or closes, the night changes). */
  validUntil: number | null;
}

/** Whether a slide's window includes the instant. */
export const inWindow = (slide: Pick<ChannelSlide, 'startsAt' | 'endsAt'>, now: number) =>
  (!slide.startsAt || slide.startsAt.getTime() <= now) && (!slide.endsAt || slide.endsAt.getTime() > now);

const imageParts = (img: PublishedImage | undefined) =>
  img
    ? { credit: img.credit, licence: img.licence, licence_url: img.licenceUrl, image: img.image }
    : { credit: null, licence: null, licence_url: null, image: null };

const figureHtml = (img: PublishedImage) =>
  `<figure><img src="${e(img.image.hd)}" alt="${e(img.image.alt)}"><figcaption>${e(img.credit)} · ${e(img.licence)}</figcaption></figure>`;

/**
 * Builds a channel's kiosk feed as JSON Feed 1.1 with the `_starproof` extension: slides in order,
 * those outside their window left out, page slides only while the page is published (with the
 * signed-off wording of the chosen statements and their "as of" dates, tonight's for those that
 * follow tonight), images only when they may
 * be shown with credit and licence, and the venue's stored sky tonight.
 * @param target the channel (or none) and the venue whose screens read it
 * @param now the server clock, epoch ms
 * @throws HttpError 404 when the venue no longer exists
 */
export async function buildKioskFeed(target: FeedTarget, now = Date.now()): Promise<BuiltFeed> {
  const venue = await Venue.findByPk(target.venueId);
  if (!venue) throw NotFoundError('This screen’s venue no longer exists.');
  const channel = target.channelId ? await Channel.findOne({ where: { id: target.channelId, venueId: venue.id } }) : null;
  const slides = channel ? await ChannelSlide.findAll({ where: { channelId: channel.id }, order: [['position', 'ASC']] }) : [];

  const languages = target.language ? [target.language] : (channel?.languages ?? []);
  const slidePageIds = [...new Set(slides.flatMap((s) => (s.pageId ? [s.pageId] : [])))];
  const statementIds = [...new Set(slides.flatMap((s) => s.statementIds ?? []))];
  const [slidePages, statements] = await Promise.all([
    slidePageIds.length
      ? Page.findAll({
          where: { id: { [Op.in]: slidePageIds } },
          attributes: ['id', 'locale', 'publishedSnapshot', 'versionGroupId'],
        })
      : [],
    publicStatements(statementIds),
  ]);
  // With languages to play, the other published language versions of each slide's page too.
  const groupIds = languages.length ? [...new Set(slidePages.flatMap((p) => (p.versionGroupId ? [p.versionGroupId] : [])))] : [];
  const versions = groupIds.length
    ? await Page.findAll({
        where: { versionGroupId: { [Op.in]: groupIds }, publishedSnapshot: { [Op.ne]: null } },
        attributes: ['id', 'locale', 'publishedSnapshot', 'versionGroupId'],
      })
    : [];
  const pages = [...new Map([...slidePages, ...versions].map((p) => [p.id, p])).values()];
  const pageIds = pages.map((p) => p.id);
  const live = new Map(pages.filter((p) => p.publishedSnapshot).map((p) => [p.id, p.publishedSnapshot!]));
  const pageLocales = new Map(pages.map((p) => [p.id, p.locale]));
  const pageById = new Map(pages.map((p) => [p.id, p]));
  /** The page a slide shows in a language: its published version in that locale, else the page chosen for it. */
  const pageIn = (pageId: string, language: string | null): string => {
    const chosen = pageById.get(pageId);
    if (!language || !chosen?.versionGroupId || chosen.locale === language) return pageId;
    return versions.find((v) => v.versionGroupId === chosen.versionGroupId && v.locale === language)?.id ?? pageId;
  };
  const imageOf = (s: ChannelSlide, pageId = s.pageId) =>
    (s.kind === 'page' ? (s.mediaId ?? mediaIdsInHtml(live.get(pageId!)?.html ?? '')[0]) : s.mediaId) ?? null;
  const mediaIds = [
    ...new Set([...slides.map((s) => imageOf(s)), ...pages.map((p) => mediaIdsInHtml(p.publishedSnapshot?.html ?? '')[0])]),
  ].filter((id): id is string => !!id);
  const [images, publicPages] = await Promise.all([loadPublishedImages(mediaIds), pageIds.length ? getPublicPages() : null]);
  const pageUrls = new Map(publicPages?.pages.map((p) => [p.id, p.url]));

  let validUntil: number | null = null;
  const until = (t: number) => (validUntil = validUntil === null ? t : Math.min(validUntil, t));
  for (const s of slides) for (const t of [s.startsAt, s.endsAt]) if (t && t.getTime() > now) until(t.getTime());

  const active = slides.filter((s) => inWindow(s, now));
  // Schedules are left to the player (it follows them offline too); it needs the Sun's times for some.
  const sunDays = active.some((s) => followsTheSun(s.schedule)) ? venueSunDays(venue, now) : undefined;
  // Rebuilt at the venue's midnight, so the days roll forward.
  if (sunDays) until(localToMs(nextDate(localDateOf(now, venue.timeZone)), 0, venue.timeZone));
  let skyDate: string | null = null;
  let sky: Awaited<ReturnType<typeof getSkySnapshot>> = null;
  if (active.some((s) => s.kind === 'sky_tonight')) {
    skyDate = nightDateAt(now, venue.timeZone);
    sky = await getSkySnapshot(venue.id, skyDate);
    until(localToMs(nextDate(skyDate), 6 * 60, venue.timeZone));
  }

  const items: FeedItem[] = [];
  // One round of slides per language, in the order listed: the player plays the items in order, so
  // a screen alternates between languages round by round. No languages: one round, as chosen.
  for (const round of languages.length ? languages : [null])
    for (const s of active) {
      const shownPageId = s.pageId ? pageIn(s.pageId, round) : null;
      const id = round ? `${s.id}~${round}` : s.id;
      const base = {
        kind: s.kind,
        position: s.position,
        duration_s: s.durationS,
        starts_at: s.startsAt?.toISOString() ?? null,
        ends_at: s.endsAt?.toISOString() ?? null,
        ...(s.schedule ? { schedule: s.schedule } : {}),
      };
      const img = images.get(imageOf(s, shownPageId) ?? '');
      if (s.kind === 'page') {
        const snapshot = live.get(shownPageId!);
        if (!snapshot) continue; // unpublished: gone from the screens at once
        const locale = pageLocales.get(shownPageId!) ?? 'en-GB';
        const shown = publicPageTexts(snapshot, statements, locale);
        // A phrase form alone would read as a fragment on a slide: it stays inside the page's text.
        const chosen = (s.statementIds ?? [])
          .filter((id) => shown.statementTexts[id] && !statements.get(id)?.phrase)
          .map((id) => ({
            id,
            text: shown.statementTexts[id],
            ...(shown.notes[id] ? { note: shown.notes[id]! } : {}),
            as_of: statements.get(id)?.asOf ?? snapshot.signedOffAt,
          }));
        const text = firstParagraphText(shown.html);
        const url = pageUrls.get(shownPageId!);
        // The QR code on object slides leads to the public page of the version on screen.
        const qr = url && channel?.showQr ? { qr: qrFor(url) } : {};
        const slide: FeedSlide = {
          ...base,
          layout: img ? 'image-text' : 'text',
          text,
          statements: chosen,
          ...imageParts(img),
          ...qr,
        };
        const html = `${img ? figureHtml(img) : ''}<p>${e(text)}</p>${chosen.length ? `<ul>${chosen.map((c) => `<li>${e(c.text)}</li>`).join('')}</ul>` : ''}`;
        items.push({
          id,
          ...(url ? { url } : {}),
          title: snapshot.title,
          language: locale,
          content_html: html,
          ...(img ? { image: img.image.hd } : {}),
          date_published: snapshot.publishedAt ?? snapshot.signedOffAt,
          _starproof: { slide },
        });
      } else if (s.kind === 'image') {
        if (!img) continue; // no picture goes up without its credit and licence
        const slide: FeedSlide = { ...base, layout: 'image', text: s.caption, statements: [], ...imageParts(img) };
        items.push({
          id,
          title: s.caption,
          content_html: `${figureHtml(img)}${s.caption ? `<p>${e(s.caption)}</p>` : ''}`,
          image: img.image.hd,
          date_published: s.createdAt.toISOString(),
          date_modified: img.updatedAt.toISOString(),
          _starproof: { slide },
        });
      } else if (sky) {
        const table = feedSky(sky.data, sky.computedAt, venue.name);
        const slide: FeedSlide = {
          ...base,
          layout: 'sky-table',
          text: `Tonight from ${venue.name}`,
          statements: [],
          credit: null,
          licence: null,
          licence_url: null,
          image: null,
        };
        items.push({
          id,
          title: 'The sky tonight',
          language: 'en',
          content_html: skyHtml(table),
          date_published: sky.computedAt.toISOString(),
          _starproof: { slide, sky: table },
        });
      }
    }

  const feed: KioskFeed = {
    version: JSON_FEED_VERSION,
    title: channel ? `${channel.name} · ${venue.name}` : venue.name,
    description: channel
      ? `Kiosk channel "${channel.name}" at ${venue.name}`
      : `No channel is assigned to this screen at ${venue.name} yet`,
    items,
    _starproof: {
      version: FEED_EXTENSION_VERSION,
      server_time: new Date(now).toISOString(),
      valid_until: validUntil === null ? null : new Date(validUntil).toISOString(),
      channel: channel ? { id: channel.id, name: channel.name } : null,
      languages,
      venue: { id: venue.id, name: venue.name, time_zone: venue.timeZone },
      holding: items.length === 0,
      ...(sunDays ? { sun_days: sunDays } : {}),
    },
  };
  return {
    feed,
    deps: { channelId: channel?.id ?? null, venueId: venue.id, pageIds, pageGroupIds: groupIds, statementIds, mediaIds, skyDate },
    validUntil,
  };
}
