import type { TimelineEntryDto } from '@shared/schemas/timeline.ts';
import type { TimelineEntry, User } from '../models/index.ts';
import { can } from '../policies/index.ts';

/** The API contract for a timeline entry, with what the viewer may do to it. */
export function presentTimelineEntry(entry: TimelineEntry, viewer: User): TimelineEntryDto {
  return {
    id: entry.id,
    label: entry.label,
    yearsAgo: entry.yearsAgo,
    uncertaintyYears: entry.uncertaintyYears,
    relation: entry.relation,
    phrases: entry.phrases,
    sourceCitation: entry.sourceCitation,
    sourceUrl: entry.sourceUrl ?? null,
    note: entry.note ?? null,
    updatedAt: entry.updatedAt.toISOString(),
    can: { update: can(viewer, 'timeline', 'update', entry), delete: can(viewer, 'timeline', 'delete', entry) },
  };
}
