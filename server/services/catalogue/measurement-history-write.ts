import type { Transaction } from 'sequelize';
import { MeasurementHistory, type Measurement } from '../../models/index.ts';
import type { MeasurementHistoryAction, MeasurementSnapshot } from '../../models/measurement-history.ts';

/** The fields of a measurement that history keeps: everything a person can change. */
export function snapshotMeasurement(m: Measurement): MeasurementSnapshot {
  return {
    quantity: m.quantity,
    band: m.band,
    value: m.value,
    uncertainty: m.uncertainty,
    uncertaintyMinus: m.uncertaintyMinus,
    uncertaintyPlus: m.uncertaintyPlus,
    enteredValue: m.enteredValue,
    enteredUnit: m.enteredUnit,
    sourceId: m.sourceId,
    preferred: m.preferred,
    status: m.status,
    note: m.note,
    retired: !!m.retiredAt,
  };
}

/** Keeps only the fields that differ, so a history row reads as "what changed". */
export function changedFields(
  before: MeasurementSnapshot,
  after: MeasurementSnapshot,
): { old: MeasurementSnapshot; new: MeasurementSnapshot } {
  const old: MeasurementSnapshot = {};
  const next: MeasurementSnapshot = {};
  for (const key of Object.keys(after)) {
    if (before[key] !== after[key]) {
      old[key] = before[key] ?? null;
      next[key] = after[key] ?? null;
    }
  }
  return { old, new: next };
}

/**
 * Appends one history row in the caller's transaction, so the change and its trace commit together.
 * @param props what happened to which measurement, by whom, with the values before and after
 * @param transaction the transaction that makes the change
 */
export async function recordMeasurementHistory(
  props: {
    measurement: Measurement;
    action: MeasurementHistoryAction;
    actorId: string | null;
    reason?: string | null;
    old: MeasurementSnapshot | null;
    new: MeasurementSnapshot | null;
  },
  transaction: Transaction,
): Promise<void> {
  await MeasurementHistory.create(
    {
      measurementId: props.measurement.id,
      skyObjectId: props.measurement.skyObjectId,
      action: props.action,
      changedById: props.actorId,
      reason: props.reason ?? null,
      oldValues: props.old,
      newValues: props.new,
    },
    { transaction },
  );
}
