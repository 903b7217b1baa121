/**
 * Fuzz: random and hostile requests (2,000 in npm test, 10,000 with npm run test:fuzz) (seeded, so reproducible). None may
 * throw, every number anywhere in the output must be finite, and every output
 * must match the result schema.
 */
import { describe, expect, it } from 'vitest';
import { calculate } from '../../../shared/engine/calculate.ts';
import { QUANTITY_SPECS } from '../../../shared/engine/quantities/registry.ts';
import { mulberry32 } from '../../../shared/engine/uncertainty.ts';
import { CALC_NUMERIC_INPUTS, CALC_QUANTITIES, CalcResultSchema } from '../../../shared/schemas/calc.ts';

const rand = mulberry32(20_250_101);
const pick = <T>(xs: readonly T[]): T => xs[Math.floor(rand() * xs.length)];

const HOSTILE_NUMBERS = [
  0,
  -0,
  1,
  -1,
  -1 + 1e-12,
  -0.999,
  1e-300,
  -1e-300,
  1e308,
  -1e308,
  5e-324,
  1e20,
  1100,
  1e6,
  NaN,
  Infinity,
  -Infinity,
];
const HOSTILE_VALUES: unknown[] = [
  'NaN',
  'Infinity',
  '1',
  null,
  true,
  [],
  {},
  [1],
  { value: 'x' },
  { value: 1, sigma: -1 },
  { value: 1, minus: 1 },
];

function number(): number {
  const r = rand();
  if (r < 0.2) return pick(HOSTILE_NUMBERS);
  if (r < 0.6) return rand() * 20 - 1;
  if (r < 0.8) return Math.exp(rand() * 20 - 10);
  return (rand() - 0.5) * 10 ** Math.floor(rand() * 12 - 4);
}

function input(): unknown {
  const r = rand();
  if (r < 0.08) return pick(HOSTILE_VALUES);
  if (r < 0.6) return number();
  if (r < 0.85) return { value: number(), sigma: Math.abs(number()) * (rand() < 0.7 ? 0.01 : 1) };
  return { value: number(), minus: Math.abs(number()) * 0.05, plus: Math.abs(number()) * 0.05, source: 'fuzz' };
}

// A pool of random models, so the model cache is exercised as in real use; a few are drawn fresh.
const MODEL_POOL = Array.from({ length: 40 }, () => randomModel());

function randomModel(): unknown {
  const r = rand();
  if (r < 0.15) return { preset: pick(['planck18', 'wmap9', 'planck13', 7]) };
  if (r < 0.3) return { law: pick(['hubble', 'hubble', 'linear']), H0: number() };
  if (r < 0.35) return pick([null, 'planck18', [], { H0: 70 }, { Om0: 0.3 }]);
  const m: Record<string, unknown> = {
    H0: rand() < 0.9 ? 40 + rand() * 60 : number(),
    Om0: rand() < 0.85 ? rand() * 1.2 : number(),
  };
  if (rand() < 0.5) m.Ode0 = rand() < 0.85 ? rand() * 1.5 : number();
  if (rand() < 0.4) m.Tcmb0 = rand() < 0.9 ? 2.7255 : number();
  if (rand() < 0.3) m.Neff = rand() < 0.8 ? 3.046 : number();
  if (rand() < 0.2) m.m_nu = rand() < 0.7 ? [0, 0, rand() * 0.5] : number();
  return m;
}

const PLAUSIBLE: Record<string, () => number> = {
  z: () => rand() * 12,
  m: () => rand() * 25 - 2,
  extinction: () => rand() * 2,
  alpha: () => rand() * 3 - 2,
  parallax_mas: () => 0.1 + rand() * 100,
  lookback_gyr: () => rand() * 13,
  distance_mpc: () => Math.exp(rand() * 12),
  m1: () => rand() * 20,
  m2: () => rand() * 20,
  delta_mag: () => rand() * 30 - 15,
  distance_1: () => rand() * 100,
  distance_2: () => rand() * 100,
};

/** A well-formed request for a real quantity, with occasional hostile values and uncertainties. */
function plausibleRequest(): unknown {
  const quantity = pick(CALC_QUANTITIES);
  const spec = QUANTITY_SPECS[quantity];
  const keys = [...spec.required, ...(spec.oneOf ? pick(spec.oneOf) : []), ...(spec.optional ?? []).filter(() => rand() < 0.5)];
  const inputs: Record<string, unknown> = {};
  for (const k of keys) {
    const v = rand() < 0.05 ? number() : PLAUSIBLE[k]();
    const r = rand();
    inputs[k] =
      r < 0.6
        ? v
        : r < 0.85
          ? { value: v, sigma: Math.abs(v) * rand() * 0.1 }
          : { value: v, minus: Math.abs(v) * 0.05, plus: Math.abs(v) * rand() * 0.2 };
  }
  if (spec.band) inputs.band = rand() < 0.9 ? pick(['V', 'B', 'g_SDSS', 'Ks_2MASS', 'r_SDSS']) : 'Y';
  const req: Record<string, unknown> = { quantity, inputs };
  if (rand() < 0.8) req.model = pick(MODEL_POOL);
  if (rand() < 0.1) req.H0_range = { low: 60 + rand() * 7, high: 68 + rand() * 7 };
  return req;
}

function request(): unknown {
  const r = rand();
  if (r < 0.5) return plausibleRequest();
  if (r < 0.02) return pick([null, 42, 'text', [], true]);
  const req: Record<string, unknown> = { quantity: rand() < 0.95 ? pick(CALC_QUANTITIES) : pick(['', 'speed', 5, null]) };
  if (rand() < 0.5) req.id = rand() < 0.8 ? `r${Math.floor(rand() * 1e6)}` : number();
  const inputs: Record<string, unknown> = {};
  const keys = [...CALC_NUMERIC_INPUTS];
  const n = Math.floor(rand() * 4);
  for (let i = 0; i < n; i++) inputs[pick(keys)] = input();
  if (rand() < 0.2) inputs.band = pick(['V', 'B', 'g_SDSS', 'Ks_2MASS', 'X', '']);
  if (rand() < 0.03) inputs.bogus = 1;
  if (rand() < 0.95) req.inputs = inputs;
  if (rand() < 0.7) req.model = rand() < 0.9 ? pick(MODEL_POOL) : randomModel();
  if (rand() < 0.1) req.H0_range = { low: 60 + number(), high: 70 + number() };
  return req;
}

function findNonFinite(x: unknown, path = '$'): string | null {
  if (typeof x === 'number') return Number.isFinite(x) ? null : path;
  if (Array.isArray(x)) {
    for (let i = 0; i < x.length; i++) {
      const p = findNonFinite(x[i], `${path}[${i}]`);
      if (p) return p;
    }
  } else if (typeof x === 'object' && x !== null) {
    for (const [k, v] of Object.entries(x)) {
      const p = findNonFinite(v, `${path}.${k}`);
      if (p) return p;
    }
  }
  return null;
}

// `npm test` runs a smaller sample to keep the suite quick; `npm run test:fuzz` runs the full 10,000.
const COUNT = Number(process.env.STARPROOF_FUZZ_COUNT ?? 2_000);

describe('fuzz', () => {
  it(`${COUNT.toLocaleString('en-GB')} random and hostile requests: no throw, no non-finite number, schema-valid`, {
    timeout: 600_000,
  }, () => {
    let ok = 0;
    const codes = new Map<string, number>();
    for (let i = 0; i < COUNT; i++) {
      const req = request();
      let out: unknown;
      expect(() => {
        out = calculate(req);
      }, JSON.stringify(req)).not.toThrow();
      expect(findNonFinite(out), JSON.stringify(req)).toBeNull();
      expect(CalcResultSchema.safeParse(out).success, JSON.stringify(req)).toBe(true);
      const r = out as { error?: { code: string } };
      if (r.error) codes.set(r.error.code, (codes.get(r.error.code) ?? 0) + 1);
      else ok++;
    }
    // The generator must reach real calculations as well as errors.
    expect(ok).toBeGreaterThan(COUNT / 10);
    expect(codes.get('internal_error') ?? 0).toBe(0);
  });
});
