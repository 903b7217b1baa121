/**
 * A body's path across one stretch of time (a noon-to-noon window), from which its rises, sets,
 * upper transits and near misses are found by its actual altitude: the altitude is sampled every
 * ten minutes, the highest and lowest points are placed between the samples, and every change of
 * side of the altitude crossed is refined by bisection until the bracket is under a second. Whether
 * a body crosses is never decided from one declination.
 */
import { apparent as apparentSidereal, mean as meanSidereal } from 'astronomia/sidereal';
import { DEG, wrap180 } from './angles.ts';
import { toHorizontal, type Observer } from './horizon.ts';
import { deltaTSeconds, jdFromMs } from './time.ts';

/** Apparent right ascension and declination in degrees, and the horizontal parallax where it matters (the Moon). */
export interface RaDec {
  raDeg: number;
  decDeg: number;
  parallaxDeg?: number;
}

/** What a body offers the window search. */
export interface Trackable {
  /** Apparent place at a Julian Ephemeris Day (called only on a grid of whole multiples of gridDays). */
  placeAt(jde: number): RaDec;
  /** The standard altitude h0 (degrees) whose crossing is the body's rising or setting, for a place. */
  h0Deg(place: RaDec): number;
  /** Days between the tabulated places that are interpolated: 1 (default) for the Sun and planets, 0.25 for the Moon. */
  gridDays?: number;
}

/** Samples this far apart: a highest and a lowest point closer together than this are not told apart. */
export const SAMPLE_MS = 10 * 60_000;
/** Crossings, transits and extremes are refined until the bracket is narrower than this (times are shown to the minute). */
export const TIME_TOLERANCE_MS = 1000;
/**
 * A body that comes within this many degrees of the altitude it would cross "grazes" it: it crosses
 * only just, or misses only just. 0.1° (6′) is well inside the night-to-night change of refraction
 * at the horizon (several arcminutes with temperature and pressure; common practice), so a crossing
 * or a miss by less is not a promise the sky keeps.
 */
export const GRAZE_MARGIN_DEG = 0.1;
/** Extremes are looked for this far past each end of the window, so a crossing near an end knows its neighbour. */
const PAD_MS = 3 * 60 * 60_000;
/** Latitudes beyond this are treated as the pole itself: upper transits mean nothing there. */
const POLAR_LATITUDE = 89.99;

/** A highest or lowest point of a body's altitude less the altitude crossed. */
export interface Extreme {
  ms: number;
  kind: 'highest' | 'lowest';
  /** Altitude minus the altitude crossed, degrees (negative below it). */
  offsetDeg: number;
  /** The body's own altitude there, degrees (geometric, geocentric for the Moon). */
  altitudeDeg: number;
}

/** An extreme within GRAZE_MARGIN_DEG of the altitude crossed. */
export interface Graze extends Extreme {
  /** Whether the body gets past the altitude at all (then by less than the margin). */
  crosses: boolean;
}

/** Rise, transit and set instants (ms) inside the window, and how close the body came where it did not cross. */
export interface WindowEvents {
  rises: number[];
  transits: number[];
  sets: number[];
  /** Highest and lowest points inside the window. */
  extremes: Extreme[];
  /** Extremes within the margin: inside the window, or beside a crossing inside it. */
  grazes: Graze[];
  /** Crossings (ms) that only just happen, with the graze that makes them so. */
  grazingCrossings: Map<number, Graze>;
}

/** 0h of the grid step containing a Julian Ephemeris Day. */
function gridNode(jde: number, step: number): number {
  return Math.floor((jde - 0.5) / step) * step + 0.5;
}

/** Meeus (3.3): interpolation from three tabular values at n ∈ [−1, 1]. */
function interpolate(y0: number, y1: number, y2: number, n: number): number {
  const a = y1 - y0;
  const b = y2 - y1;
  return y1 + (n / 2) * (a + b + n * (b - a));
}

const unwrap = (ref: number, v: number) => ref + wrap180(v - ref);

/** The body's apparent place at an instant, interpolated from its places on the grid. */
function placeAtInstant(body: Trackable, jd: number): RaDec {
  const step = body.gridDays ?? 1;
  const jde = jd + deltaTSeconds(jd) / 86_400;
  const node = gridNode(jde, step);
  const n = (jde - node) / step;
  const p0 = body.placeAt(node - step);
  const p1 = body.placeAt(node);
  const p2 = body.placeAt(node + step);
  const r1 = p1.raDeg;
  const place: RaDec = {
    raDeg: interpolate(unwrap(r1, p0.raDeg), r1, unwrap(r1, p2.raDeg), n),
    decDeg: interpolate(p0.decDeg, p1.decDeg, p2.decDeg, n),
  };
  if (p1.parallaxDeg !== undefined) place.parallaxDeg = interpolate(p0.parallaxDeg!, p1.parallaxDeg, p2.parallaxDeg!, n);
  return place;
}

/**
 * Geometric altitude and azimuth (degrees) of a body at an instant, interpolated from its places on
 * the grid (to well under a minute of arc for the Sun and planets on a daily grid, the Moon on a
 * six-hourly one).
 */
export function altitudeAt(observer: Observer, ms: number, body: Trackable): { altitudeDeg: number; azimuthDeg: number } {
  const jd = jdFromMs(ms);
  const place = placeAtInstant(body, jd);
  return toHorizontal(place.raDeg * DEG, place.decDeg * DEG, observer, jd);
}

/** Altitude, the body's own h0 and hour angle at one instant. */
interface Sample {
  ms: number;
  altitudeDeg: number;
  ownH0Deg: number;
  hourAngleDeg: number;
}

const equationOfEquinoxes = new Map<number, number>();

/**
 * Apparent sidereal time at Greenwich in degrees: the mean time (IAU 1982) plus the nutation in
 * right ascension taken once per day (it changes by under 0.01 s of time in a day), so the many
 * altitude samples of a night do not each evaluate the nutation series.
 */
function siderealDeg(jd: number): number {
  const day = Math.floor(jd);
  let eq = equationOfEquinoxes.get(day);
  if (eq === undefined) {
    eq = wrap180((apparentSidereal(day) - meanSidereal(day)) / 240);
    if (equationOfEquinoxes.size > 10_000) equationOfEquinoxes.clear();
    equationOfEquinoxes.set(day, eq);
  }
  return meanSidereal(jd) / 240 + eq;
}

function sampleAt(observer: Observer, body: Trackable, ms: number): Sample {
  const jd = jdFromMs(ms);
  const place = placeAtInstant(body, jd);
  const hourAngleDeg = wrap180(siderealDeg(jd) + observer.longitude - place.raDeg);
  const lat = observer.latitude * DEG;
  const dec = place.decDeg * DEG;
  const sinAlt = Math.sin(lat) * Math.sin(dec) + Math.cos(lat) * Math.cos(dec) * Math.cos(hourAngleDeg * DEG);
  return { ms, altitudeDeg: Math.asin(Math.max(-1, Math.min(1, sinAlt))) / DEG, ownH0Deg: body.h0Deg(place), hourAngleDeg };
}

/**
 * Bisection for a sign change of g on [lo, hi] (g(lo) and g(hi) on opposite sides), to TIME_TOLERANCE_MS.
 * Each pass halves the bracket, so it ends after log2((hi − lo) / tolerance) passes: it cannot stop
 * short of the tolerance.
 */
function bisect(g: (ms: number) => number, lo: number, hi: number, gLo: number): number {
  const aboveLo = gLo > 0;
  while (hi - lo > TIME_TOLERANCE_MS) {
    const mid = (lo + hi) / 2;
    if (g(mid) > 0 === aboveLo) lo = mid;
    else hi = mid;
  }
  return Math.round((lo + hi) / 2);
}

const GOLDEN = (Math.sqrt(5) - 1) / 2;

/** Golden-section search for the maximum of g on [lo, hi], to TIME_TOLERANCE_MS. */
function maximise(g: (ms: number) => number, lo: number, hi: number): { ms: number; value: number } {
  let a = lo;
  let b = hi;
  let c = b - GOLDEN * (b - a);
  let d = a + GOLDEN * (b - a);
  let gc = g(c);
  let gd = g(d);
  while (b - a > TIME_TOLERANCE_MS) {
    if (gc > gd) {
      b = d;
      d = c;
      gd = gc;
      c = b - GOLDEN * (b - a);
      gc = g(c);
    } else {
      a = c;
      c = d;
      gc = gd;
      d = a + GOLDEN * (b - a);
      gd = g(d);
    }
  }
  const ms = Math.round((a + b) / 2);
  return { ms, value: g(ms) };
}

/** Which altitude is crossed: the body's own standard altitude, or a fixed one (twilight). */
export type Threshold = number | 'own';

/**
 * A body's altitude over a window (plus a margin either side), sampled once; the crossings of any
 * altitude are then found from the same samples (the Sun's four altitudes share one path).
 */
export class BodyPath {
  private readonly samples: Sample[] = [];
  private readonly cache = new Map<string, WindowEvents>();
  private readonly constantOwnH0: boolean;

  /**
   * @param observer where from
   * @param body the body's places and standard altitude
   * @param startMs window start (inclusive)
   * @param endMs window end (exclusive)
   */
  constructor(
    private readonly observer: Observer,
    private readonly body: Trackable,
    readonly startMs: number,
    readonly endMs: number,
  ) {
    const from = startMs - PAD_MS;
    const to = endMs + PAD_MS;
    const count = Math.ceil((to - from) / SAMPLE_MS);
    for (let i = 0; i <= count; i += 1) this.samples.push(sampleAt(observer, body, Math.min(from + i * SAMPLE_MS, to)));
    const first = this.samples[0].ownH0Deg;
    this.constantOwnH0 = this.samples.every((s) => s.ownH0Deg === first);
  }

  private offset(s: Sample, threshold: Threshold): number {
    return s.altitudeDeg - (threshold === 'own' ? s.ownH0Deg : threshold);
  }

  /** Altitude less the altitude crossed at any instant (degrees), e.g. for a rate of change. */
  offsetAt(ms: number, threshold: Threshold = 'own'): number {
    return this.offset(sampleAt(this.observer, this.body, ms), threshold);
  }

  /** Highest and lowest points over the padded stretch, of altitude less the threshold. */
  private extremesFor(threshold: Threshold): Extreme[] {
    const out: Extreme[] = [];
    const v = this.samples.map((s) => this.offset(s, threshold));
    for (let i = 1; i < v.length - 1; i += 1) {
      const rising = v[i] - v[i - 1];
      const next = v[i + 1] - v[i];
      if (rising > 0 && next <= 0) out.push(this.refineExtreme(i, 'highest', threshold));
      else if (rising < 0 && next >= 0) out.push(this.refineExtreme(i, 'lowest', threshold));
    }
    return out;
  }

  private refineExtreme(i: number, kind: Extreme['kind'], threshold: Threshold): Extreme {
    const sign = kind === 'highest' ? 1 : -1;
    const best = maximise((ms) => sign * this.offsetAt(ms, threshold), this.samples[i - 1].ms, this.samples[i + 1].ms);
    const s = sampleAt(this.observer, this.body, best.ms);
    return { ms: best.ms, kind, offsetDeg: this.offset(s, threshold), altitudeDeg: s.altitudeDeg };
  }

  /**
   * Every crossing of an altitude inside the window, its upper transits, and its near misses.
   * @param threshold a fixed altitude in degrees, or "own" for the body's standard altitude (default)
   */
  events(threshold: Threshold = 'own'): WindowEvents {
    const key = String(threshold === 'own' && this.constantOwnH0 ? this.samples[0].ownH0Deg : threshold);
    const cached = this.cache.get(key);
    if (cached) return cached;
    const extremesAll = this.extremesFor(threshold);
    // Between two neighbouring points of samples and extremes the offset is monotonic, so one
    // change of side there is exactly one crossing.
    const points = [
      ...this.samples.map((s) => ({ ms: s.ms, v: this.offset(s, threshold) })),
      ...extremesAll.map((e) => ({ ms: e.ms, v: e.offsetDeg })),
    ].sort((a, b) => a.ms - b.ms);
    const rises: number[] = [];
    const sets: number[] = [];
    const crossingsAll: Array<{ ms: number; rising: boolean }> = [];
    for (let i = 1; i < points.length; i += 1) {
      const [a, b] = [points[i - 1], points[i]];
      if (a.v > 0 === b.v > 0 || b.ms <= a.ms) continue;
      const ms = bisect((t) => this.offsetAt(t, threshold), a.ms, b.ms, a.v);
      crossingsAll.push({ ms, rising: b.v > 0 });
      if (ms >= this.startMs && ms < this.endMs) (b.v > 0 ? rises : sets).push(ms);
    }
    const inWindow = (ms: number) => ms >= this.startMs && ms < this.endMs;
    const grazingCrossings = new Map<number, Graze>();
    const grazes: Graze[] = [];
    for (const e of extremesAll) {
      if (Math.abs(e.offsetDeg) >= GRAZE_MARGIN_DEG) continue;
      const crosses = e.kind === 'highest' ? e.offsetDeg > 0 : e.offsetDeg <= 0;
      const graze: Graze = { ...e, crosses };
      // The crossings on either side of this extreme (nearest before and after) only just happen.
      const before = crossingsAll.filter((c) => c.ms < e.ms).at(-1);
      const after = crossingsAll.find((c) => c.ms > e.ms);
      const beside = crosses ? [before, after].filter((c) => c !== undefined && inWindow(c.ms)) : [];
      for (const c of beside) grazingCrossings.set(c!.ms, graze);
      if (inWindow(e.ms) || beside.length) grazes.push(graze);
    }
    const result: WindowEvents = {
      rises,
      sets,
      transits: this.transits(),
      extremes: extremesAll.filter((e) => inWindow(e.ms)),
      grazes,
      grazingCrossings,
    };
    this.cache.set(key, result);
    return result;
  }

  private transitsFound: number[] | null = null;

  /** Upper transits inside the window: the hour angle passing from negative to positive. */
  transits(): number[] {
    if (this.transitsFound) return this.transitsFound;
    const found: number[] = [];
    if (Math.abs(this.observer.latitude) <= POLAR_LATITUDE) {
      const hourAngle = (ms: number) => sampleAt(this.observer, this.body, ms).hourAngleDeg;
      for (let i = 1; i < this.samples.length; i += 1) {
        const [a, b] = [this.samples[i - 1], this.samples[i]];
        // −180° → +180° is the lower transit, where the hour angle wraps round.
        if (!(a.hourAngleDeg <= 0 && b.hourAngleDeg > 0 && b.hourAngleDeg - a.hourAngleDeg < 180)) continue;
        const ms = bisect(hourAngle, a.ms, b.ms, a.hourAngleDeg);
        if (ms >= this.startMs && ms < this.endMs) found.push(ms);
      }
    }
    this.transitsFound = found;
    return found;
  }

  /** Lowest and highest altitude inside the window (sampled ends and refined extremes). */
  range(): { lowest: { ms: number; altitudeDeg: number }; highest: { ms: number; altitudeDeg: number } } {
    const candidates = [...this.samples.filter((s) => s.ms >= this.startMs && s.ms < this.endMs), ...this.events(0).extremes].map(
      (s) => ({ ms: s.ms, altitudeDeg: s.altitudeDeg }),
    );
    const lowest = candidates.reduce((a, b) => (b.altitudeDeg < a.altitudeDeg ? b : a));
    const highest = candidates.reduce((a, b) => (b.altitudeDeg > a.altitudeDeg ? b : a));
    return { lowest, highest };
  }
}

/**
 * Every rise, upper transit and set of a body between two instants, with its near misses.
 * @param observer where from
 * @param startMs window start (inclusive)
 * @param endMs window end (exclusive)
 * @param body the body's positions and standard altitude
 * @param threshold a fixed altitude to cross instead of the body's own standard altitude
 */
export function eventsInWindow(
  observer: Observer,
  startMs: number,
  endMs: number,
  body: Trackable,
  threshold: Threshold = 'own',
): WindowEvents {
  return new BodyPath(observer, body, startMs, endMs).events(threshold);
}
