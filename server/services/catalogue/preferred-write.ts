import { Op, UniqueConstraintError, type Transaction } from 'sequelize';
import { findQuantity } from '@shared/catalogue/quantities.ts';
import type { MeasurementPreferredInput } from '@shared/schemas/measurement.ts';
import { getSequelize } from '../../db.ts';
import { ConflictError } from '../../errors.ts';
import { Measurement, type User } from '../../models/index.ts';
import { catalogueEvents } from './events.ts';
import { requireConfirmation, statementsUsingParallax } from './measurement-confirmation.ts';
import { changedFields, recordMeasurementHistory, snapshotMeasurement } from './measurement-history-write.ts';

/** True when an error is the database refusing a second preferred value for one quantity and band. */
export function isPreferredIndexViolation(error: unknown): boolean {
  if (!(error instanceof UniqueConstraintError)) return false;
  const constraint = (error.parent as { constraint?: string } | undefined)?.constraint;
  return constraint === 'measurements_one_preferred';
}

function label(m: Measurement): string {
  const quantity = findQuantity(m.quantity)?.label.toLowerCase() ?? m.quantity;
  return m.band ? `${quantity} in ${m.band}` : quantity;
}

const raceLost = (m: Measurement) =>
  ConflictError(
    `Another reviewer has just chosen the preferred ${label(m)} for this object. Reload the page to see their choice before changing it.`,
    'preferred_changed',
  );

async function setFlag(m: Measurement, preferred: boolean, actor: User, transaction: Transaction) {
  const before = snapshotMeasurement(m);
  m.set({ preferred });
  await m.save({ transaction });
  const diff = changedFields(before, snapshotMeasurement(m));
  await recordMeasurementHistory(
    { measurement: m, action: preferred ? 'preferred' : 'unpreferred', actorId: actor.id, old: diff.old, new: diff.new },
    transaction,
  );
}

/**
 * A parallax of zero or below gives no distance: before it is made preferred, the reviewer reads
 * which statements will no longer work out, and confirms.
 * @throws HttpError 409 `confirmation_needed` until confirmed
 */
async function confirmNegativeParallax(measurementId: string, input: MeasurementPreferredInput): Promise<void> {
  if (!input.preferred || input.confirm) return;
  const m = await Measurement.findByPk(measurementId, { attributes: ['id', 'skyObjectId', 'quantity', 'value', 'preferred'] });
  if (m?.quantity !== 'parallax' || m.value > 0 || m.preferred) return;
  const statements = await statementsUsingParallax(m.skyObjectId);
  const count = statements.length;
  requireConfirmation(
    false,
    [
      {
        code: 'negative_parallax',
        message:
          count === 0
            ? 'This parallax is zero or below, so it gives no distance. No statement of this object uses a parallax today; any added later cannot work out a distance from it.'
            : `This parallax is zero or below, so it gives no distance. Made preferred, it leaves ${count} statement${count === 1 ? '' : 's'} of this object without a distance (shown as broken until another parallax is preferred).`,
      },
    ],
    statements,
  );
}

/**
 * Marks a measurement as the preferred one for its object, quantity and band (unmarking the one it
 * replaces), or unmarks it. When `replaces` is given and the current preferred measurement is not
 * that one, another reviewer got there first: 409. Two simultaneous requests that both pass that
 * check meet the database's partial unique index, and the later one also gets 409.
 * @throws HttpError 409 (preferred_changed, needs_source, retired, not_accepted, confirmation_needed)
 */
export async function setPreferred(measurementId: string, input: MeasurementPreferredInput, actor: User): Promise<Measurement> {
  await confirmNegativeParallax(measurementId, input);
  try {
    return await getSequelize().transaction(async (transaction) => {
      const m = await Measurement.findByPk(measurementId, { transaction, lock: transaction.LOCK.UPDATE });
      if (!m || m.retiredAt) throw ConflictError('This measurement has been retired; it cannot be preferred.', 'retired');
      if (m.status !== 'accepted')
        throw ConflictError('Only an accepted measurement can be preferred; review the proposal first.', 'not_accepted');
      if (input.preferred && !m.sourceId)
        throw ConflictError('A measurement without a source cannot be preferred. Add its source first.', 'needs_source');

      const current = await Measurement.findOne({
        where: { skyObjectId: m.skyObjectId, quantity: m.quantity, band: m.band ?? { [Op.is]: null }, preferred: true },
        transaction,
        lock: transaction.LOCK.UPDATE,
      });
      if (input.replaces !== undefined && (current?.id ?? null) !== input.replaces && current?.id !== m.id) throw raceLost(m);
      if (input.preferred === m.preferred) return m;

      if (input.preferred && current && current.id !== m.id) await setFlag(current, false, actor, transaction);
      await setFlag(m, input.preferred, actor, transaction);
      transaction.afterCommit(
        () => void catalogueEvents.emit('preferredChanged', { skyObjectId: m.skyObjectId, quantity: m.quantity, band: m.band }),
      );
      return m;
    });
  } catch (error) {
    if (isPreferredIndexViolation(error)) {
      const m = await Measurement.findByPk(measurementId);
      throw raceLost(m!);
    }
    throw error;
  }
}
