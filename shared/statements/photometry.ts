/**
 * What the light-output and brightness templates share: the magnitude, the distance, and the two
 * corrections an astronomer would ask about — extinction by dust and the K-correction for the
 * redshift — each either measured, or shown to matter less than the result's own interval, or
 * (for the K-correction) an organisation default stated as an assumption, or asked for.
 *
 * The rules (written down in DEVELOPERS.md, "Statements an astronomer would sign"):
 * - K-correction. Without a spectral index the engine takes K = 0, which is the power law
 *   α = −1. Spectral indices of the objects we meet at such redshifts spread by about ±0.5 around
 *   that (quasar continua α ≈ −0.44, Vanden Berk et al. 2001, AJ 122, 549, with a scatter of a few
 *   tenths; recalled from memory), and a change Δα moves the magnitude by 2.5 Δα log10(1 + z).
 *   When that shift for Δα = 0.5 exceeds the half-width of the result's own 68 % interval (in
 *   magnitudes; 0.05 mag when the interval is unknown), the assumption would move the public number
 *   by more than its stated precision: the statement needs a spectral index. So the redshift limit
 *   is z_K = 10^(w / 1.25) − 1 for a half-width of w mag: z_K ≈ 0.096 for 0.05 mag, 0.20 for 0.1 mag.
 * - Extinction. For objects inside our Galaxy (stars, nebulae, clusters) farther than 100 pc, where
 *   dust dims starlight by roughly 1 mag per kiloparsec near the Galactic plane (common practice),
 *   a statement needs a measured extinction in its band; within about 100 pc (the Local Bubble)
 *   extinction is a few hundredths of a magnitude at most (recalled from memory) and is taken as 0,
 *   saying so. Galaxies and quasars: the Milky Way's own foreground dust is usually under 0.1 mag
 *   away from the Galactic plane (recalled from memory); taken as 0 unless measured, saying so.
 */
import { SOLAR_MAGNITUDES } from '../engine/solar-magnitudes.ts';
import type { CalcSuccess, MeasuredInput } from '../schemas/calc.ts';
import type { Step } from '../engine/working.ts';
import { KIND_LABELS, type SkyObjectKind } from '../catalogue/kinds.ts';
import { derivedStep } from './compose.ts';
import { asInput, distanceInputs, find, missing, requireDistance, runWithModel, type DistanceBasis, used } from './inputs.ts';
import type { StatementMeasurement, TemplateContext, UsedInput } from './types.ts';

/** How far a spectral index plausibly differs from the K = 0 assumption (α = −1). */
export const SPECTRAL_INDEX_SPREAD = 0.5;
/** The half-width (mag) assumed for a result whose interval is unknown. */
export const UNKNOWN_HALF_WIDTH_MAG = 0.05;
/** Galactic objects farther than this need a measured extinction (pc). */
export const EXTINCTION_FREE_PC = 100;
/** The kinds inside our Galaxy, for which extinction can be large. */
export const GALACTIC_KINDS: readonly SkyObjectKind[] = ['star', 'nebula', 'cluster'];

/**
 * How much the K = 0 assumption can move a magnitude at this redshift.
 * @param z redshift
 * @returns 2.5 Δα log10(1 + z) for Δα = SPECTRAL_INDEX_SPREAD, in mag
 */
export function kAssumptionShiftMag(z: number): number {
  return 2.5 * SPECTRAL_INDEX_SPREAD * Math.log10(1 + z);
}

/**
 * The redshift above which a statement with this half-width needs a spectral index.
 * @param halfWidthMag the result's 68 % half-width in magnitudes (null: unknown)
 */
export function kCorrectionRedshiftLimit(halfWidthMag: number | null): number {
  return 10 ** ((halfWidthMag ?? UNKNOWN_HALF_WIDTH_MAG) / (2.5 * SPECTRAL_INDEX_SPREAD)) - 1;
}

/** The apparent magnitude to use: in the organisation's band if there is one, else any band with a known solar magnitude. */
export function pickMagnitude(ctx: TemplateContext) {
  return (
    find(ctx, 'apparent_magnitude', ctx.band) ??
    ctx.measurements.find((m) => m.quantity === 'apparent_magnitude' && m.band && SOLAR_MAGNITUDES[m.band])
  );
}

function distancePc(basis: DistanceBasis): number | null {
  if (basis.kind === 'distance') return basis.measurement.value;
  if (basis.kind === 'parallax') return basis.measurement.value > 0 ? 1000 / basis.measurement.value : null;
  return null;
}

/** A magnitude-based engine run with everything the statement must show about its corrections. */
export interface PhotometryRun {
  r: CalcSuccess;
  mag: StatementMeasurement & { band: string };
  basis: DistanceBasis;
  inputs: UsedInput[];
  /** Steps that explain the corrections' rules, appended after the engine's working. */
  steps: Step[];
  warnings: string[];
}

/**
 * Runs a magnitude quantity (absolute magnitude or luminosity ratio) with the rules above.
 * @param ctx the template context
 * @param quantity the engine quantity
 * @param halfWidthMag reads the result's half-width in magnitudes from the run
 * @throws TemplateProblem (missing input) when a measurement the rules ask for is missing
 */
export function photometryRun(
  ctx: TemplateContext,
  quantity: 'absolute_magnitude' | 'luminosity_ratio_sun',
  halfWidthMag: (r: CalcSuccess) => number | null,
): PhotometryRun {
  const mag = pickMagnitude(ctx);
  if (!mag?.band)
    throw missing(
      ['apparent_magnitude'],
      `Needs a preferred apparent magnitude in the ${ctx.band} band (or another band with a known solar magnitude).`,
    );
  const band = mag.band;
  const basis = requireDistance(ctx);
  const kindLabel = KIND_LABELS[ctx.object.kind as SkyObjectKind]?.toLowerCase() ?? ctx.object.kind;
  const extinction = find(ctx, 'extinction', band);
  const steps: Step[] = [];
  const warnings: string[] = [];
  const pc = distancePc(basis);
  if (!extinction && GALACTIC_KINDS.includes(ctx.object.kind as SkyObjectKind) && pc !== null && pc > EXTINCTION_FREE_PC) {
    throw missing(
      ['extinction'],
      `Needs input: a preferred extinction in the ${band} band. ${ctx.object.name} is a ${kindLabel} about ${Math.round(pc)} pc away, beyond the ${EXTINCTION_FREE_PC} pc within which interstellar dust is negligible; without it the light would be understated by an unknown amount.`,
    );
  }
  const alpha = basis.kind === 'z' ? find(ctx, 'spectral_index') : undefined;
  const request = (extra: { alpha?: MeasuredInput }) =>
    runWithModel(ctx, {
      quantity,
      inputs: {
        m: asInput(mag),
        ...(quantity === 'luminosity_ratio_sun' ? { band } : {}),
        ...distanceInputs(basis),
        ...(extinction ? { extinction: asInput(extinction) } : {}),
        ...(alpha ? { alpha: asInput(alpha) } : {}),
        ...extra,
      },
      model: ctx.model,
    });
  let r = request({});
  if (basis.kind === 'z' && !alpha) {
    const z = basis.measurement.value;
    const w = halfWidthMag(r);
    const shift = kAssumptionShiftMag(z);
    const limit = kCorrectionRedshiftLimit(w);
    const matters = shift > (w ?? UNKNOWN_HALF_WIDTH_MAG);
    const fallback = ctx.assumptions?.spectralIndex?.[ctx.object.kind as SkyObjectKind];
    if (matters && !fallback) {
      throw missing(
        ['spectral_index'],
        `Needs input: a preferred spectral index (α) for ${ctx.object.name}. At z = ${z} the K-correction it sets can move the result by ${shift.toFixed(2)} mag, more than the result’s own uncertainty (${(w ?? UNKNOWN_HALF_WIDTH_MAG).toFixed(2)} mag); from z = ${limit.toFixed(3)} on a spectral index is needed. Or name a default spectral index for ${kindLabel}s, with its source, in the organisation settings.`,
      );
    }
    const rule = derivedStep({
      title: 'K-correction: is a spectral index needed?',
      formula: 'shift = 2.5 Δα log10(1 + z); needed when shift > w (z_K = 10^(w / (2.5 Δα)) − 1)',
      inputs: [
        {
          symbol: 'z',
          name: 'redshift',
          value: z,
          unit: '',
          source: `${basis.measurement.source.citation} (measurement ${basis.measurement.id})`,
        },
        {
          symbol: 'Δα',
          name: 'how far a real spectral index may lie from α = −1 (K = 0)',
          value: SPECTRAL_INDEX_SPREAD,
          unit: '',
          source:
            'quasar continua α ≈ −0.44 with a scatter of a few tenths (Vanden Berk et al. 2001, AJ 122, 549; recalled from memory); our rule',
        },
        {
          symbol: 'w',
          name:
            w === null
              ? 'half-width of the result (unknown: our rule takes 0.05 mag)'
              : 'half-width of the result’s 68 % interval',
          value: w ?? UNKNOWN_HALF_WIDTH_MAG,
          unit: 'mag',
          source: 'previous steps',
        },
      ],
      result: { symbol: 'shift', name: 'largest plausible shift from the K = 0 assumption', value: shift, unit: 'mag' },
      note: matters
        ? `Above z_K = ${limit.toFixed(3)}: the assumption would move the result by more than its own uncertainty, so the organisation’s default spectral index for ${kindLabel}s is used, as an assumption.`
        : `Below z_K = ${limit.toFixed(3)}: taking K = 0 (α = −1) moves the result by less than its own uncertainty.`,
    });
    steps.push(rule);
    if (matters && fallback) {
      // A default is a typical value, not this object's: without a stated spread it carries the
      // rule's own (±0.5), so the interval, and the figures shown, admit how much it may be off.
      const sigma = fallback.sigma ?? SPECTRAL_INDEX_SPREAD;
      const spreadNote = fallback.sigma == null ? `; spread ±${SPECTRAL_INDEX_SPREAD} assumed (none given)` : '';
      const source = `ASSUMPTION — the organisation’s default spectral index for ${kindLabel}s (no measured one): ${fallback.source}${spreadNote}`;
      r = request({ alpha: { value: fallback.value, sigma, source } });
      warnings.push(
        `Assumed spectral index α = ${fallback.value} for ${kindLabel}s (organisation setting; ${fallback.source}): ${ctx.object.name} has no measured one.`,
      );
    }
  }
  return {
    r,
    mag: mag as StatementMeasurement & { band: string },
    basis,
    inputs: [mag, basis.measurement, extinction, alpha].filter((m) => m !== undefined).map(used),
    steps,
    warnings: [...r.warnings, ...warnings],
  };
}
