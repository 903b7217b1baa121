import type { ScreenHealth } from './kiosk.ts';
import { z } from 'zod';
import { ChannelLimits } from '../validations.ts';

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

export const ChannelCreateSchema = z.object({ venueId: z.uuid({ message: 'Choose a venue' }), name });
export type ChannelCreateInput = z.infer<typeof ChannelCreateSchema>;

export const ChannelUpdateSchema = z.object({ name });
export type ChannelUpdateInput = z.infer<typeof ChannelUpdateSchema>;

export const ChannelListQuerySchema = z.object({ venueId: z.uuid({ message: 'venueId must be a valid id' }).optional() });

const timing = { durationS: DurationSchema.optional(), startsAt: instant.optional(), endsAt: instant.optional() };

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
  .refine(windowOk, windowIssue);
export type SlideCreateInput = z.infer<typeof SlideCreateSchema>;

export const SlideUpdateSchema = z
  .object({
    ...timing,
    caption: caption.optional(),
    statementIds: statementIds.optional(),
    mediaId: z.uuid({ message: 'Choose an image' }).nullable().optional(),
  })
  .refine(windowOk, windowIssue);
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
export const SLIDE_STATES = ['showing', 'scheduled', 'ended', 'page_unpublished', 'page_archived', 'image_not_ready'] as const;
export type SlideState = (typeof SLIDE_STATES)[number];

export interface SlideDto {
  id: string;
  position: number;
  kind: SlideKind;
  durationS: number;
  startsAt: string | null;
  endsAt: string | null;
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
  screens: ChannelScreenRef[];
  updatedAt: string;
}

export interface ChannelDetailDto extends ChannelRowDto {
  version: number;
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
