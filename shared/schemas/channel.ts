import type { ScreenHealth } from './kiosk.ts';
import { z } from 'zod';
import { ChannelLimits } from '../validations.ts';
import { LocaleTagSchema } from './page-version.ts';
import { STATEMENT_LOCALES } from '../statements/locales.ts';
import { SlideScheduleSchema, type SlideSchedule } from './slide-schedule.ts';

export const SLIDE_KINDS = ['page', 'image', 'sky_tonight'] as const;
export type SlideKind = (typeof SLIDE_KINDS)[number];

/** Plain-English names for slide kinds. */
export const SLIDE_KIND_LABELS: Record<SlideKind, string> = { page: 'Object page', image: 'Image', sky_tonight: 'Sky tonight' };

const name = z
  .string({ message: 'Enter a name for the channel' })
  .trim()
  .min(1, 'Enter a name for the channel')
  .max(ChannelLimits.nameMax, `Channel names are at most ${ChannelLimits.nameMax} characters`);

/** Seconds on screen, clamped to 5–120 rather than refused: a 3 becomes 5, a 600 becomes 120. */
export const DurationSchema = z
  .number({ message: 'The duration is a number of seconds' })
  .finite('The duration is a number of seconds')
  .transform((v) => Math.min(ChannelLimits.durationMax, Math.max(ChannelLimits.durationMin, Math.round(v))));

const instant = z.iso
  .datetime({ offset: true, message: 'Give the date and time as ISO 8601, e.g. 2026-12-24T18:00:00Z' })
  .nullable();
const caption = z.string().trim().max(ChannelLimits.captionMax, `Captions are at most ${ChannelLimits.captionMax} characters`);
const statementIds = z
  .array(z.uuid({ message: 'Each statement must be a valid id' }))
  .max(ChannelLimits.statementsPerSlideMax, `A slide shows at most ${ChannelLimits.statementsPerSlideMax} statements`)
  .refine((ids) => new Set(ids).size === ids.length, 'A statement is chosen twice');

const windowOk = (v: { startsAt?: string | null; endsAt?: string | null }) =>
  !v.startsAt || !v.endsAt || Date.parse(v.endsAt) > Date.parse(v.startsAt);
const windowIssue = { message: 'The end must be after the start', path: ['endsAt'] };

/** Every time zone is within 14 hours of UTC, so a local date starts no earlier and ends no later than this around UTC. */
const ZONE_MARGIN_MS = 14 * 3_600_000;

/**
 * A slide's start–end window must meet its schedule's dates somewhere: a window that ends before the
 * first date begins anywhere on Earth (or starts after the last date has ended) would never show.
 */
const windowMeetsDates = (v: { startsAt?: string | null; endsAt?: string | null; schedule?: SlideSchedule | null }) => {
  const s = v.schedule;
  if (!s) return true;
  if (v.endsAt && s.firstDate && Date.parse(v.endsAt) <= Date.parse(`${s.firstDate}T00:00:00Z`) - ZONE_MARGIN_MS) return false;
  if (v.startsAt && s.lastDate && Date.parse(v.startsAt) >= Date.parse(`${s.lastDate}T00:00:00Z`) + 86_400_000 + ZONE_MARGIN_MS)
    return false;
  return true;
};
const datesIssue = {
  message: 'The slide’s start and end fall outside the schedule’s first and last days: it would never show',
  path: ['schedule', 'firstDate'],
};

export const ChannelCreateSchema = z.object({ venueId: z.uuid({ message: 'Choose a venue' }), name });
export type ChannelCreateInput = z.infer<typeof ChannelCreateSchema>;

/**
 * The languages a channel plays, in order (locale tags from the registry, each once). Screens without
 * a language of their own alternate between them, one round of slides per language; empty plays each
 * page slide in the language of the page chosen for it.
 */
export const ChannelLanguagesSchema = z
  .array(LocaleTagSchema)
  .max(STATEMENT_LOCALES.length)
  .refine((tags) => new Set(tags).size === tags.length, 'A language is listed twice');

const silenceAlertMinutes = z
  .number({ message: 'Give the silence before an e-mail in whole minutes, or null for none' })
  .int('Give the silence before an e-mail in whole minutes, or null for none')
  .min(
    ChannelLimits.silenceAlertMin,
    `Wait at least ${ChannelLimits.silenceAlertMin} minutes before e-mailing about a silent screen`,
  )
  .max(
    ChannelLimits.silenceAlertMax,
    `Wait at most ${ChannelLimits.silenceAlertMax} minutes (a week) before e-mailing about a silent screen`,
  )
  .nullable();

/** Rename a channel, set the languages it plays, show or hide QR codes on its object slides, set when a silent screen is reported. */
export const ChannelUpdateSchema = z
  .object({
    name: name.optional(),
    showQr: z.boolean({ message: 'showQr is true or false' }).optional(),
    silenceAlertMinutes: silenceAlertMinutes.optional(),
    languages: ChannelLanguagesSchema.optional(),
  })
  .refine(
    (v) => Object.values(v).some((x) => x !== undefined),
    'Say what to change: name, languages, showQr or silenceAlertMinutes',
  );
export type ChannelUpdateInput = z.infer<typeof ChannelUpdateSchema>;

export const ChannelListQuerySchema = z.object({ venueId: z.uuid({ message: 'venueId must be a valid id' }).optional() });

const timing = {
  durationS: DurationSchema.optional(),
  startsAt: instant.optional(),
  endsAt: instant.optional(),
  /** When the slide shows by the venue's clock; null or absent = always. */
  schedule: SlideScheduleSchema.nullable().optional(),
};

/** A new slide: an object page (with chosen statements), an image with a caption, or the sky tonight. */
export const SlideCreateSchema = z
  .discriminatedUnion(
    'kind',
    [
      z.object({
        kind: z.literal('page'),
        pageId: z.uuid({ message: 'Choose a published page' }),
        statementIds: statementIds.default([]),
        mediaId: z.uuid().nullable().optional(),
        ...timing,
      }),
      z.object({
        kind: z.literal('image'),
        mediaId: z.uuid({ message: 'Choose an image' }),
        caption: caption.default(''),
        ...timing,
      }),
      z.object({ kind: z.literal('sky_tonight'), ...timing }),
    ],
    { message: 'The slide kind must be page, image or sky_tonight' },
  )
  .refine(windowOk, windowIssue)
  .refine(windowMeetsDates, datesIssue);
export type SlideCreateInput = z.infer<typeof SlideCreateSchema>;

export const SlideUpdateSchema = z
  .object({
    ...timing,
    caption: caption.optional(),
    statementIds: statementIds.optional(),
    mediaId: z.uuid({ message: 'Choose an image' }).nullable().optional(),
  })
  .refine(windowOk, windowIssue)
  .refine(windowMeetsDates, datesIssue);
export type SlideUpdateInput = z.infer<typeof SlideUpdateSchema>;

export const SlideOrderSchema = z.object({
  slideIds: z.array(z.uuid({ message: 'Each slide must be a valid id' })).max(ChannelLimits.slidesMax),
});
export type SlideOrderInput = z.infer<typeof SlideOrderSchema>;

export const ChannelScreensSchema = z.object({
  screenIds: z
    .array(z.uuid({ message: 'Each screen must be a valid id' }))
    .max(200)
    .refine((ids) => new Set(ids).size === ids.length, 'A screen is listed twice'),
});
export type ChannelScreensInput = z.infer<typeof ChannelScreensSchema>;

/** Why a slide is or is not on the screens now. */
export const SLIDE_STATES = [
  'showing',
  'scheduled',
  'ended',
  'off_schedule',
  'page_unpublished',
  'page_archived',
  'image_not_ready',
] as const;
export type SlideState = (typeof SLIDE_STATES)[number];

export interface SlideDto {
  id: string;
  position: number;
  kind: SlideKind;
  durationS: number;
  startsAt: string | null;
  endsAt: string | null;
  schedule: SlideSchedule | null;
  /** The schedule in words ("every day, from 1 h before sunset until 23:00"). */
  scheduleText: string;
  caption: string;
  page: { id: string; title: string } | null;
  statementIds: string[];
  /** `fileName` names an image slide in lists when it has no title (alt text describes the picture; it is no name). */
  media: { id: string; thumbnailUrl: string | null; altText: string; fileName: string } | null;
  state: SlideState;
  /** For a person: why the slide is not showing, or null. */
  stateText: string | null;
}

export interface ChannelScreenRef {
  id: string;
  name: string;
  health: ScreenHealth;
}

export interface ChannelRowDto {
  id: string;
  name: string;
  venue: { id: string; name: string };
  slideCount: number;
  /** The languages the channel plays, in order (empty: each page in its own language). */
  languages: string[];
  screens: ChannelScreenRef[];
  updatedAt: string;
}

export interface ChannelDetailDto extends ChannelRowDto {
  version: number;
  showQr: boolean;
  silenceAlertMinutes: number | null;
  slides: SlideDto[];
  /** Every screen at the channel's venue, with the channel it shows now (if any). */
  venueScreens: Array<ChannelScreenRef & { channelId: string | null; channelName: string | null }>;
  can: { update: boolean; delete: boolean };
}

/** What a slide can be made from: published pages (with their statements) and publishable images. */
export interface SlideSourcesDto {
  pages: Array<{
    id: string;
    title: string;
    objectName: string;
    publishedAt: string | null;
    statements: Array<{ id: string; text: string }>;
  }>;
  media: Array<{ id: string; thumbnailUrl: string | null; altText: string; credit: string; licence: string }>;
}
