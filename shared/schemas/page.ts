import { z } from 'zod';
import { STATEMENT_LOCALES } from '../statements/locales.ts';
import { PageLimits } from '../validations.ts';

export const PAGE_STATUSES = ['draft', 'in_review', 'approved', 'published', 'needs_recheck'] as const;
export const PageStatusSchema = z.enum(PAGE_STATUSES, { message: `Status must be one of ${PAGE_STATUSES.join(', ')}` });
export type PageStatus = z.infer<typeof PageStatusSchema>;

/** Plain-English names for the workflow states. */
export const PAGE_STATUS_LABELS: Record<PageStatus, string> = {
  draft: 'Draft',
  in_review: 'In review',
  approved: 'Approved',
  published: 'Published',
  needs_recheck: 'Needs re-check',
};

const title = z
  .string({ message: 'Enter a title' })
  .trim()
  .min(1, 'Enter a title')
  .max(PageLimits.titleMax, `Titles are at most ${PageLimits.titleMax} characters`);

export const PageCreateSchema = z.object({
  title,
  objectId: z.uuid({ message: 'Choose the object this page is about' }),
  locale: z.enum(STATEMENT_LOCALES, { message: `Locale must be one of ${STATEMENT_LOCALES.join(', ')}` }).optional(),
});
export type PageCreateInput = z.infer<typeof PageCreateSchema>;

/** Bytes of a document as JSON, the measure the 5 MB limit uses. */
export const docBytes = (doc: unknown) => new TextEncoder().encode(JSON.stringify(doc) ?? '').length;

/** A save: the version it started from (optimistic locking), the title and the editor document. */
export const PageSaveSchema = z.object({
  version: z.number({ message: 'Send the version you started editing from' }).int().min(1),
  title,
  doc: z.unknown().refine((d) => d !== undefined, 'Send the page document'),
});
export type PageSaveInput = z.infer<typeof PageSaveSchema>;

export const PageListQuerySchema = z.object({
  status: PageStatusSchema.optional(),
  objectId: z.uuid({ message: 'objectId must be a valid id' }).optional(),
  writerId: z.uuid({ message: 'writerId must be a valid id' }).optional(),
  q: z.string().trim().max(120).optional(),
  /** Archived pages are hidden unless asked for: `include` lists them with the others, `only` alone. */
  archived: z.enum(['hide', 'include', 'only'], { message: 'archived must be hide, include or only' }).default('hide'),
  page: z.coerce.number().int().min(1).max(100_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(PageLimits.pageSizeMax).default(50),
});
export type PageListQuery = z.infer<typeof PageListQuerySchema>;

export const PageCommentSchema = z.object({
  body: z
    .string({ message: 'Write a comment' })
    .trim()
    .min(1, 'Write a comment')
    .max(PageLimits.commentMax, `Comments are at most ${PageLimits.commentMax} characters`),
});

export const SendBackSchema = z.object({
  comment: z.string({ message: 'Say what needs changing' }).trim().min(1, 'Say what needs changing').max(PageLimits.commentMax),
});

export const FlagResolveSchema = z.object({
  text: z.string({ message: 'Name the flagged number' }).trim().min(1).max(200),
  reason: z
    .string({ message: 'Give the reason it is not a measured quantity' })
    .trim()
    .min(PageLimits.reasonMin, `Give a reason of at least ${PageLimits.reasonMin} characters`)
    .max(PageLimits.reasonMax, `Reasons are at most ${PageLimits.reasonMax} characters`),
});

/** The writer's word on one hand-typed number left on a page sent to review (shown to the reviewer). */
export const FlagNoteSchema = z.object({
  text: z.string({ message: 'Name the flagged number' }).trim().min(1).max(200),
  reason: z
    .string({ message: 'Say why this number stays as typed' })
    .trim()
    .min(PageLimits.reasonMin, `Say why this number stays as typed (at least ${PageLimits.reasonMin} characters)`)
    .max(PageLimits.reasonMax, `Reasons are at most ${PageLimits.reasonMax} characters`),
});

/**
 * Sending a page to review. `version` is the version the writer is looking at; `flagNotes` give a
 * reason for every hand-typed number still open (without one for each, submission is refused).
 */
export const PageSubmitSchema = z.object({
  version: z.number().int().positive().optional(),
  flagNotes: z.array(FlagNoteSchema).max(200).default([]),
});
export type PageSubmitInput = z.infer<typeof PageSubmitSchema>;

/** Archiving, restoring or deleting a page: the reason is kept in the audit log. */
export const PageReasonSchema = z.object({
  reason: z
    .string({ message: 'Give a reason' })
    .trim()
    .min(1, 'Give a reason: it is kept with the history')
    .max(PageLimits.reasonMax, `Reasons are at most ${PageLimits.reasonMax} characters`),
});

export const StatementSignoffSchema = z.object({ statementId: z.uuid({ message: 'statementId must be a valid id' }) });

export const ScheduleSchema = z.object({
  at: z.iso.datetime({ offset: true, message: 'Give the date and time as ISO 8601' }).nullable(),
});

export const RestoreSchema = z.object({ version: z.number({ message: 'Send the version you are looking at' }).int().min(1) });

export const DiffQuerySchema = z.object({
  from: z.coerce.number({ message: 'from must be a revision number' }).int().min(1),
  to: z.coerce.number({ message: 'to must be a revision number' }).int().min(1),
});

export const DigestSchema = z.object({ enabled: z.boolean({ message: 'enabled must be true or false' }) });

/** What was signed off or is live: rendered HTML with the statement wording as signed. */
export interface PageSnapshot {
  revisionId: string;
  revisionNumber: number;
  title: string;
  html: string;
  /** Statement id → wording in the page's locale, as signed off. */
  statementTexts: Record<string, string>;
  /** Statement id → the small print (band, cosmology, night) of the signed wording; absent in snapshots made before it was kept. */
  statementNotes?: Record<string, string>;
  signedOffAt: string;
  signedOffBy: { id: string; name: string } | null;
  publishedAt?: string;
  publishedBy?: { id: string; name: string } | null;
}

const Person = z.object({ id: z.string(), name: z.string() });
const ObjectRef = z.object({ id: z.string(), name: z.string(), kind: z.string() });

export const PageRowSchema = z.object({
  id: z.string(),
  title: z.string(),
  object: ObjectRef,
  locale: z.enum(STATEMENT_LOCALES),
  status: PageStatusSchema,
  writer: Person,
  revisionNumber: z.number(),
  live: z.boolean(),
  scheduledPublishAt: z.string().nullable(),
  /** When the page was archived (hidden from lists and public outputs), or null. */
  archivedAt: z.string().nullable(),
  updatedAt: z.string(),
});
export type PageRow = z.infer<typeof PageRowSchema>;

/** A statement as the page shows it: its wording now, and as signed off. */
export interface PageStatementDto {
  id: string;
  templateTitle: string;
  objectName: string;
  status: 'current' | 'changed' | 'broken';
  statusReason: string | null;
  text: string | null;
  /** The wording signed off on the approved version (null before the first approval). */
  signedText: string | null;
  /** Signed off on the current revision with the wording shown now. */
  signedOff: boolean;
}

export interface NumberFlagDto {
  text: string;
  normalised: string;
  block: number;
  from: number;
  to: number;
  resolution: { reason: string; by: string | null; at: string } | null;
}

export interface PageMediaDto {
  id: string;
  url: string | null;
  altText: string;
  credit: string;
  licence: string | null;
  missing: string[];
}

export interface PageCan {
  edit: boolean;
  submit: boolean;
  /** Take the page back from review (writer or editor, before the page is signed off). */
  withdraw: boolean;
  review: boolean;
  publish: boolean;
  unpublish: boolean;
  schedule: boolean;
  comment: boolean;
  /** Hide the page from the desk's lists and every public output (restorable). */
  archive: boolean;
  restore: boolean;
  /** Delete for good: only a page that was never published. */
  delete: boolean;
}

/**
 * The version the server holds, sent inside a 409's error (`error.current`) when a save started from a
 * stale version, so the writer can compare it with their own without asking again.
 */
export const PageServerVersionSchema = z.object({
  version: z.number().int(),
  title: z.string(),
  doc: z.record(z.string(), z.unknown()),
  revisionNumber: z.number().int(),
  savedBy: z.string().nullable(),
  savedAt: z.string(),
});
export type PageServerVersion = z.infer<typeof PageServerVersionSchema>;

export interface PageDto extends PageRow {
  version: number;
  doc: unknown;
  revision: { id: string; number: number; createdAt: string; author: string | null };
  statements: PageStatementDto[];
  flags: NumberFlagDto[];
  media: PageMediaDto[];
  eyeSafety: { required: string | null; present: boolean };
  approved: { revisionNumber: number; at: string; by: string | null } | null;
  published: { revisionNumber: number; at: string | null; title: string } | null;
  pageSignedOff: boolean;
  lastReviewer: string | null;
  submittedAt: string | null;
  /** The last send-back, while the page is the draft it made: who, when and the reviewer's reason. */
  sentBack: { by: string | null; at: string; reason: string } | null;
  can: PageCan;
}

export interface PageRevisionDto {
  id: string;
  number: number;
  title: string;
  author: string | null;
  createdAt: string;
  restoredFrom: number | null;
  marks: Array<'current' | 'approved' | 'published'>;
}

export interface DiffPart {
  value: string;
  added?: boolean;
  removed?: boolean;
}

export interface RevisionDiffDto {
  from: number;
  to: number;
  title: DiffPart[];
  blocks: DiffPart[];
}

export interface PageCommentDto {
  id: string;
  body: string;
  author: string | null;
  revisionNumber: number | null;
  createdAt: string;
}

/** What the dashboard lists for one person. */
export interface DashboardDto {
  sections: Array<{ id: string; title: string; hint: string; pages: PageRow[] }>;
  digest: boolean;
}
