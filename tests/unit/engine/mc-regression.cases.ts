/**
 * The requests and statement contexts frozen in mc-regression.json: every quantity, the presets,
 * custom open, closed, massive-neutrino and bouncing models, the Hubble law, exact, symmetric and
 * asymmetric uncertainties, H0 ranges and draws that leave the domain. Generated from a fixed seed,
 * so the list is the same on every run; `tsx tests/unit/engine/mc-regression.generate.ts` rewrites
 * the fixture from the engine as it stands (only when a change of results is intended).
 */
import type { StatementMeasurement, TemplateContext } from '../../../shared/statements/index.ts';
import { STATEMENT_TEMPLATES } from '../../../shared/statements/index.ts';
import { mulberry32 } from '../../../shared/engine/uncertainty.ts';

type Model = Record<string, unknown> | undefined;

/** Models with the H0 each resolves to, so an H0_range can be built around it. */
const MODELS: Array<{ model: Model; H0: number }> = [
  { model: undefined, H0: 67.66 },
  { model: { preset: 'planck18' }, H0: 67.66 },
  { model: { preset: 'wmap9' }, H0: 69.32 },
  { model: { H0: 70, Om0: 0.3 }, H0: 70 },
  { model: { name: 'open', H0: 68, Om0: 0.3, Ode0: 0.6 }, H0: 68 },
  { model: { name: 'closed', H0: 72, Om0: 0.45, Ode0: 0.75 }, H0: 72 },
  { model: { H0: 67.7, Om0: 0.31, Tcmb0: 2.7255, Neff: 3.046, m_nu: [0, 0.02, 0.06] }, H0: 67.7 },
  { model: { name: 'bounce', H0: 70, Om0: 0.05, Ode0: 1.3 }, H0: 70 },
  { model: { law: 'hubble', H0: 70 }, H0: 70 },
];

const QUANTITIES = [
  'comoving_distance',
  'transverse_comoving_distance',
  'angular_diameter_distance',
  'luminosity_distance',
  'light_travel_distance',
  'proper_distance',
  'lookback_time',
  'age_at_z',
  'age_now',
  'hubble_parameter',
  'distance_modulus',
  'absolute_magnitude',
  'luminosity_ratio_sun',
  'z_from_lookback_time',
  'z_from_luminosity_distance',
  'parallax_distance',
  'flux_ratio',
] as const;

const BANDS = ['V', 'B', 'U', 'R', 'I', 'J', 'H', 'K', 'g', 'r'];

/** Calculation requests, a few hundred, varied from one seed. */
export function calcCases(): unknown[] {
  const rand = mulberry32(20261201);
  const pick = <T>(xs: readonly T[]): T => xs[Math.floor(rand() * xs.length)];
  const logUniform = (lo: number, hi: number) => lo * (hi / lo) ** rand();
  // An input with a random kind of uncertainty; `rel` sets its typical relative size.
  const measured = (value: number, rel: number) => {
    const kind = rand();
    if (kind < 0.15) return value;
    if (kind < 0.25) return { value, sigma: 0 };
    if (kind < 0.65) return { value, sigma: Math.abs(value) * rel * logUniform(0.1, 3) || rel };
    return {
      value,
      minus: Math.abs(value) * rel * logUniform(0.1, 3) || rel,
      plus: Math.abs(value) * rel * logUniform(0.1, 3) || rel,
      source: 'catalogue entry 7',
    };
  };
  const redshift = () => (rand() < 0.1 ? pick([-0.5, 0, 1100, 2e4, 5e5]) : logUniform(0.001, 12));
  const out: unknown[] = [];
  for (let i = 0; i < 360; i++) {
    const quantity = QUANTITIES[i % QUANTITIES.length];
    const { model, H0 } = pick(MODELS);
    const inputs: Record<string, unknown> = {};
    const distanceSource = () => {
      const which = rand();
      if (which < 0.6) inputs.z = measured(redshift(), 0.02);
      else if (which < 0.8) inputs.distance_mpc = measured(logUniform(1e-5, 3e4), 0.1);
      else inputs.parallax_mas = measured(logUniform(0.1, 800), 0.05);
    };
    if (['distance_modulus', 'absolute_magnitude', 'luminosity_ratio_sun'].includes(quantity)) {
      distanceSource();
      if (quantity !== 'distance_modulus') {
        inputs.m = measured(2 + rand() * 20, 0.01);
        if (rand() < 0.3) inputs.extinction = measured(rand() * 0.5, 0.3);
        if (inputs.z !== undefined && rand() < 0.3) inputs.alpha = measured(-0.5 - rand(), 0.2);
      }
      if (quantity === 'luminosity_ratio_sun') inputs.band = rand() < 0.95 ? pick(BANDS) : 'Q';
    } else if (quantity === 'z_from_lookback_time') inputs.lookback_gyr = measured(logUniform(0.01, 14), 0.05);
    else if (quantity === 'z_from_luminosity_distance') inputs.distance_mpc = measured(logUniform(1, 1e5), 0.05);
    else if (quantity === 'parallax_distance') inputs.parallax_mas = measured(logUniform(0.05, 800), 0.1);
    else if (quantity === 'flux_ratio') {
      const which = rand();
      if (which < 0.33) inputs.delta_mag = measured(rand() * 10 - 5, 0.02);
      else if (which < 0.66) Object.assign(inputs, { m1: measured(rand() * 15, 0.01), m2: measured(rand() * 15, 0.01) });
      else
        Object.assign(inputs, { distance_1: measured(logUniform(1, 100), 0.1), distance_2: measured(logUniform(1, 100), 0.1) });
    } else if (quantity !== 'age_now') inputs.z = measured(redshift(), 0.02);
    const request: Record<string, unknown> = { id: i, quantity, inputs };
    if (model !== undefined) request.model = model;
    if (rand() < 0.2) request.H0_range = { low: H0 - logUniform(0.2, 5), high: H0 + logUniform(0.2, 5) };
    out.push(request);
  }
  // Hand-picked: the profiled luminosity call, a draw pushed below z = −1, an H0 range alone.
  out.push({
    quantity: 'luminosity_ratio_sun',
    inputs: { m: { value: 12.9, sigma: 0.1 }, z: { value: 0.158, sigma: 0.0003 }, band: 'V' },
  });
  out.push({ quantity: 'comoving_distance', inputs: { z: { value: 0.05, sigma: 0.5 } } });
  out.push({ quantity: 'age_now', H0_range: { low: 66, high: 69 } });
  out.push({
    quantity: 'lookback_time',
    inputs: { z: { value: 0.3, minus: 0.01, plus: 0.2 } },
    model: { law: 'hubble', H0: 70 },
    H0_range: { low: 60, high: 75 },
  });
  return out;
}

const src = { id: 'src-1', citation: 'Values for automated checks' };
const m = (id: string, quantity: string, value: number, extra: Partial<StatementMeasurement> = {}): StatementMeasurement => ({
  id,
  quantity,
  value,
  unit: '',
  band: null,
  source: src,
  ...extra,
});
const ctx = (
  name: string,
  measurements: StatementMeasurement[],
  model: TemplateContext['model'] = { preset: 'planck18' },
  band = 'V',
): TemplateContext => ({
  object: { id: 'o', name, kind: 'quasar' },
  measurements,
  model,
  band,
});
const vmag = (value: number, extra: Partial<StatementMeasurement> = { sigma: 0.1 }) =>
  m('v', 'apparent_magnitude', value, { band: 'V', unit: 'mag', ...extra });

/** Statement contexts: each is evaluated with every template. */
export function statementCases(): Array<{ templateId: string; ctx: TemplateContext }> {
  const contexts: TemplateContext[] = [
    ctx('Q1', [m('z', 'redshift', 0.158, { sigma: 0.0003 }), vmag(12.9)]),
    ctx('Q1 wmap', [m('z', 'redshift', 0.158, { sigma: 0.0003 }), vmag(12.9)], { preset: 'wmap9' }),
    ctx('Q1 law', [m('z', 'redshift', 0.158, { sigma: 0.0003 }), vmag(12.9)], { law: 'hubble', H0: 70 }),
    ctx('Far', [
      m('z', 'redshift', 5.8, { minus: 0.02, plus: 0.05 }),
      vmag(19.5, { minus: 0.05, plus: 0.2 }),
      m('a', 'spectral_index', -0.7, { sigma: 0.1 }),
      m('e', 'extinction', 0.12, { band: 'V', sigma: 0.02 }),
    ]),
    ctx('Near galaxy', [m('z', 'redshift', 0.021, { sigma: 0.001 }), vmag(11.2, {})]),
    ctx('Open', [m('z', 'redshift', 1.2, { sigma: 0.01 }), vmag(17.1)], { name: 'open', H0: 68, Om0: 0.3, Ode0: 0.6 }),
    ctx('Closed', [m('z', 'redshift', 2.4, { sigma: 0.03 }), vmag(18.3)], { name: 'closed', H0: 72, Om0: 0.45, Ode0: 0.75 }),
    ctx('Neutrinos', [m('z', 'redshift', 0.7, { sigma: 0.002 }), vmag(16.0, { sigma: 0.3 })], {
      H0: 67.7,
      Om0: 0.31,
      Tcmb0: 2.7255,
      Neff: 3.046,
      m_nu: [0, 0.02, 0.06],
    }),
    ctx('Exact', [m('z', 'redshift', 0.5), vmag(15, {})]),
    ctx('Blue band', [
      m('z', 'redshift', 0.3, { sigma: 0.01 }),
      m('b', 'apparent_magnitude', 14.2, { band: 'B', unit: 'mag', sigma: 0.05 }),
    ]),
    ctx('Star', [m('p', 'parallax', 130.23, { sigma: 0.36, unit: 'mas' }), vmag(3.2, { sigma: 0.01 })]),
    ctx('Bright star', [m('p', 'parallax', 379.21, { minus: 0.4, plus: 1.6, unit: 'mas' }), vmag(-1.46, { sigma: 0.01 })]),
    ctx('Cluster', [m('d', 'distance', 2.5e6, { sigma: 1e5, unit: 'pc' }), vmag(3.44, { sigma: 0.05 })]),
    ctx('Cluster exact', [m('d', 'distance', 780, { unit: 'pc' }), vmag(6.8, {})]),
    ctx('Tiny z', [m('z', 'redshift', -0.001), m('d', 'distance', 7.6e5, { minus: 2e4, plus: 3e4, unit: 'pc' })]),
    ctx('Nothing', []),
    ctx('Wide', [m('z', 'redshift', 0.05, { sigma: 0.5 }), vmag(13)]),
    // Since the K-correction rule (statement rules release 2) the contexts above without a spectral
    // index freeze the "needs input" refusal of the light and brightness templates; these keep their
    // Monte Carlo covered, with a measured spectral index.
    ctx('Q1 alpha', [m('z', 'redshift', 0.158, { sigma: 0.0003 }), vmag(12.9), m('a', 'spectral_index', -0.5, { sigma: 0.2 })]),
    ctx('Closed alpha', [m('z', 'redshift', 2.4, { sigma: 0.03 }), vmag(18.3), m('a', 'spectral_index', -0.44)], {
      name: 'closed',
      H0: 72,
      Om0: 0.45,
      Ode0: 0.75,
    }),
    ctx(
      'Neutrinos alpha',
      [m('z', 'redshift', 0.7, { sigma: 0.002 }), vmag(16.0, { sigma: 0.3 }), m('a', 'spectral_index', -0.6, { sigma: 0.1 })],
      { H0: 67.7, Om0: 0.31, Tcmb0: 2.7255, Neff: 3.046, m_nu: [0, 0.02, 0.06] },
    ),
  ];
  // Templates about a venue's night draw no Monte Carlo (planet-light-tonight.test.ts covers them).
  return contexts.flatMap((c) => STATEMENT_TEMPLATES.filter((t) => !t.needsVenue).map((t) => ({ templateId: t.id, ctx: c })));
}

type Working = Array<{ title: string; result: { value: number }; inputs: Array<{ value: number | string }>; note?: string }>;
const compactWorking = (working: Working) =>
  working.map((s) => ({ title: s.title, value: s.result.value, inputs: s.inputs.map((i) => i.value), note: s.note ?? null }));

/**
 * What the fixture keeps of a result: numbers, interval, texts, warnings, errors and the working's
 * titles, values and notes (model descriptions and sources, which sampling never touches, are left out).
 * @param r a calculation result or a statement outcome
 * @returns the comparable part
 */
export function frozen(r: Record<string, unknown>): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const key of [
    'id',
    'ok',
    'code',
    'reason',
    'missing',
    'error',
    'value',
    'unit',
    'interval',
    'significantFigures',
    'texts',
    'footnotes',
    'warnings',
  ]) {
    if (r[key] !== undefined) out[key] = r[key];
  }
  if (Array.isArray(r.working)) out.working = compactWorking(r.working as Working);
  return out;
}
