import { Measurement, Source } from '../../models/index.ts';
import { findQuantity } from '@shared/catalogue/quantities.ts';

/** A preferred measurement with its source, as statements use it. */
export interface PreferredMeasurement {
  measurementId: string;
  skyObjectId: string;
  quantity: string;
  band: string | null;
  /** In the quantity's canonical unit (see shared/catalogue/quantities.ts). */
  value: number;
  unit: string;
  uncertainty: { kind: 'symmetric'; sigma: number } | { kind: 'asymmetric'; minus: number; plus: number } | null;
  source: { id: string; citation: string; bibcode: string | null; doi: string | null; url: string | null };
  updatedAt: Date;
}

/**
 * Every preferred measurement of an object (one per quantity and band), each with its source.
 * Preferred measurements always have a source: the database refuses one without.
 * @param skyObjectId the sky object's id
 * @returns the preferred measurements, ordered by quantity then band
 */
export async function getPreferredMeasurements(skyObjectId: string): Promise<PreferredMeasurement[]> {
  const rows = await Measurement.findAll({
    where: { skyObjectId, preferred: true },
    include: [{ model: Source, as: 'source', required: true }],
    order: [
      ['quantity', 'ASC'],
      ['band', 'ASC'],
    ],
  });
  return rows.map((m) => {
    const source = m.source!;
    let uncertainty: PreferredMeasurement['uncertainty'] = null;
    if (m.uncertainty !== null) uncertainty = { kind: 'symmetric', sigma: m.uncertainty };
    else if (m.uncertaintyMinus !== null && m.uncertaintyPlus !== null)
      uncertainty = { kind: 'asymmetric', minus: m.uncertaintyMinus, plus: m.uncertaintyPlus };
    return {
      measurementId: m.id,
      skyObjectId: m.skyObjectId,
      quantity: m.quantity,
      band: m.band,
      value: m.value,
      unit: findQuantity(m.quantity)?.canonicalUnit ?? '',
      uncertainty,
      source: { id: source.id, citation: source.citation, bibcode: source.bibcode, doi: source.doi, url: source.url },
      updatedAt: m.updatedAt,
    };
  });
}
