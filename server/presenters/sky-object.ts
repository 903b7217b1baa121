import type { SkyObjectDto } from '@shared/schemas/sky-object.ts';
import type { SkyObject, User } from '../models/index.ts';
import { can } from '../policies/index.ts';

/** The API contract for an object, with what the viewer may do. */
export function presentSkyObject(object: SkyObject, viewer: User): SkyObjectDto {
  return {
    id: object.id,
    name: object.name,
    designations: object.designations,
    kind: object.kind,
    raDeg: object.raDeg,
    decDeg: object.decDeg,
    constellation: object.constellation,
    notes: object.notes,
    sentenceNames: object.sentenceNames ?? {},
    createdAt: object.createdAt.toISOString(),
    updatedAt: object.updatedAt.toISOString(),
    can: {
      update: can(viewer, 'catalogue', 'editObject'),
      delete: can(viewer, 'catalogue', 'editObject'),
      addMeasurement: can(viewer, 'catalogue', 'addMeasurement'),
      proposeMeasurement: can(viewer, 'catalogue', 'proposeMeasurement'),
    },
  };
}
