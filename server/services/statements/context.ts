import type { StatementMeasurement, TemplateContext } from '@shared/statements/index.ts';
import type { CalcModel } from '@shared/schemas/calc.ts';
import { getPreferredMeasurements } from '../preferred-measurements.ts';

/** The organisation's choices a statement depends on. */
export interface SettingsSnapshot {
  model: CalcModel;
  band: string;
  version: number;
}

/**
 * Builds what a template reads: the object's preferred measurements (values in canonical units,
 * each with its source) and the organisation's model and band.
 */
export async function buildTemplateContext(object: { id: string; name: string; kind: string }, settings: SettingsSnapshot): Promise<TemplateContext> {
  const preferred = await getPreferredMeasurements(object.id);
  const measurements: StatementMeasurement[] = preferred.map((m) => ({
    id: m.measurementId,
    quantity: m.quantity,
    value: m.value,
    unit: m.unit,
    band: m.band ?? null,
    sigma: m.uncertainty?.kind === 'symmetric' ? m.uncertainty.sigma : null,
    minus: m.uncertainty?.kind === 'asymmetric' ? m.uncertainty.minus : null,
    plus: m.uncertainty?.kind === 'asymmetric' ? m.uncertainty.plus : null,
    source: { id: m.source.id, citation: m.source.citation },
  }));
  return { object: { id: object.id, name: object.name, kind: object.kind }, measurements, model: settings.model, band: settings.band };
}
