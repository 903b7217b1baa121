/**
 * A quantity's 68 % interval: Monte Carlo over its inputs (and H0, when a range is given),
 * each draw running the quantity's lean numeric path on slot-numbered inputs. The working is
 * built once, elsewhere, from the nominal values; draws keep none.
 */
import type { ModelView } from './quantities/context.ts';
import type { QuantitySpec } from './quantities/registry.ts';
import { H0_SLOT, sampleEnv, SLOT_NAMES, slotOf, Z } from './quantities/sample-env.ts';
import { propagate, propagateOne } from './monte-carlo.ts';
import { boundMass, deviateRange, truncatedDeviate, type Measurement, type MonteCarloOutcome } from './uncertainty.ts';
import { localDistance, localModulus } from './quantities/local-modulus.ts';
import { exactModulusAt } from './quantities/sample-photometry.ts';
import type { Sampler } from './quantities/sample-env.ts';
import { EXTINCTION, ALPHA, has } from './quantities/sample-env.ts';
import { fillAbsoluteMagnitude, fillScaledInZ, type ColumnRun } from './column-draws.ts';
import { sampleAbsoluteMagnitude } from './quantities/sample-photometry.ts';
import type { ZInterpolant } from './quantities/local-modulus.ts';

/** The name under which an H0 range is varied. */
export const H0_KEY = 'H0';

/** Where each input is defined, to say which input pushed a Monte Carlo draw out of range. */
const DOMAIN: Record<string, (x: number) => boolean> = {
  z: (x) => x > -1,
  parallax_mas: (x) => x > 0,
  lookback_gyr: (x) => x > 0,
  distance_mpc: (x) => x > 0,
  distance_1: (x) => x > 0,
  distance_2: (x) => x > 0,
  extinction: (x) => x >= 0,
  [H0_KEY]: (x) => x > 0,
};

/**
 * Physical lower bounds the draws respect (truncated there, not failed): extinction cannot be
 * negative, nor a distance, a time or H0. Not z: a redshift whose uncertainty reaches z = −1 is not a
 * usable measurement, and its failed draws say so (refused above 1 %). Nor a parallax: a measured
 * parallax may be zero or negative, and one too uncertain to invert is refused before drawing.
 */
export const LOWER_BOUND: Record<string, number> = {
  lookback_gyr: 0,
  distance_mpc: 0,
  distance_1: 0,
  distance_2: 0,
  extinction: 0,
  [H0_KEY]: 0,
};

/** The measurement with its physical bound, if its input has one. */
export function bounded(name: string, m: Measurement): Measurement {
  const lower = LOWER_BOUND[name];
  return lower === undefined ? m : { ...m, lower };
}

// One slot buffer for every run (a fresh 104-byte typed array would live outside the JavaScript
// heap and cost a garbage-collection finaliser per request). Runs never nest: draws do not calculate.
const DRAW = new Float64Array(SLOT_NAMES.length);

const isVaried = (m: Measurement): boolean => m.minus > 0 || m.plus > 0;

// Small numbers standing for a sampler and a model in a draws key (objects cannot go in a string).
const identities = new WeakMap<object, number>();
let nextIdentity = 1;
function identity(o: object): number {
  let id = identities.get(o);
  if (id === undefined) {
    id = nextIdentity++;
    identities.set(o, id);
  }
  return id;
}

/**
 * Everything a run's draws depend on besides the fixed deviates: sampler, model, every input, and
 * the band when the draw reads it (a quantity with a band drawn in full; a split run draws the step
 * before the band enters, the absolute magnitude, which a brightness statement draws too).
 */
function drawsKey(
  draw: Sampler,
  view: ModelView,
  band: number | null,
  names: string[],
  all: Record<string, Measurement>,
): string {
  let key = `${identity(draw)}|${identity(view)}|${band ?? ''}`;
  for (const k of names) key += `|${k}=${all[k].value}-${all[k].minus}+${all[k].plus}`;
  return key;
}

/**
 * Runs the Monte Carlo for one request.
 * @param spec the quantity
 * @param all the request's measured inputs, plus H0 when an H0 range is given (in request order)
 * @param view the resolved model
 * @param band the request's band, if any
 * @param present names of the inputs given
 * @returns the outcome: interval, draws kept, failures by input
 */
export function quantityInterval(
  spec: QuantitySpec,
  all: Record<string, Measurement>,
  view: ModelView,
  band: string | undefined,
  present: Set<string>,
): MonteCarloOutcome {
  const names = Object.keys(all);
  all = Object.fromEntries(names.map((k) => [k, bounded(k, all[k])]));
  const env = sampleEnv(view, band, names);
  const x = DRAW.fill(NaN);
  for (const k of names) x[slotOf(k)] = all[k].value;
  const varied = names.filter((k) => isVaried(all[k]));
  const blame = (x: Float64Array): string => names.find((k) => DOMAIN[k] && !DOMAIN[k](x[slotOf(k)])) ?? varied[0] ?? 'z';
  const problem = { x, varied: varied.map((k) => ({ slot: slotOf(k), m: all[k] })), blame };
  if (spec.monotoneInZ && varied.length === 1 && varied[0] === 'z') {
    // The percentiles of a monotonic function of z are the function at z's percentiles: draw z alone.
    const at = (z: number): number => {
      x[Z] = z;
      return spec.sample(env, x);
    };
    const last = { map: at, decreasing: spec.monotoneInZ === 'decreasing' };
    return propagateOne(all.z, last, () => propagate({ ...problem, f: (x) => x[Z], last }));
  }
  const varyH0 = varied.includes(H0_KEY);
  // The redshifts a run draws lie between z's smallest and largest deviate.
  const zDrawn = (): { lo: number; hi: number } => {
    const range = deviateRange(varied.length, varied.indexOf('z'));
    const z = all.z;
    const mass = boundMass(z);
    const [min, max] = mass > 0 ? [truncatedDeviate(range.min, mass), truncatedDeviate(range.max, mass)] : [range.min, range.max];
    return { lo: z.value + min * z.minus, hi: z.value + max * z.plus };
  };
  const split = spec.split?.applies(present) ? spec.split : undefined;
  const draw = split ? split.before : spec.sample;
  // A distance or time drawn over z and H0 alone: its part in z at the nominal H0, interpolated
  // over the run's redshifts, divided by each draw's H0 scale (see inverseH0InZ).
  let inZ: ZInterpolant | null = null;
  const scaledInZ = spec.inverseH0InZ === true && varyH0 && varied.length === 2 && varied.includes('z');
  const prepare = scaledInZ
    ? () => {
        const { lo, hi } = zDrawn();
        env.h0Scale = 1;
        inZ = localDistance(
          (zz) => {
            x[Z] = zz;
            return draw(env, x);
          },
          lo,
          hi,
        );
        x[Z] = all.z.value;
      }
    : spec.modulusInZ && varied.includes('z')
      ? () => {
          // Built at the nominal H0: a draw of H0 only divides d_L by its scale, so the draw
          // subtracts 5 log10(scale) from it (sampleDistanceModulus).
          env.h0Scale = 1;
          const { lo, hi } = zDrawn();
          env.modulusAt = localModulus((zz) => exactModulusAt(env, zz), lo, hi);
        }
      : undefined;
  // The two shapes the column fill computes (column-draws.ts); any other run draws one by one.
  const columns: ColumnRun = { varied: varied.map((name) => ({ name, m: all[name] })), nominalH0: view.H0 };
  const onlyVaried = (...wanted: string[]) => varied.length === wanted.length && wanted.every((k) => varied.includes(k));
  const fill = scaledInZ
    ? (out: Float64Array) => inZ !== null && fillScaledInZ(columns, inZ, out)
    : draw === sampleAbsoluteMagnitude && onlyVaried('m', 'z', H0_KEY) && !has(env, EXTINCTION) && !has(env, ALPHA)
      ? (out: Float64Array) => env.modulusAt !== null && fillAbsoluteMagnitude(columns, env.modulusAt, out)
      : undefined;
  return propagate({
    ...problem,
    fill,
    // Two varied inputs or more cost thousands of draws; a statement about the same object often asks again.
    drawsKey: varied.length > 1 ? drawsKey(draw, view, spec.band && !split ? env.Msun : null, names, all) : undefined,
    prepare,
    // Without an H0 range the scale stays 1 and the draw is the sampler itself.
    f: varyH0
      ? (x) => {
          const scale = x[H0_SLOT] / view.H0;
          if (!(scale > 0)) return NaN;
          if (inZ !== null) return inZ(x[Z]) / scale;
          env.h0Scale = scale;
          return draw(env, x);
        }
      : (x) => draw(env, x),
    last: split ? { map: (M) => split.last(env, M), decreasing: split.decreasing } : undefined,
  });
}
