import type { MeasurementValues } from '@shared/schemas/measurement.ts';
import { getSequelize } from '../../db.ts';
import { ConflictError, ValidationError } from '../../errors.ts';
import { Measurement, Source, type SkyObject, type User } from '../../models/index.ts';
import { catalogueEvents } from './events.ts';
import { isPreferredIndexViolation } from './preferred-write.ts';
import { requireConfirmation, warningsForValue } from './measurement-confirmation.ts';
import { changedFields, recordMeasurementHistory, snapshotMeasurement } from './measurement-history-write.ts';

async function checkSource(sourceId: string | null): Promise<void> {
  if (sourceId && !(await Source.findByPk(sourceId)))
    throw ValidationError('That source does not exist; choose one from the list.', { sourceId: 'Choose a source from the list' });
}

/**
 * Adds a measurement to an object. A reviewer's or admin's entry is accepted at once; a writer's or
 * editor's is a proposal waiting for review, and must cite a source.
 * @param object the object measured
 * @param values the parsed input, in canonical units
 * @param actor who enters it
 * @param asProposal true for a proposal
 * @returns the new measurement
 */
export async function createMeasurement(
  object: SkyObject,
  { confirm, ...values }: MeasurementValues,
  actor: User,
  asProposal: boolean,
): Promise<Measurement> {
  // A reviewer checks a proposal against its source, so a proposal without one cannot be checked.
  if (asProposal && !values.sourceId)
    throw ValidationError(
      'Choose the source this value comes from: a proposed measurement needs one, so a reviewer can check it.',
      {
        sourceId: 'Source: a proposed measurement needs the source its value comes from.',
      },
    );
  await checkSource(values.sourceId);
  requireConfirmation(confirm, await warningsForValue(object.id, values));
  const measurement = await getSequelize().transaction(async (transaction) => {
    const m = await Measurement.create(
      { ...values, skyObjectId: object.id, createdById: actor.id, status: asProposal ? 'proposed' : 'accepted' },
      { transaction },
    );
    await recordMeasurementHistory(
      { measurement: m, action: asProposal ? 'proposed' : 'created', actorId: actor.id, old: null, new: snapshotMeasurement(m) },
      transaction,
    );
    transaction.afterCommit(
      () => void catalogueEvents.emit('measurementChanged', { measurementId: m.id, skyObjectId: m.skyObjectId }),
    );
    return m;
  });
  return measurement;
}

/**
 * Changes a measurement's value, unit, uncertainty, band, source or note, keeping the old values in
 * its history. The quantity cannot change (retire and add a new one instead).
 * @throws HttpError 400 when the quantity differs; 409 when it was retired meanwhile, a preferred value would
 * lose its source, or the value's warnings (a negative parallax, a likely sign error) are not confirmed
 */
export async function updateMeasurement(
  measurementId: string,
  { confirm, ...values }: MeasurementValues,
  actor: User,
  reason: string | null,
): Promise<Measurement> {
  await checkSource(values.sourceId);
  const existing = await Measurement.findByPk(measurementId, { attributes: ['skyObjectId'] });
  if (existing) requireConfirmation(confirm, await warningsForValue(existing.skyObjectId, values, measurementId));
  return getSequelize().transaction(async (transaction) => {
    const m = await Measurement.findByPk(measurementId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!m || m.retiredAt) throw ConflictError('This measurement has been retired meanwhile; reload the page.', 'retired');
    if (m.status !== 'accepted')
      throw ConflictError('Only an accepted measurement can be edited; review the proposal first.', 'not_accepted');
    if (values.quantity !== m.quantity)
      throw ValidationError('A measurement keeps its quantity; retire it and add a new one instead.', {
        quantity: 'The quantity cannot change',
      });
    if (m.preferred && !values.sourceId)
      throw ConflictError(
        'A preferred measurement needs a source. Choose another preferred value first, or keep a source.',
        'preferred_needs_source',
      );
    const before = snapshotMeasurement(m);
    m.set({ ...values });
    const diff = changedFields(before, snapshotMeasurement(m));
    if (Object.keys(diff.new).length === 0) return m;
    try {
      await m.save({ transaction });
    } catch (error) {
      // A preferred value moved to a band where another preferred value already sits.
      if (isPreferredIndexViolation(error))
        throw ConflictError(
          'Another measurement is already preferred for that quantity and band; unmark it first.',
          'preferred_changed',
        );
      throw error;
    }
    await recordMeasurementHistory(
      { measurement: m, action: 'updated', actorId: actor.id, reason, old: diff.old, new: diff.new },
      transaction,
    );
    // One edit, one event: the recompute of a measurement covers its object's statements too.
    transaction.afterCommit(
      () => void catalogueEvents.emit('measurementChanged', { measurementId: m.id, skyObjectId: m.skyObjectId }),
    );
    return m;
  });
}

/**
 * Retires a measurement: it stays in the database and its history, no longer counts, and loses
 * its preferred mark if it had one.
 * @throws HttpError 409 when it was already retired
 */
export async function retireMeasurement(measurementId: string, reason: string, actor: User): Promise<Measurement> {
  return getSequelize().transaction(async (transaction) => {
    const m = await Measurement.findByPk(measurementId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!m || m.retiredAt) throw ConflictError('This measurement is already retired.', 'retired');
    const before = snapshotMeasurement(m);
    m.set({ preferred: false, retiredAt: new Date(), retiredById: actor.id, retireReason: reason });
    await m.save({ transaction });
    const diff = changedFields(before, snapshotMeasurement(m));
    await recordMeasurementHistory(
      { measurement: m, action: 'retired', actorId: actor.id, reason, old: diff.old, new: diff.new },
      transaction,
    );
    transaction.afterCommit(
      () => void catalogueEvents.emit('measurementChanged', { measurementId: m.id, skyObjectId: m.skyObjectId }),
    );
    return m;
  });
}
