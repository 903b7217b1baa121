import { Measurement, SkyObject, Source } from '../../server/models/index.ts';

let counter = 0;

/** Creates an object directly in the database (constellation left to the API tests that check it). */
export async function buildSkyObject(
  overrides: Partial<{
    name: string;
    kind: SkyObject['kind'];
    raDeg: number | null;
    decDeg: number | null;
    designations: string[];
  }> = {},
) {
  counter += 1;
  return SkyObject.create({
    name: overrides.name ?? `Test Object ${counter}-${Date.now()}`,
    designations: overrides.designations ?? [],
    kind: overrides.kind ?? 'galaxy',
    raDeg: overrides.raDeg === undefined ? 10 : overrides.raDeg,
    decDeg: overrides.decDeg === undefined ? 20 : overrides.decDeg,
    constellation: null,
    createdById: null,
  });
}

/** Creates a source. */
export async function buildSource(overrides: Partial<{ citation: string; bibcode: string | null; doi: string | null }> = {}) {
  counter += 1;
  return Source.create({
    citation: overrides.citation ?? `Example, A. (20${String(counter).padStart(2, '0')}), Test Journal ${counter}-${Date.now()}`,
    bibcode: overrides.bibcode ?? null,
    doi: overrides.doi ?? null,
    url: null,
    catalogueName: null,
    retrievedOn: null,
    createdById: null,
  });
}

/** Creates an accepted measurement directly (history is the services' job; tests of history go through the API). */
export async function buildMeasurement(
  skyObjectId: string,
  overrides: Partial<{ quantity: string; band: string | null; value: number; sourceId: string | null; preferred: boolean }> = {},
) {
  return Measurement.create({
    skyObjectId,
    quantity: overrides.quantity ?? 'redshift',
    band: overrides.band ?? null,
    value: overrides.value ?? 0.1,
    uncertainty: null,
    uncertaintyMinus: null,
    uncertaintyPlus: null,
    enteredValue: overrides.value ?? 0.1,
    enteredUnit: '',
    sourceId: overrides.sourceId === undefined ? null : overrides.sourceId,
    preferred: overrides.preferred ?? false,
    createdById: null,
  });
}
