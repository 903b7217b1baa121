/**
 * How many significant figures a public number may show, from its 68 % interval.
 *
 * The rule (our own, written down so reviewers can check it):
 * - relative uncertainty above 30 %  → 1 significant figure. Rounding to one figure already moves a
 *   number by up to 5–50 %, about the size of the uncertainty, so a second figure would be noise.
 * - from 3 % to 30 %                 → 2 significant figures (rounding step 0.5–5 %).
 * - below 3 %                        → 3 significant figures. We stop at three even for very precise
 *   values: a visitor gains nothing from a fourth, and kiosk lines stay short.
 * - no uncertainty known             → 2 significant figures, and the working says the precision is
 *   unknown (common practice: catalogue values quoted without errors are usually good to a few per cent;
 *   two figures neither overstates nor throws that away).
 */
export interface PrecisionChoice {
  significantFigures: number;
  /** Half the interval's width over the value; null when unknown. */
  relativeUncertainty: number | null;
  /** One sentence for the working. */
  reason: string;
}

/**
 * Chooses the significant figures for a value with an optional 68 % interval.
 * @param value the central value
 * @param interval the 68 % interval, if the inputs had uncertainties
 */
export function choosePrecision(value: number, interval?: { low: number; high: number } | null): PrecisionChoice {
  if (!interval || value === 0) {
    return {
      significantFigures: 2,
      relativeUncertainty: null,
      reason:
        'No uncertainty is known for the inputs, so the precision is unknown; shown to 2 significant figures (our rule for unknown precision).',
    };
  }
  const halfWidth = Math.max(Math.abs(interval.high - value), Math.abs(value - interval.low));
  const relative = halfWidth / Math.abs(value);
  const pct = (relative * 100).toPrecision(2);
  if (relative > 0.3)
    return {
      significantFigures: 1,
      relativeUncertainty: relative,
      reason: `Relative uncertainty ${pct} % (above 30 %): 1 significant figure.`,
    };
  if (relative >= 0.03)
    return {
      significantFigures: 2,
      relativeUncertainty: relative,
      reason: `Relative uncertainty ${pct} % (3–30 %): 2 significant figures.`,
    };
  return {
    significantFigures: 3,
    relativeUncertainty: relative,
    reason: `Relative uncertainty ${pct} % (below 3 %): 3 significant figures.`,
  };
}

/** Rounds to n significant figures (for comparing and storing the shown value). */
export function roundToSignificant(value: number, n: number): number {
  if (value === 0 || !Number.isFinite(value)) return value;
  return Number(value.toPrecision(n));
}
