import { Measurement, SkyObject, Source, type User } from '../../server/models/index.ts';

let counter = 0;

/** A source for test measurements (named as such, never publishable). */
export async function buildSource(citation = 'Test values for automated checks') {
  return Source.create({
    citation: `${citation} ${++counter}`,
    bibcode: null,
    doi: null,
    url: null,
    catalogueName: null,
    retrievedOn: null,
    createdById: null,
  });
}

/** An object with preferred measurements given as { quantity: [value, sigma?, band?] }. */
export async function buildObjectWithMeasurements(
  name: string,
  kind: SkyObject['kind'],
  measurements: Array<{ quantity: string; value: number; sigma?: number; band?: string; unit: string }>,
  creator: User,
) {
  const source = await buildSource();
  const object = await SkyObject.create({
    name: `${name} ${++counter}`,
    kind,
    raDeg: null,
    decDeg: null,
    constellation: null,
    createdById: creator.id,
  });
  const rows = [];
  for (const m of measurements) {
    rows.push(
      await Measurement.create({
        skyObjectId: object.id,
        quantity: m.quantity,
        band: m.band ?? null,
        value: m.value,
        uncertainty: m.sigma ?? null,
        uncertaintyMinus: null,
        uncertaintyPlus: null,
        enteredValue: m.value,
        enteredUnit: m.unit,
        sourceId: source.id,
        preferred: true,
        status: 'accepted',
        createdById: creator.id,
      }),
    );
  }
  return { object, source, measurements: rows };
}
