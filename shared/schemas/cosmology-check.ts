import { createModel } from '../engine/cosmology/model.ts';
import { CalcModelSchema, type CalcModel } from './calc.ts';

/**
 * Which custom cosmologies an organisation can adopt, with the reason for a refusal in words a staff
 * member reads, on the field at fault. The same check runs in the settings form (as numbers are
 * typed) and in the API (preview and change), so the two never disagree.
 */

/** The custom model's fields as the settings form labels them. */
export const MODEL_FIELD_LABELS = {
  H0: 'H0 (km/s/Mpc)',
  Om0: 'Ωm (matter today)',
  Ode0: 'ΩΛ (dark energy today)',
  Tcmb0: 'CMB temperature (K)',
} as const;
export type ModelField = keyof typeof MODEL_FIELD_LABELS;

const fmt = (v: number) => v.toLocaleString('en-GB', { maximumSignificantDigits: 4 });

/**
 * Why a model cannot be adopted, per field; empty when it can.
 * Plausible ranges: H0 is measured near 67–74 km/s/Mpc and Ωm near 0.3 (recalled from memory);
 * the limits below are far wider, only keeping out values typed in the wrong field or unit.
 */
export function modelProblems(model: CalcModel): Partial<Record<ModelField, string>> {
  if ('preset' in model) return {};
  const problems: Partial<Record<ModelField, string>> = {};
  if (!(model.H0 > 0 && model.H0 <= 200))
    problems.H0 = `H0 is the expansion rate today, in km/s/Mpc: it must be above 0 and at most 200 (measurements give about 67 to 74); ${fmt(model.H0)} is outside that.`;
  if ('law' in model) return problems;
  if (!(model.Om0 >= 0 && model.Om0 <= 5))
    problems.Om0 = `Ωm is the share of matter today: it must be between 0 and 5 (measurements give about 0.3); ${fmt(model.Om0)} is outside that.`;
  if (model.Ode0 !== undefined && !(model.Ode0 >= 0 && model.Ode0 <= 5))
    problems.Ode0 = `ΩΛ is the share of dark energy today: it must be between 0 and 5 (measurements give about 0.7), or left empty for a flat model; ${fmt(model.Ode0)} is outside that.`;
  if (model.Tcmb0 !== undefined && !(model.Tcmb0 >= 0 && model.Tcmb0 <= 100))
    problems.Tcmb0 = `The CMB temperature today is measured at about 2.7255 K; use that, or 0 to leave radiation out (${fmt(model.Tcmb0)} K is outside 0 to 100).`;
  if (Object.keys(problems).length > 0) return problems;

  if (model.Ode0 === undefined && model.Om0 > 1)
    return {
      Om0: `In a flat model the shares add up to 1, so Ωm cannot be more than 1 (with ${fmt(model.Om0)}, dark energy would be negative). Lower Ωm, or give ΩΛ for a curved model.`,
    };
  let built: ReturnType<typeof createModel>;
  try {
    built = createModel({ name: model.name ?? 'custom', ...model });
  } catch {
    return { Om0: 'These values do not make a model Starproof can compute with; check Ωm and ΩΛ.' };
  }
  if (built.zBounce === 0)
    return {
      [model.Ode0 === undefined ? 'Om0' : 'Ode0']:
        `With Ωm = ${fmt(model.Om0)} and ΩΛ = ${fmt(built.Ode0)}, these values describe no universe expanding today. Lower ΩΛ or raise Ωm.`,
    };
  if (!built.hasBigBang)
    return {
      [model.Ode0 === undefined ? 'Om0' : 'Ode0']:
        `With this much dark energy (ΩΛ = ${fmt(built.Ode0)}) against matter (Ωm = ${fmt(model.Om0)}), the universe run backwards would stop shrinking${Number.isFinite(built.zBounce) ? ` at redshift ${fmt(built.zBounce)}` : ''} and grow again: it had no big bang, so distances to far objects cannot be worked out. Lower ΩΛ or raise Ωm.`,
    };
  return {};
}

/** A model an organisation can adopt: the calculator's model, with the problems above on their fields. */
export const AdoptableModelSchema = CalcModelSchema.superRefine((model, ctx) => {
  for (const [field, message] of Object.entries(modelProblems(model))) ctx.addIssue({ code: 'custom', path: [field], message });
});
