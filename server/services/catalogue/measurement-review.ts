import type { MeasurementReviewInput } from '@shared/schemas/measurement.ts';
import { getSequelize } from '../../db.ts';
import { ConflictError } from '../../errors.ts';
import { Measurement, type User } from '../../models/index.ts';
import { catalogueEvents } from './events.ts';
import { changedFields, recordMeasurementHistory, snapshotMeasurement } from './measurement-history-write.ts';

/**
 * A reviewer accepts or declines a proposed measurement, with who, when and why.
 * @throws HttpError 409 when someone else has reviewed it meanwhile
 */
export async function reviewMeasurement(measurementId: string, input: MeasurementReviewInput, actor: User): Promise<Measurement> {
  return getSequelize().transaction(async (transaction) => {
    const m = await Measurement.findByPk(measurementId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!m || m.retiredAt || m.status !== 'proposed')
      throw ConflictError('This proposal has already been reviewed; reload the page.', 'already_reviewed');
    const before = snapshotMeasurement(m);
    const status = input.decision === 'accept' ? 'accepted' : 'declined';
    m.set({ status, reviewedById: actor.id, reviewedAt: new Date(), reviewReason: input.reason || null });
    await m.save({ transaction });
    const diff = changedFields(before, snapshotMeasurement(m));
    await recordMeasurementHistory(
      { measurement: m, action: status, actorId: actor.id, reason: input.reason || null, old: diff.old, new: diff.new },
      transaction,
    );
    transaction.afterCommit(
      () => void catalogueEvents.emit('measurementChanged', { measurementId: m.id, skyObjectId: m.skyObjectId }),
    );
    return m;
  });
}
