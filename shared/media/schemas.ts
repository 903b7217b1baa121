import { z } from 'zod';
import { LICENCE_IDS } from './licences.ts';
import { MediaLimits } from './limits.ts';
import { RENDITION_FORMATS, RENDITION_NAMES, RENDITION_STATUSES } from './renditions.ts';

const altText = z
  .string({ message: 'Describe the image for people who cannot see it' })
  .trim()
  .max(MediaLimits.altTextMax, `Alt text is at most ${MediaLimits.altTextMax} characters`);

const credit = z
  .string({ message: 'Enter the credit line' })
  .trim()
  .max(MediaLimits.creditMax, `Credit lines are at most ${MediaLimits.creditMax} characters`);

const licenceId = z.enum(LICENCE_IDS, { message: 'Choose a licence from the list' });
/** A licence, or '' for not chosen yet (form fields and multipart fields send strings). */
const licenceOrBlank = z.enum(['', ...LICENCE_IDS], { message: 'Choose a licence from the list' });

/** A web address the image came from: http or https only (never javascript:, data: or file:). */
const sourceUrl = z
  .string({ message: 'Enter the web address the image came from' })
  .trim()
  .max(MediaLimits.sourceUrlMax, `Web addresses are at most ${MediaLimits.sourceUrlMax} characters`)
  .refine(
    (v) => v === '' || /^https?:\/\/[^\s/$.?#][^\s]*$/i.test(v),
    'Enter a full web address starting with https:// or http://',
  );

const fraction = z
  .number({ message: 'must be a number from 0 to 1' })
  .min(0, 'must be from 0 to 1')
  .max(1, 'must be from 0 to 1');

/** Where the subject is, as fractions of the upright image's width and height (0,0 is top left). */
export const FocalPointSchema = z.object({ x: fraction, y: fraction });
export type FocalPoint = z.infer<typeof FocalPointSchema>;

/** Details that may come with an upload (multipart text fields; all optional, '' means not given). */
export const MediaUploadFieldsSchema = z.object({
  altText: altText.optional(),
  credit: credit.optional(),
  licenceId: licenceOrBlank.optional(),
  sourceUrl: sourceUrl.optional(),
});
export type MediaUploadFields = z.infer<typeof MediaUploadFieldsSchema>;

/** A change to an image's details (PATCH /api/media/:id). */
export const MediaUpdateSchema = z
  .object({
    altText: altText.optional(),
    credit: credit.optional(),
    licenceId: licenceId.nullable().optional(),
    sourceUrl: sourceUrl.optional(),
    focalPoint: FocalPointSchema.optional(),
    objectIds: z
      .array(z.uuid({ message: 'must be a valid id' }))
      .max(MediaLimits.objectsMax, `Link at most ${MediaLimits.objectsMax} objects`)
      .optional(),
  })
  .strict()
  .refine((v) => Object.keys(v).length > 0, { message: 'Nothing to change' });
export type MediaUpdateInput = z.infer<typeof MediaUpdateSchema>;

/** The details form on the library screen: every field present, '' for not yet known. */
export const MediaDetailsFormSchema = z.object({
  altText,
  credit,
  licenceId: licenceOrBlank,
  sourceUrl,
});
export type MediaDetailsFormInput = z.infer<typeof MediaDetailsFormSchema>;

const searchText = z.string().trim().max(MediaLimits.searchMax, `Search for at most ${MediaLimits.searchMax} characters`);

/** Library search: free text (alt text, file name, credit, object), or one field at a time. */
export const MediaListQuerySchema = z.object({
  q: searchText.optional(),
  object: searchText.optional(),
  credit: searchText.optional(),
  licence: z.enum(['none', ...LICENCE_IDS], { message: 'Choose a licence from the list' }).optional(),
  page: z.coerce
    .number({ message: 'must be a page number' })
    .int('must be a page number')
    .min(1, 'must be 1 or more')
    .max(10_000)
    .optional(),
});
export type MediaListQuery = z.infer<typeof MediaListQuerySchema>;

/** What is still needed before an image may appear on an approved page. */
export const MEDIA_REQUIREMENTS = ['credit', 'licence', 'sourceUrl', 'altText', 'renditions'] as const;
export type MediaRequirement = (typeof MEDIA_REQUIREMENTS)[number];

export const RenditionDtoSchema = z.object({
  name: z.enum(RENDITION_NAMES),
  format: z.enum(RENDITION_FORMATS),
  width: z.number(),
  height: z.number(),
  bytes: z.number(),
  url: z.string(),
});
export type RenditionDto = z.infer<typeof RenditionDtoSchema>;

/** One place an image is used, as another feature reports it. */
export const MediaUsageSchema = z.object({ kind: z.string(), id: z.string(), title: z.string() });
export type MediaUsage = z.infer<typeof MediaUsageSchema>;

/** An image as the API shows it. The original file is never given a public address. */
export const MediaDtoSchema = z.object({
  id: z.string(),
  fileName: z.string(),
  format: z.string(),
  width: z.number(),
  height: z.number(),
  bytes: z.number(),
  altText: z.string(),
  credit: z.string(),
  licence: z.object({ id: z.enum(LICENCE_IDS), label: z.string(), url: z.string().nullable() }).nullable(),
  sourceUrl: z.string(),
  focalPoint: FocalPointSchema,
  objects: z.array(z.object({ id: z.string(), name: z.string() })),
  renditionsStatus: z.enum(RENDITION_STATUSES),
  renditionsError: z.string().nullable(),
  renditions: z.array(RenditionDtoSchema),
  thumbnailUrl: z.string().nullable(),
  missing: z.array(z.enum(MEDIA_REQUIREMENTS)),
  uploadedBy: z.object({ id: z.string(), name: z.string() }).nullable(),
  createdAt: z.string(),
  updatedAt: z.string(),
  can: z.object({ update: z.boolean(), delete: z.boolean() }),
});
export type MediaDto = z.infer<typeof MediaDtoSchema>;

/** GET /api/media/:id adds where the image is used. */
export const MediaDetailDtoSchema = MediaDtoSchema.extend({
  /** The places the viewer may see. */
  usage: z.array(MediaUsageSchema),
  /** Places the viewer may not see (other writers' private drafts), only counted. */
  hiddenUsageCount: z.number(),
});
export type MediaDetailDto = z.infer<typeof MediaDetailDtoSchema>;

/** The list's paging and the limits the upload screen shows. */
export const MediaListMetaSchema = z.object({
  total: z.number(),
  page: z.number(),
  pageSize: z.number(),
  uploadMaxBytes: z.number(),
  maxMegapixels: z.number(),
});
export type MediaListMeta = z.infer<typeof MediaListMetaSchema>;

/** Plain-English names of the requirements, for messages and badges. */
export const REQUIREMENT_LABELS: Record<MediaRequirement, string> = {
  credit: 'credit line',
  licence: 'licence',
  sourceUrl: 'source web address',
  altText: 'alt text',
  renditions: 'finished renditions',
};
