import { z } from 'zod';
import { CatalogueLimits } from '../validations.ts';
import { SkyObjectInputSchema } from './sky-object.ts';
import { SourceInputSchema } from './source.ts';

/**
 * Writers and editors cannot add objects or sources to the catalogue; they propose them, and a
 * reviewer (or an admin) accepts or declines, as with proposed measurements. Every proposal names
 * where its facts come from: an object proposal cites a source from the catalogue, a source
 * proposal says where a reviewer finds the source (bibcode, DOI or URL).
 */
export type ProposalKind = 'object' | 'source';

/** What an object proposal without a source is told (the form says it before sending, from here). */
export const PROPOSAL_SOURCE_MISSING = 'Source: choose the source the name and position come from.';

/** The source an object proposal cites, checked beside the object's own fields. */
const ProposalSourceSchema = z.object({
  sourceId: z
    .uuid({ message: PROPOSAL_SOURCE_MISSING })
    .nullish()
    .or(z.literal('').transform(() => null))
    .refine((v) => !!v, PROPOSAL_SOURCE_MISSING),
});

/** A proposed object: the object form's fields and the source they come from. */
export const ObjectProposalSchema = z
  .intersection(SkyObjectInputSchema, ProposalSourceSchema)
  .transform((v) => ({ ...v, sourceId: v.sourceId as string }));
export type ObjectProposalInput = z.input<typeof ObjectProposalSchema>;

/** A proposed source: the source form's fields, with at least one way for a reviewer to find it. */
export const SourceProposalSchema = SourceInputSchema.superRefine((v, ctx) => {
  if (!v.bibcode && !v.doi && !v.url)
    ctx.addIssue({
      code: 'custom',
      path: ['url'],
      message: 'Give a bibcode, a DOI or a URL, so the reviewer can find the source and check it.',
    });
});
export type SourceProposalInput = z.input<typeof SourceProposalSchema>;

/** A reviewer's decision on a proposed object or source; declining needs a reason. */
export const ProposalReviewSchema = z
  .object({
    decision: z.enum(['accept', 'decline'], { message: 'Decision is accept or decline' }),
    reason: z.string().trim().max(CatalogueLimits.reasonMax, `At most ${CatalogueLimits.reasonMax} characters`).optional(),
  })
  .refine((v) => v.decision === 'accept' || (v.reason ?? '').length > 0, {
    path: ['reason'],
    message: 'Reason: say why the proposal is declined, so the writer can fix it.',
  });
export type ProposalReviewInput = z.infer<typeof ProposalReviewSchema>;

/** Which proposals a list shows: those waiting (the default) or every one. */
export const ProposalListQuerySchema = z.object({
  status: z.enum(['proposed', 'all'], { message: 'Status is proposed or all' }).default('proposed'),
});

/** A proposal as the API shows it. */
export interface ProposalDto {
  id: string;
  kind: ProposalKind;
  status: 'proposed' | 'accepted' | 'declined';
  /** The object's name or the source's citation. */
  title: string;
  values: Record<string, unknown>;
  /** For an object proposal: the source cited. */
  source: { id: string; citation: string } | null;
  proposedBy: string | null;
  createdAt: string;
  reviewedBy: string | null;
  reviewedAt: string | null;
  reviewReason: string | null;
  /** The object or source made from it, once accepted. */
  recordId: string | null;
  can: { review: boolean };
}
