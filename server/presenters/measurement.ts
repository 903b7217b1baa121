import { findQuantity } from '@shared/catalogue/quantities.ts';
import type { MeasurementDto, MeasurementHistoryDto } from '@shared/schemas/measurement.ts';
import type { Measurement, MeasurementHistory, User } from '../models/index.ts';
import { can } from '../policies/index.ts';
import { presentSourceRef } from './source.ts';

/** The API contract for a measurement; load it with its source, createdBy and reviewedBy. */
export function presentMeasurement(m: Measurement, viewer: User): MeasurementDto {
  return {
    id: m.id,
    objectId: m.skyObjectId,
    quantity: m.quantity,
    band: m.band,
    value: m.value,
    unit: findQuantity(m.quantity)?.canonicalUnit ?? '',
    uncertainty: m.uncertainty,
    uncertaintyMinus: m.uncertaintyMinus,
    uncertaintyPlus: m.uncertaintyPlus,
    enteredValue: m.enteredValue,
    enteredUnit: m.enteredUnit,
    source: m.source ? presentSourceRef(m.source) : null,
    preferred: m.preferred,
    status: m.status,
    retired: !!m.retiredAt,
    retireReason: m.retireReason,
    reviewReason: m.reviewReason,
    note: m.note,
    createdBy: m.createdBy?.name ?? null,
    createdAt: m.createdAt.toISOString(),
    reviewedBy: m.reviewedBy?.name ?? null,
    reviewedAt: m.reviewedAt?.toISOString() ?? null,
    can: {
      update: can(viewer, 'catalogue', 'updateMeasurement', m),
      prefer: can(viewer, 'catalogue', 'preferMeasurement', m),
      review: can(viewer, 'catalogue', 'reviewMeasurement', m),
      retire: can(viewer, 'catalogue', 'retireMeasurement', m),
    },
  };
}

/** One history row; the quantity is looked up from the measurement ids the page already has. */
export function presentHistory(h: MeasurementHistory, quantityOf: Map<string, string>): MeasurementHistoryDto {
  return {
    id: String(h.id),
    measurementId: h.measurementId,
    quantity: quantityOf.get(h.measurementId) ?? null,
    action: h.action,
    changedBy: h.changedBy?.name ?? null,
    reason: h.reason,
    oldValues: h.oldValues,
    newValues: h.newValues,
    createdAt: h.createdAt.toISOString(),
  };
}
