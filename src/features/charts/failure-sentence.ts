/**
 * The chart's one-sentence reading: what the simple Hubble law says at the
 * object's redshift against the distances a cosmology model gives, in numbers.
 */
import { formatGly, formatMpc, formatZ } from './chart-parts.tsx';
import { HUBBLE_KEY, MEASURES, seriesKey, type ChartModel, type ChartRow } from './distance-curves.ts';

// When cz/H0 is within this fraction of every distance measure, the law is called a fair guide
// (for the usual models that holds below z of a few hundredths).
const FAIR_GUIDE = 0.05;

/**
 * The model whose curves carry the object's point: the chosen one, or the first
 * alternative when the chosen model is the Hubble law (which has no curves of its own).
 */
export function pointModel(chosen: ChartModel, others: ChartModel[]): ChartModel | undefined {
  return chosen.cosmo ? chosen : others.find((m) => m.cosmo);
}

const pct = (x: number): number => Math.max(1, Math.round(100 * Math.abs(x)));

/**
 * Says how far the simple Hubble law is from each distance of the model at the object's redshift.
 * @param z the object's redshift
 * @param object the chart row evaluated at z
 * @param chosen the chosen model
 * @param others the alternatives
 * @param hubbleH0 H0 of the Hubble-law line
 * @returns two or three sentences
 */
export function failureSentence(z: number, object: ChartRow, chosen: ChartModel, others: ChartModel[], hubbleH0: number): string {
  const law = object[HUBBLE_KEY] as number;
  const lawText = `At z = ${formatZ(z)} the simple Hubble law (H₀ = ${hubbleH0}) gives ${formatMpc(law)} (${formatGly(law)})`;
  const ref = pointModel(chosen, others);
  if (!ref) return `${lawText}. Add a cosmology model to compare it with.`;
  const [lum, proper, travel] = MEASURES.map((m) => object[seriesKey(ref.key, m)]);
  if (typeof proper !== 'number' || typeof lum !== 'number' || typeof travel !== 'number') {
    return `${lawText}; ${ref.label} is not defined at this redshift.`;
  }
  const under = ref === chosen ? `Under ${ref.label}` : `Under ${ref.label}, for comparison,`;
  const offs = [lum, proper, travel].map((d) => law / d - 1);
  const worst = Math.max(...offs.map(Math.abs));
  const distances =
    `${under} the luminosity distance is ${formatMpc(lum)}, the proper distance today ${formatMpc(proper)} ` +
    `and the light-travel distance ${formatMpc(travel)} (${formatGly(travel)})`;
  if (worst < FAIR_GUIDE)
    return `${lawText}. ${distances}: all within ${pct(worst)} % of it, so this close the law is a fair guide.`;
  const properOff = offs[1];
  return (
    `${lawText}. ${distances}. The distance measures no longer agree with each other, and cz/H₀ is up to ${pct(worst)} % from them ` +
    `(it ${properOff > 0 ? 'overstates' : 'understates'} the distance today by ${pct(properOff)} %).`
  );
}
