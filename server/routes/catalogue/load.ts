import { IdSchema } from '@shared/schemas/common.ts';
import { Measurement, SkyObject, Source, User } from '../../models/index.ts';

const valid = (id: unknown): id is string => IdSchema.safeParse(id).success;

/** Loads an object by the id in the URL; a malformed or unknown id loads nothing (the route answers 404). */
export async function findSkyObject(id: unknown): Promise<SkyObject | null> {
  return valid(id) ? SkyObject.findByPk(id) : null;
}

/** Loads a measurement with what its presenter shows (source, who entered it, who reviewed it). */
export async function findMeasurement(id: unknown): Promise<Measurement | null> {
  if (!valid(id)) return null;
  return Measurement.findByPk(id, { include: measurementIncludes() });
}

/** Loads a source by the id in the URL. */
export async function findSource(id: unknown): Promise<Source | null> {
  return valid(id) ? Source.findByPk(id) : null;
}

/** The associations a measurement's presenter reads. */
export function measurementIncludes() {
  return [
    { model: Source, as: 'source' },
    { model: User, as: 'createdBy', attributes: ['id', 'name'] },
    { model: User, as: 'reviewedBy', attributes: ['id', 'name'] },
  ];
}
