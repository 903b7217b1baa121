import type { TimelineEntryCreateInput, TimelineEntryUpdateInput } from '@shared/schemas/timeline.ts';
import type { TimelineEntry as StatementTimelineEntry } from '@shared/statements/index.ts';
import { getSequelize } from '../../db.ts';
import { emitAndWait } from '../../domain-events.ts';
import { ConflictError } from '../../errors.ts';
import { TimelineEntry, type User } from '../../models/index.ts';
import { recordAudit } from '../audit.ts';
import { settingsEvents } from './events.ts';

/** The timeline, oldest entry first (as the admin screen lists it). */
export function listTimelineEntries(): Promise<TimelineEntry[]> {
  return TimelineEntry.findAll({
    order: [
      ['yearsAgo', 'DESC'],
      ['label', 'ASC'],
    ],
  });
}

/** The timeline as statement templates read it. */
export async function timelineForStatements(): Promise<StatementTimelineEntry[]> {
  return (await listTimelineEntries()).map((e) => ({
    id: e.id,
    label: e.label,
    yearsAgo: e.yearsAgo,
    uncertaintyYears: e.uncertaintyYears,
    relation: e.relation,
    phrases: e.phrases,
    source: { citation: e.sourceCitation, url: e.sourceUrl ?? null },
  }));
}

async function ensureLabelFree(label: string | undefined, exceptId: string | null): Promise<void> {
  if (label === undefined) return;
  const other = await TimelineEntry.findOne({ where: { label } });
  if (other && other.id !== exceptId)
    throw ConflictError(`There is already a timeline entry named “${label}”: choose another name.`, 'timeline_label_taken');
}

// Statements that read the timeline are recomputed once the change has committed; the request
// answers when that recompute is queued.
const changed = (entryId: string) => emitAndWait(settingsEvents, 'timelineChanged', { entryId });

/**
 * Adds an entry to the timeline and recomputes the statements that read it.
 * @throws HttpError 409 `timeline_label_taken`
 */
export async function createTimelineEntry(input: TimelineEntryCreateInput, actor: User, ip?: string): Promise<TimelineEntry> {
  await ensureLabelFree(input.label, null);
  const entry = await getSequelize().transaction(async (transaction) => {
    const created = await TimelineEntry.create(
      { ...input, sourceUrl: input.sourceUrl ?? null, note: input.note ?? null, updatedById: actor.id },
      { transaction },
    );
    await recordAudit(
      {
        actorId: actor.id,
        action: 'timeline.created',
        subjectType: 'timeline_entry',
        subjectId: created.id,
        data: { label: created.label },
        ip,
      },
      transaction,
    );
    return created;
  });
  await changed(entry.id);
  return entry;
}

/**
 * Changes an entry and recomputes the statements that read the timeline.
 * @throws HttpError 409 `timeline_label_taken`
 */
export async function updateTimelineEntry(
  entry: TimelineEntry,
  input: TimelineEntryUpdateInput,
  actor: User,
  ip?: string,
): Promise<TimelineEntry> {
  await ensureLabelFree(input.label, entry.id);
  const yearsAgo = input.yearsAgo ?? entry.yearsAgo;
  const uncertaintyYears = input.uncertaintyYears ?? entry.uncertaintyYears;
  if (uncertaintyYears >= yearsAgo)
    throw ConflictError('The uncertainty must be smaller than the date itself.', 'timeline_uncertainty_too_large');
  const before = entry.get({ plain: true });
  await getSequelize().transaction(async (transaction) => {
    await entry.update({ ...input, updatedById: actor.id }, { transaction });
    const fields = Object.keys(input).filter(
      (k) => JSON.stringify(before[k as keyof typeof before]) !== JSON.stringify(entry.get(k as keyof TimelineEntry)),
    );
    await recordAudit(
      {
        actorId: actor.id,
        action: 'timeline.updated',
        subjectType: 'timeline_entry',
        subjectId: entry.id,
        data: { label: entry.label, fields },
        ip,
      },
      transaction,
    );
  });
  await changed(entry.id);
  return entry;
}

/** Removes an entry; statements that named it are recomputed (they fall back to another entry, or none). */
export async function deleteTimelineEntry(entry: TimelineEntry, actor: User, ip?: string): Promise<void> {
  await getSequelize().transaction(async (transaction) => {
    await entry.destroy({ transaction });
    await recordAudit(
      {
        actorId: actor.id,
        action: 'timeline.deleted',
        subjectType: 'timeline_entry',
        subjectId: entry.id,
        data: { label: entry.label },
        ip,
      },
      transaction,
    );
  });
  await changed(entry.id);
}
