/**
 * The Friedmann–Lemaître–Robertson–Walker model: densities today and the
 * dimensionless expansion rate E(z) = H(z)/H0 from the first Friedmann equation.
 *
 * Conventions follow astropy's LambdaCDM/FlatLambdaCDM so results can be checked
 * against it: Om0 is cold dark matter + baryons only; photons come from Tcmb0;
 * neutrinos share Neff equally among floor(Neff) species, massless ones scale as
 * radiation and massive ones use the Komatsu et al. (2011, ApJS 192, 18, eq. 26)
 * fitting function; a flat model's ΩΛ closes the sum; Ωk = 1 − Ωm − ΩΛ − Ωγ − Ων.
 */
import {
  BOLTZMANN_EV,
  GRAVITATIONAL_CONSTANT,
  NEUTRINO_DENSITY_FACTOR,
  NEUTRINO_TEMPERATURE_RATIO,
  SPEED_OF_LIGHT,
  STEFAN_BOLTZMANN,
} from '../constants.ts';
import { CalcError, shown } from '../errors.ts';
import { KM_PER_MPC, hubbleDistanceMpc, hubbleTimeGyr } from '../units.ts';

/** Parameters that define a model (Ode0 omitted: flat). */
export interface CosmologyParams {
  name: string;
  H0: number;
  Om0: number;
  Ode0?: number;
  Tcmb0?: number;
  Neff?: number;
  m_nu?: number | number[];
  Ob0?: number;
}

/** A ready-to-use model with derived densities and E(z). */
export interface FlrwModel {
  readonly name: string;
  readonly H0: number;
  readonly Om0: number;
  readonly Ode0: number;
  readonly Ok0: number;
  readonly Ogamma0: number;
  readonly Onu0: number;
  readonly Tcmb0: number;
  readonly Neff: number;
  readonly m_nu: number[];
  readonly Ob0?: number;
  readonly flat: boolean;
  /** c/H0 in Mpc. */
  readonly hubbleDistance: number;
  /** 1/H0 in Gyr. */
  readonly hubbleTime: number;
  /** Smallest z > 0 at which E(z)² ≤ 0 (the model bounces there), Infinity if none. */
  readonly zBounce: number;
  /** True when the model has a big bang and a finite age. */
  readonly hasBigBang: boolean;
  /** E(z)² = (H(z)/H0)². */
  e2(z: number): number;
  /** a⁴E² at scale factor a = 1/(1+z): finite as a → 0, which makes age integrals smooth. */
  a4e2(a: number): number;
}

// Komatsu et al. (2011) fitting constants, with astropy's rounding of 1/p.
const NU_P = 1.83;
const NU_INVP = 0.54644808743;
const NU_K = 0.3173;

function requireFinite(name: string, value: number): void {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new CalcError('invalid_model', `model.${name} must be a finite number (got ${shown(value)})`);
  }
}

function requireNonNegative(name: string, value: number): void {
  requireFinite(name, value);
  if (value < 0) throw new CalcError('negative_density', `model.${name} must not be negative (got ${value})`);
}

/**
 * Photon density parameter from the CMB temperature: ρ_γ = 4σT⁴/c³ over ρ_crit = 3H0²/(8πG).
 * @param H0 Hubble constant in km/s/Mpc
 * @param Tcmb0 CMB temperature today in K
 * @returns Ω_γ,0
 */
export function photonDensity(H0: number, Tcmb0: number): number {
  const c = SPEED_OF_LIGHT.value * 1000;
  const H0s = H0 / KM_PER_MPC;
  const rhoGamma = (4 * STEFAN_BOLTZMANN.value * Tcmb0 ** 4) / c ** 3;
  const rhoCrit = (3 * H0s * H0s) / (8 * Math.PI * GRAVITATIONAL_CONSTANT.value);
  return rhoGamma / rhoCrit;
}

function neutrinoMasses(Neff: number, Tcmb0: number, m_nu: number | number[] | undefined): number[] {
  const n = Math.floor(Neff);
  // As astropy: with no CMB or fewer than one species there are no individual neutrinos.
  if (Tcmb0 === 0 || n === 0) return [];
  if (m_nu === undefined) return new Array<number>(n).fill(0);
  const masses = Array.isArray(m_nu) ? m_nu : new Array<number>(n).fill(m_nu);
  masses.forEach((m, i) => {
    requireNonNegative(Array.isArray(m_nu) ? `m_nu[${i}]` : 'm_nu', m);
  });
  if (masses.length !== n) {
    throw new CalcError('invalid_model', `model.m_nu must list floor(Neff) = ${n} masses (got ${masses.length})`);
  }
  return masses;
}

/**
 * Builds a model from its parameters, validating every one.
 * @param p the parameters
 * @returns the model
 * @throws CalcError naming the offending parameter
 */
export function createModel(p: CosmologyParams): FlrwModel {
  requireFinite('H0', p.H0);
  if (p.H0 <= 0) throw new CalcError('invalid_model', `model.H0 must be greater than 0 (got ${p.H0})`);
  requireNonNegative('Om0', p.Om0);
  const Tcmb0 = p.Tcmb0 ?? 0;
  const Neff = p.Neff ?? 3.04;
  requireNonNegative('Tcmb0', Tcmb0);
  requireNonNegative('Neff', Neff);
  if (p.Ode0 !== undefined) requireNonNegative('Ode0', p.Ode0);
  if (p.Ob0 !== undefined) {
    requireNonNegative('Ob0', p.Ob0);
    if (p.Ob0 > p.Om0) throw new CalcError('invalid_model', `model.Ob0 must not exceed Om0 (got ${p.Ob0} > ${p.Om0})`);
  }
  const masses = neutrinoMasses(Neff, Tcmb0, p.m_nu);
  const Ogamma0 = Tcmb0 > 0 ? photonDensity(p.H0, Tcmb0) : 0;
  const perSpecies = masses.length > 0 ? Neff / masses.length : 0;
  const massiveY = masses.filter((m) => m > 0).map((m) => m / (BOLTZMANN_EV.value * NEUTRINO_TEMPERATURE_RATIO.value * Tcmb0));
  const nMassless = masses.length - massiveY.length;
  const prefac = NEUTRINO_DENSITY_FACTOR.value;

  /** Neutrino density relative to photons at scale factor a. */
  const nuRel = (a: number): number => {
    if (massiveY.length === 0) return prefac * Neff;
    let sum = nMassless;
    for (const y of massiveY) sum += (1 + (NU_K * y * a) ** NU_P) ** NU_INVP;
    return prefac * perSpecies * sum;
  };
  const Onu0 = Ogamma0 * nuRel(1);
  const flat = p.Ode0 === undefined;
  const Ode0 = flat ? 1 - p.Om0 - Ogamma0 - Onu0 : (p.Ode0 as number);
  if (Ode0 < 0) {
    throw new CalcError(
      'negative_density',
      `model.Om0 is too large for a flat model: ΩΛ = 1 − Ωm − Ωr would be ${Ode0.toPrecision(4)}`,
    );
  }
  const Ok0 = flat ? 0 : 1 - p.Om0 - Ode0 - Ogamma0 - Onu0;
  const Om0 = p.Om0;
  // Radiation term at scale factor a; massive neutrinos make it grow like matter at late times.
  const radiation = (a: number): number => (massiveY.length === 0 ? Ogamma0 + Onu0 : Ogamma0 * (1 + nuRel(a)));
  const a4e2 = (a: number): number => radiation(a) + a * (Om0 + a * (Ok0 + a * a * Ode0));
  const e2 = (z: number): number => {
    const x = 1 + z;
    return x * x * ((radiation(1 / x) * x + Om0) * x + Ok0) + Ode0;
  };
  const zBounce = findBounce(a4e2);
  const hasBigBang = zBounce === Infinity && (radiation(0) > 0 || Om0 > 0 || Ok0 > 0);
  return {
    name: p.name,
    H0: p.H0,
    Om0,
    Ode0,
    Ok0,
    Ogamma0,
    Onu0,
    Tcmb0,
    Neff,
    m_nu: masses,
    Ob0: p.Ob0,
    flat,
    hubbleDistance: hubbleDistanceMpc(p.H0),
    hubbleTime: hubbleTimeGyr(p.H0),
    zBounce,
    hasBigBang,
    e2,
    a4e2,
  };
}

/**
 * Finds the largest scale factor a < 1 where a⁴E² ≤ 0, i.e. the redshift where a
 * model would turn around (no big bang). Scans linear and logarithmic grids in a
 * and refines by bisection.
 */
function findBounce(a4e2: (a: number) => number): number {
  if (!(a4e2(1) > 0)) return 0;
  const grid: number[] = [];
  for (let i = 4096; i >= 1; i--) grid.push(i / 4096);
  for (let k = 1; k <= 2048; k++) grid.push(10 ** (-3.6 - (k * 8) / 2048));
  grid.sort((x, y) => y - x);
  let prev = 1;
  for (const a of grid) {
    if (!(a4e2(a) > 0)) {
      let hi = prev;
      let lo = a;
      for (let i = 0; i < 80; i++) {
        const mid = 0.5 * (lo + hi);
        if (a4e2(mid) > 0) hi = mid;
        else lo = mid;
      }
      return 1 / hi - 1;
    }
    prev = a;
  }
  return Infinity;
}
