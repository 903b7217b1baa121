/**
 * The calculation contract: `calculate(request)` validates an untrusted request,
 * computes the quantity with its working and, when inputs carry uncertainties,
 * a 68 % interval. It never throws and never returns NaN or Infinity: every
 * failure becomes `{ error: { code, message } }`.
 */
import type { CalcQuantity, CalcRequest, CalcResult, CalcSuccess, MeasuredInput } from '../schemas/calc.ts';
import { CalcError } from './errors.ts';
import { resolveModel } from './model-resolve.ts';
import { INPUT_INFO, type Ctx } from './quantities/context.ts';
import type { Values } from './quantities/photometry.ts';
import { QUANTITY_SPECS, checkInputs } from './quantities/registry.ts';
import { parseRequest, requestId } from './request.ts';
import { bounded, H0_KEY, LOWER_BOUND, quantityInterval } from './interval.ts';
import { boundMass, SAMPLES, SEED, type Measurement } from './uncertainty.ts';
import { conversionsFor } from './units.ts';
import { hubbleLawWarning } from './hubble-law.ts';
import { HUBBLE_LAW_TOLERANCE, hubbleLawMaxZ, referenceModel } from './hubble-law-limit.ts';
import type { Step } from './working.ts';

// More failed draws than this and an interval would misrepresent the uncertainty.
const MAX_FAILED_FRACTION = 0.01;

/**
 * Above this fractional parallax error, 1/ϖ is refused as a distance: the inverse of a noisy
 * parallax is a biased estimator with a skewed, heavy-tailed error, and beyond f = σ_ϖ/ϖ ≈ 0.2 it is
 * a poor guide to the distance (Bailer-Jones 2015, PASP 127, 994, "Estimating distances from
 * parallaxes"); a distance then needs a prior on the star's distribution, which we do not assume.
 */
export const MAX_PARALLAX_FRACTIONAL_ERROR = 0.2;

/** Refuses a parallax too uncertain to invert, with the reason and the source of the rule. */
function checkParallax(m: Measurement | undefined): void {
  if (!m || !(m.value > 0)) return;
  const f = Math.max(m.minus, m.plus) / m.value;
  if (f > MAX_PARALLAX_FRACTIONAL_ERROR) {
    throw new CalcError(
      'poor_parallax',
      `parallax_mas = ${m.value} ± ${Math.max(m.minus, m.plus)} has a fractional error of ${f.toPrecision(2)}, above ${MAX_PARALLAX_FRACTIONAL_ERROR}: its inverse is not a usable distance (Bailer-Jones 2015, PASP 127, 994); give a distance or a more precise parallax`,
    );
  }
}

function toMeasurement(x: MeasuredInput): Measurement {
  if (typeof x === 'number') return { value: x, minus: 0, plus: 0, source: 'request' };
  const source = x.source ?? 'request';
  if ('minus' in x) return { value: x.value, minus: x.minus, plus: x.plus, source };
  return { value: x.value, minus: x.sigma ?? 0, plus: x.sigma ?? 0, source };
}

function h0Measurement(req: CalcRequest, H0: number): Measurement | undefined {
  const r = req.H0_range;
  if (r === undefined) return undefined;
  if (!(r.low > 0 && r.low <= H0 && H0 <= r.high)) {
    throw new CalcError(
      'invalid_model',
      `H0_range must satisfy 0 < low ≤ H0 ≤ high with H0 = ${H0} (got low ${r.low}, high ${r.high})`,
    );
  }
  return { value: H0, minus: H0 - r.low, plus: r.high - H0, source: 'H0_range in the request' };
}

const H0_INFO = { symbol: 'H₀', name: 'Hubble constant', unit: 'km/s/Mpc' };
/** An input's symbol, name and unit as the working shows them (the request's key only for one unknown here). */
const infoOf = (key: string) => (key === H0_KEY ? H0_INFO : (INPUT_INFO[key] ?? { symbol: key, name: key, unit: '' }));

function uncertaintyStep(
  measured: Record<string, Measurement>,
  low: number,
  high: number,
  unit: string,
  failed: Map<string, number>,
): Step {
  const failedCount = [...failed.values()].reduce((a, b) => a + b, 0);
  const failedNote =
    failedCount > 0
      ? ` ${failedCount} of ${SAMPLES} draws fell where the result is not defined (${[...failed].map(([k, n]) => `${n} from ${infoOf(k).symbol}`).join(', ')}) and are left out of the percentiles; the interval is from the other ${SAMPLES - failedCount}.`
      : '';
  const bounds = Object.entries(measured)
    .filter(([k, m]) => (m.minus > 0 || m.plus > 0) && LOWER_BOUND[k] !== undefined && boundMass(bounded(k, m)) > 0)
    .map(([k]) => `${infoOf(k).symbol} ≥ ${LOWER_BOUND[k]}`);
  const boundNote =
    bounds.length > 0
      ? ` Draws respect the physical bound${bounds.length > 1 ? 's' : ''} ${bounds.join(', ')}: the two-piece normal is truncated there (drawn conditioned on lying above it).`
      : '';
  const varied = Object.entries(measured).filter(([, m]) => m.minus > 0 || m.plus > 0);
  return {
    title: 'Uncertainty: 68 % interval by Monte Carlo propagation',
    formula: 'interval = [16th, 84th] percentile of the result over random draws of the inputs',
    inputs: varied.map(([k, m]) => {
      // Named as in the other steps (ϖ, parallax), never by the request's key (parallax_mas).
      const info = infoOf(k);
      const spread = m.minus === m.plus ? `± ${m.plus}` : `−${m.minus} +${m.plus}`;
      return {
        symbol: info.symbol,
        name: `${info.name}, ${spread}${info.unit && !info.unit.includes(' ') ? ` ${info.unit}` : ''}`,
        value: m.value,
        unit: info.unit,
        source: m.source,
      };
    }),
    constants: [],
    result: { symbol: 'Δ', name: 'width of the 68 % interval of the result', value: high - low, unit },
    note: `${SAMPLES} draws from a seeded generator (mulberry32, seed ${SEED}), so the interval is reproducible. Each input is drawn from a two-piece normal whose 16th and 84th percentiles are value − minus and value + plus. H0 draws hold the density parameters fixed, so distances and times scale as 1/H0.${boundNote}${failedNote} Interval: ${low} to ${high}.`,
  };
}

/**
 * The Hubble law's own error: the same request under the standard model (Planck 2018 densities,
 * the law's H0). Returns the reference value and the step showing the difference, or null when the
 * reference is undefined there. A magnitude's difference is read as the distance ratio it implies.
 */
function lawComparison(
  req: CalcRequest,
  measured: Record<string, Measurement>,
  value: number,
  unit: string,
  H0: number,
): { reference: number; difference: number; step: Step } | null {
  const inputs: Record<string, unknown> = Object.fromEntries(Object.entries(measured).map(([k, m]) => [k, m.value]));
  if (req.inputs?.band !== undefined) inputs.band = req.inputs.band;
  const ref = calculate({ quantity: req.quantity, inputs, model: referenceModel(H0) });
  if (!('value' in ref)) return null;
  const difference = unit === 'mag' ? 10 ** (0.2 * Math.abs(value - ref.value)) - 1 : Math.abs(value / ref.value - 1);
  const step: Step = {
    title: 'The Hubble law against a standard cosmology model',
    formula: unit === 'mag' ? 'δ = 10^(0.2 |m_law − m_FLRW|) − 1' : 'δ = |x_law / x_FLRW − 1|',
    inputs: [
      { symbol: 'x_law', name: 'Hubble-law result', value, unit, source: 'previous step' },
      {
        symbol: 'x_FLRW',
        name: 'the same under flat ΛCDM with Planck 2018 densities and the law’s H0',
        value: ref.value,
        unit,
        source: 'this engine (Planck 2018 VI, A&A 641, A6, parameters as astropy’s Planck18)',
      },
    ],
    constants: [],
    result: { symbol: 'δ', name: 'relative difference: the law’s own error', value: difference, unit: '' },
    note: `The interval is widened to include the standard model’s value, so the public figures never claim more than the law’s own error allows. Tolerance ${HUBBLE_LAW_TOLERANCE * 100} % (where our precision rule drops from 3 figures to 2): beyond it the result carries a warning. Every quantity the law answers stays within the tolerance below z = ${hubbleLawMaxZ().toFixed(3)} (the angular diameter distance departs first).`,
  };
  return { reference: ref.value, difference, step };
}

function compute(req: CalcRequest, id: string | number | undefined): CalcSuccess {
  const quantity: CalcQuantity = req.quantity;
  const spec = QUANTITY_SPECS[quantity];
  const rawInputs = req.inputs ?? {};
  const present = new Set(Object.keys(rawInputs).filter((k) => rawInputs[k as keyof typeof rawInputs] !== undefined));
  checkInputs(quantity, present);
  const measured: Record<string, Measurement> = {};
  for (const [k, v] of Object.entries(rawInputs)) {
    if (k !== 'band' && v !== undefined) measured[k] = toMeasurement(v as MeasuredInput);
  }
  checkParallax(measured.parallax_mas);
  const usesModel = spec.usesModel(present);
  const resolved = usesModel ? resolveModel(req.model) : null;
  if (resolved && spec.flrwOnly && resolved.view.kind === 'hubble_law') {
    throw new CalcError(
      'not_in_hubble_law',
      `${quantity} needs a cosmology model; the simple Hubble law has no ${quantity.replaceAll('_', ' ')}`,
    );
  }
  const view = resolved?.view ?? { kind: 'flrw' as const, cosmo: null, H0: 1, sources: {} };
  const h0 = usesModel ? h0Measurement(req, view.H0) : undefined;
  const band = rawInputs.band;
  const steps: Step[] = [];
  const warnings = new Set<string>();
  const ctx: Ctx = { model: view, h0Scale: 1, inputs: measured, band, steps, warnings };
  const nominal: Values = Object.fromEntries(Object.entries(measured).map(([k, m]) => [k, m.value]));
  const value = spec.compute(ctx, nominal);

  const all = h0 ? { ...measured, [H0_KEY]: h0 } : measured;
  let interval: CalcSuccess['interval'];
  if (Object.values(all).some((m) => m.minus > 0 || m.plus > 0)) {
    const outcome = quantityInterval(spec, all, view, band, present);
    if (outcome.failed > MAX_FAILED_FRACTION * SAMPLES || !(outcome.samples > 0)) {
      const [who] = [...outcome.failures.entries()].sort((a, b) => b[1] - a[1])[0];
      const pct = ((100 * outcome.failed) / SAMPLES).toFixed(1);
      throw new CalcError(
        'interval_outside_domain',
        `the uncertainty on ${who} reaches values where ${quantity} is not defined (${pct} % of draws); give a smaller uncertainty`,
      );
    }
    interval = {
      low: outcome.low,
      high: outcome.high,
      level: 0.68,
      ...(outcome.failed > 0 ? { failed_draws: outcome.failed } : {}),
    };
    if (outcome.failed > 0) {
      warnings.add(
        `${outcome.failed} of ${SAMPLES} uncertainty draws fell where ${quantity} is not defined and were left out of the interval (see the working).`,
      );
    }
    steps.push(uncertaintyStep(all, outcome.low, outcome.high, spec.unit, outcome.failures));
  }
  if (resolved && view.kind === 'hubble_law') {
    const law = lawComparison(req, measured, value, spec.unit, view.H0);
    if (law) {
      steps.push(law.step);
      if (law.difference > HUBBLE_LAW_TOLERANCE) warnings.add(hubbleLawWarning(law.difference, HUBBLE_LAW_TOLERANCE));
      interval = {
        ...(interval ?? { level: 0.68 as const }),
        low: Math.min(interval?.low ?? value, law.reference),
        high: Math.max(interval?.high ?? value, law.reference),
      };
    }
  }
  // The resolved model's description is shared and frozen; only an H0 range makes it this result's own.
  const description =
    resolved && h0
      ? { ...resolved.description, H0_range: { low: h0.value - h0.minus, high: h0.value + h0.plus } }
      : (resolved?.description ?? null);
  return {
    ...(id !== undefined ? { id } : {}),
    quantity,
    value,
    unit: spec.unit,
    ...(interval ? { interval } : {}),
    conversions: conversionsFor(value, spec.unit),
    warnings: [...warnings],
    working: steps,
    model: description,
  };
}

/** True when every number anywhere in x is finite. */
function allFinite(x: unknown): boolean {
  if (typeof x === 'number') return Number.isFinite(x);
  if (typeof x !== 'object' || x === null) return true;
  // A for…in walk: the result is checked on every call, and Object.values would copy each level.
  for (const k in x) if (!allFinite((x as Record<string, unknown>)[k])) return false;
  return true;
}

/**
 * Computes one quantity.
 * @param request an untrusted request (as parsed from JSON)
 * @returns the result with working, or `{ error: { code, message } }`; never throws
 */
export function calculate(request: unknown): CalcResult {
  let id: string | number | undefined;
  try {
    id = requestId(request);
    const result = compute(parseRequest(request), id);
    if (!allFinite(result)) {
      throw new CalcError(
        'non_finite_result',
        `${result.quantity} is not a finite number for these inputs (it overflows or underflows double precision)`,
      );
    }
    return result;
  } catch (e) {
    const base = id !== undefined ? { id } : {};
    if (e instanceof CalcError) return { ...base, error: { code: e.code, message: e.message } };
    return { ...base, error: { code: 'internal_error', message: 'the calculation failed unexpectedly for these inputs' } };
  }
}
