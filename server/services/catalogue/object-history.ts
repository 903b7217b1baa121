import type { MeasurementHistoryDto } from '@shared/schemas/measurement.ts';
import { Measurement, MeasurementHistory, User, type SkyObject } from '../../models/index.ts';
import { presentHistory } from '../../presenters/measurement.ts';

/** At most this many measurement events are listed (newest first); the object's creation always ends the list. */
const HISTORY_LIMIT = 500;

/**
 * An object's history, newest first: every measurement event, then the object's own creation (who and
 * when, from the object row, so objects added by hand, by a CSV import or by the demo all have it).
 * @param object the sky object
 */
export async function loadObjectHistory(object: SkyObject): Promise<MeasurementHistoryDto[]> {
  const [history, measurements, creator] = await Promise.all([
    MeasurementHistory.findAll({
      where: { skyObjectId: object.id },
      include: [{ model: User, as: 'changedBy', attributes: ['id', 'name'] }],
      order: [
        ['createdAt', 'DESC'],
        ['id', 'DESC'],
      ],
      limit: HISTORY_LIMIT,
    }),
    Measurement.findAll({ where: { skyObjectId: object.id }, attributes: ['id', 'quantity'] }),
    object.createdById ? User.findByPk(object.createdById, { attributes: ['name'] }) : null,
  ]);
  const quantityOf = new Map(measurements.map((m) => [m.id, m.quantity]));
  return [
    ...history.map((h) => presentHistory(h, quantityOf)),
    {
      id: `object-${object.id}`,
      measurementId: null,
      quantity: null,
      action: 'object_created',
      changedBy: creator?.name ?? null,
      reason: null,
      oldValues: null,
      newValues: { name: object.name, kind: object.kind },
      createdAt: object.createdAt.toISOString(),
    },
  ];
}
