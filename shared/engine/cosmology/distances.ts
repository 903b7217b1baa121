/**
 * Distance and time measures of an FLRW model, following Hogg (1999),
 * arXiv:astro-ph/9905116. Integrals are read from a table in u = ln(1+z) where
 * one exists and integrated directly otherwise; ages use the substitution
 * a = s² so that the integrand is smooth down to the big bang.
 */
import { CalcError } from '../errors.ts';
import type { FlrwModel } from './model.ts';
import { integrate } from './quadrature.ts';
import { buildTable, interpolate, type IntegralTable } from './table.ts';

/** A model together with its precomputed integral table. */
export interface Cosmology {
  readonly model: FlrwModel;
  readonly table: IntegralTable | null;
  /** Age today in units of the Hubble time (NaN when the model has no big bang). */
  readonly ageNowIntegral: number;
}

// Above this redshift the age is integrated directly rather than by subtraction,
// which would lose relative precision when the age is a tiny fraction of t0.
const AGE_BY_SUBTRACTION_MAX_Z = 100;

/**
 * Prepares a model for fast evaluation: builds the table when the model has a
 * big bang (bouncing models are integrated directly, up to their bounce).
 * @param model the model
 * @returns the prepared cosmology
 */
export function prepareCosmology(model: FlrwModel): Cosmology {
  const table = model.zBounce === Infinity ? buildTable(model.e2) : null;
  const ageNowIntegral = model.hasBigBang ? ageIntegralTo(model, 1) : NaN;
  return { model, table, ageNowIntegral };
}

// Called for every Monte Carlo draw: the check stays small enough to be inlined, the throw is out of line.
function checkRedshift(model: FlrwModel, z: number): void {
  if (!(z > -1) || z >= model.zBounce) refuseRedshift(model, z);
}

function refuseRedshift(model: FlrwModel, z: number): never {
  if (!(z > -1)) throw new CalcError('out_of_range', `z must be greater than −1 (got ${z})`);
  throw new CalcError(
    'no_big_bang',
    `z must be below ${model.zBounce.toPrecision(6)}, where this model has no big bang: E(z)² ≤ 0 there (got z = ${z})`,
  );
}

/** ∫ from a = 0 to aEnd of da/(a E(a)), with a = s², in units of the Hubble time. */
function ageIntegralTo(model: FlrwModel, aEnd: number): number {
  const f = (s: number): number => {
    const a = s * s;
    const q = model.a4e2(a);
    if (!(q > 0)) throw new CalcError('no_big_bang', 'the model has no big bang: E(z)² ≤ 0 at some redshift');
    return (2 * s * s * s) / Math.sqrt(q);
  };
  return integrate(f, 0, Math.sqrt(aEnd));
}

/** ∫ over a in [aLo, aHi] of da/(a² E(a)) (comoving integral between two scale factors), with a = s². */
function comovingIntegralBetween(model: FlrwModel, aLo: number, aHi: number): number {
  const f = (s: number): number => (2 * s) / Math.sqrt(model.a4e2(s * s));
  return integrate(f, Math.sqrt(aLo), Math.sqrt(aHi));
}

function directIntegral(model: FlrwModel, z: number, kind: 'comoving' | 'lookback'): number {
  const f = (u: number): number => {
    const e2 = model.e2(Math.expm1(u));
    if (!(e2 > 0)) throw new CalcError('no_big_bang', 'the model has no big bang: E(z)² ≤ 0 before this redshift');
    return (kind === 'comoving' ? Math.exp(u) : 1) / Math.sqrt(e2);
  };
  return integrate(f, 0, Math.log1p(z));
}

/**
 * Line-of-sight comoving distance in units of the Hubble distance: ∫0^z dz'/E(z').
 * @param c prepared cosmology
 * @param z redshift
 * @returns D_C / D_H
 * @throws CalcError for z ≤ −1 or beyond a bounce
 */
export function comovingIntegral(c: Cosmology, z: number): number {
  checkRedshift(c.model, z);
  const t = c.table;
  if (t === null || z < 0) return directIntegral(c.model, z, 'comoving');
  const u = Math.log1p(z);
  if (u <= t.uMax) return interpolate(t.comoving, t.comovingSlope, t.h, u);
  const last = t.comoving[t.comoving.length - 1];
  return last + comovingIntegralBetween(c.model, 1 / (1 + z), Math.exp(-t.uMax));
}

/**
 * Turns a line-of-sight comoving distance into the transverse comoving distance
 * (Hogg 1999 eq. 16): sinh for open, sin for closed models.
 * @param Ok0 curvature density today
 * @param dc D_C / D_H
 * @returns D_M / D_H
 */
export function transverseFromLineOfSight(Ok0: number, dc: number): number {
  if (Ok0 > 0) {
    const s = Math.sqrt(Ok0);
    return Math.sinh(s * dc) / s;
  }
  if (Ok0 < 0) {
    const s = Math.sqrt(-Ok0);
    return Math.sin(s * dc) / s;
  }
  return dc;
}

/**
 * Lookback time in units of the Hubble time: ∫0^z dz'/((1+z')E(z')).
 * @param c prepared cosmology
 * @param z redshift
 * @returns t_L / t_H
 */
export function lookbackIntegral(c: Cosmology, z: number): number {
  checkRedshift(c.model, z);
  const t = c.table;
  if (t === null || z < 0) return directIntegral(c.model, z, 'lookback');
  const u = Math.log1p(z);
  if (u <= t.uMax) return interpolate(t.lookback, t.lookbackSlope, t.h, u);
  if (!c.model.hasBigBang) return directIntegral(c.model, z, 'lookback');
  return c.ageNowIntegral - ageIntegralTo(c.model, 1 / (1 + z));
}

/**
 * Age of the universe at redshift z in units of the Hubble time: ∫z^∞ dz'/((1+z')E(z')).
 * @param c prepared cosmology
 * @param z redshift
 * @returns t(z) / t_H
 * @throws CalcError when the model has no big bang
 */
export function ageIntegral(c: Cosmology, z: number): number {
  checkRedshift(c.model, z);
  if (!c.model.hasBigBang) refuseAge(c.model);
  if (z <= AGE_BY_SUBTRACTION_MAX_Z) return c.ageNowIntegral - lookbackIntegral(c, z);
  return ageIntegralTo(c.model, 1 / (1 + z));
}

// Out of line, so that ageIntegral, called for every Monte Carlo draw of an age, stays small.
function refuseAge(model: FlrwModel): never {
  throw new CalcError('no_big_bang', `model "${model.name}" has no big bang, so its age is not defined`);
}

/**
 * Dimensionless expansion rate E(z) = H(z)/H0 (first Friedmann equation).
 * @param c prepared cosmology
 * @param z redshift
 * @returns E(z)
 */
export function expansionRate(c: Cosmology, z: number): number {
  checkRedshift(c.model, z);
  return Math.sqrt(c.model.e2(z));
}

/**
 * Luminosity distance in Mpc, the fast path used for bulk evaluation.
 * @param c prepared cosmology
 * @param z redshift
 * @returns D_L in Mpc
 */
export function luminosityDistanceMpc(c: Cosmology, z: number): number {
  return (1 + z) * transverseFromLineOfSight(c.model.Ok0, comovingIntegral(c, z)) * c.model.hubbleDistance;
}

/**
 * Finds x in [lo, hi] with f(x) = 0 by Brent's method (f(lo), f(hi) of opposite sign).
 * @param f function
 * @param lo lower bracket
 * @param hi upper bracket
 * @returns the root
 */
export function brent(f: (x: number) => number, lo: number, hi: number, tol = 1e-13): number {
  let a = lo,
    b = hi,
    fa = f(a),
    fb = f(b);
  if (fa * fb > 0) throw new CalcError('no_solution', 'no root in the bracket');
  if (Math.abs(fa) < Math.abs(fb)) [a, b, fa, fb] = [b, a, fb, fa];
  let c = a,
    fc = fa,
    d = b - a,
    mflag = true;
  for (let i = 0; i < 200 && fb !== 0 && Math.abs(b - a) > tol * (1 + Math.abs(b)); i++) {
    let s =
      fa !== fc && fb !== fc
        ? (a * fb * fc) / ((fa - fb) * (fa - fc)) +
          (b * fa * fc) / ((fb - fa) * (fb - fc)) +
          (c * fa * fb) / ((fc - fa) * (fc - fb))
        : b - (fb * (b - a)) / (fb - fa);
    const lowBound = (3 * a + b) / 4;
    const bisect: boolean =
      !(s > Math.min(lowBound, b) && s < Math.max(lowBound, b)) ||
      (mflag && Math.abs(s - b) >= Math.abs(b - c) / 2) ||
      (!mflag && Math.abs(s - b) >= Math.abs(c - d) / 2);
    if (bisect) s = (a + b) / 2;
    mflag = bisect;
    const fs = f(s);
    d = c;
    c = b;
    fc = fb;
    if (fa * fs < 0) {
      b = s;
      fb = fs;
    } else {
      a = s;
      fa = fs;
    }
    if (Math.abs(fa) < Math.abs(fb)) [a, b, fa, fb] = [b, a, fb, fa];
  }
  return b;
}
