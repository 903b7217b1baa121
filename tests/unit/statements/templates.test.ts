import { describe, expect, it } from 'vitest';
import { calculate } from '../../../shared/engine/calculate.ts';
import { LY_PER_PC } from '../../../shared/engine/units.ts';
import { CatalogueLimits } from '../../../shared/validations.ts';
import {
  evaluateStatement,
  STATEMENT_TEMPLATES,
  type StatementMeasurement,
  type TemplateContext,
} from '../../../shared/statements/index.ts';
import { testMeasurement } from '../../support/statement-fixtures.ts';

const m = testMeasurement;
const ctx = (
  name: string,
  measurements: StatementMeasurement[],
  model: TemplateContext['model'] = { preset: 'planck18' },
): TemplateContext => ({
  object: { id: 'o', name, kind: 'quasar' },
  measurements,
  model,
  band: 'V',
});

// At z = 0.241 with ±0.1 mag the K-correction matters (z_K ≈ 0.20), so Q1 carries a measured spectral index.
const quasar = ctx('Q1', [
  m('z', 'redshift', 0.241, { sigma: 0.0005 }),
  m('v', 'apparent_magnitude', 14.6, { sigma: 0.1, band: 'V', unit: 'mag' }),
  m('a', 'spectral_index', -0.5, { sigma: 0.2 }),
]);

function ok(templateId: string, c: TemplateContext) {
  const r = evaluateStatement(templateId, c);
  if (!r.ok) throw new Error(r.reason);
  return r;
}

describe('statement templates', () => {
  it('every template renders every locale and ends its working with the wording step', () => {
    // Templates about a venue's night have their own tests (planet-light-tonight.test.ts).
    for (const t of STATEMENT_TEMPLATES.filter((x) => !x.needsVenue)) {
      const r = ok(t.id, quasar);
      expect(Object.keys(r.texts).sort()).toEqual(['en-GB', 'en-US', 'fr-FR']);
      for (const text of Object.values(r.texts)) {
        // A phrase form is only the number's words; the writer's sentence names the object.
        if (!t.phraseOf) expect(text).toMatch(/Q1/);
        expect(text).not.toMatch(/e\+|NaN|Infinity|undefined/);
      }
      expect(r.working.at(-1)!.title).toMatch(/Public wording/);
    }
  });

  it('a measurement citing a source at the longest citation allowed still gives every template its figure', () => {
    const longest = {
      id: 'src-long',
      citation: `Corrie Vale Survey Team (demo), ${'a long catalogue title '.repeat(30)}`.slice(0, CatalogueLimits.citationMax),
    };
    const id = '3f1c2a9e-5b7d-4c1e-9a2f-0d6b8e4c7a11';
    const cited = ctx('Q1', [
      m(id, 'redshift', 0.241, { sigma: 0.0005, source: longest }),
      m('v', 'apparent_magnitude', 14.6, { sigma: 0.1, band: 'V', unit: 'mag', source: longest }),
      m('a', 'spectral_index', -0.5, { sigma: 0.2 }),
    ]);
    for (const t of STATEMENT_TEMPLATES.filter((x) => !x.needsVenue)) expect(evaluateStatement(t.id, cited).ok, t.id).toBe(true);
  });

  it('light-travel uses the engine’s lookback time and age (reference-tested) with the cosmology named', () => {
    const r = ok('light-travel', quasar);
    const lookback = calculate({
      quantity: 'lookback_time',
      inputs: { z: { value: 0.241, sigma: 0.0005 } },
      model: { preset: 'planck18' },
    });
    if ('error' in lookback) throw new Error();
    expect(r.value).toBeCloseTo(lookback.value * 1e9, 0);
    // Two figures: the H0 range (67.4–73.04 km/s/Mpc) moves the time by −7.4 %, more than the 3 % that three need.
    expect(r.texts['en-GB']).toMatch(
      /^The light we see from Q1 set out about 2\.9 billion years ago, when the universe was about 11 billion years old\.$/,
    );
    expect(r.footnotes?.['en-GB']).toMatch(/Planck 2018/);
  });

  it('spells units the reader’s way', () => {
    const r = ok('scale-model', quasar);
    expect(r.texts['en-GB']).toMatch(/centimetre across.*kilometres away/);
    expect(r.texts['en-US']).toMatch(/centimeter across.*kilometers away/);
    expect(r.texts['fr-FR']).toMatch(/milliards de kilomètres/);
  });

  it('a nearby star uses its parallax, not a cosmology', () => {
    // Hand-worked: 1000 / 130.23 mas = 7.6787 pc × 3.2616 ly/pc = 25.045 ly (common practice).
    const star = ctx('S1', [m('p', 'parallax', 130.23, { sigma: 0.36, unit: 'mas' })]);
    const r = ok('distance-today', star);
    expect(r.value).toBeCloseTo((1000 / 130.23) * LY_PER_PC, 6);
    expect(r.model).toBeNull();
    expect(r.footnotes).toBeNull();
  });

  it('a statement that cannot be worked out says why in words, not in the contract keys', () => {
    // A parallax typed with the wrong sign (the catalogue warns, but accepts it when confirmed).
    const r = evaluateStatement('distance-today', ctx('S2', [m('p', 'parallax', -130.23, { sigma: 0.36, unit: 'mas' })]));
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.code).toBe('calculation_failed');
      expect(r.reason).toBe('The calculation failed: parallax (mas) must be greater than 0 (the value is −130.23).');
    }
    // A statement's uncertainty is its measurement's: no advice to type a smaller one (z 0.02 ± 0.5:
    // about 2 % of draws fall below z = −1, where no lookback time exists).
    const vague = evaluateStatement('light-travel', ctx('Q4', [m('z', 'redshift', 0.02, { sigma: 0.5 })]));
    expect(vague.ok).toBe(false);
    if (!vague.ok) {
      expect(vague.reason).toMatch(
        /^The calculation failed: the uncertainty on redshift z reaches values where lookback time is not defined \([\d.]+ % of draws\)\.$/,
      );
    }
  });

  it('refuses to render without its inputs and says which', () => {
    const r = evaluateStatement('luminosity-sun', ctx('Q2', [m('z', 'redshift', 0.5)]));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.reason).toMatch(/apparent magnitude/);
    const d = evaluateStatement('distance-today', ctx('Q3', []));
    expect(d.ok).toBe(false);
    if (!d.ok) expect(d.missing).toEqual(['redshift', 'distance', 'parallax']);
  });

  it('ignores a blueshift or tiny redshift as a distance (peculiar motion dominates below z 0.01)', () => {
    const r = evaluateStatement('distance-today', ctx('Near galaxy', [m('z', 'redshift', -0.001)]));
    expect(r.ok).toBe(false);
  });

  it('under the simple Hubble law the footnote and warnings say so', () => {
    const far = ctx('Q4', [m('z', 'redshift', 2.0, { sigma: 0.01 })], { law: 'hubble', H0: 70 });
    const r = ok('distance-today', far);
    expect(r.footnotes?.['en-GB']).toMatch(/simple Hubble law/);
    expect(r.warnings.join(' ')).toMatch(/only holds for small redshifts/);
  });

  it('a fainter-than-the-eye object is worded as too faint', () => {
    // 10^(0.4 × (14.6 − 6)) = 2754 (hand-worked, common practice magnitude limit 6).
    const r = ok('naked-eye', quasar);
    expect(r.value).toBeCloseTo(10 ** (0.4 * 8.6), 6);
    expect(r.texts['en-GB']).toBe('Q1 is about 2,800 times too faint to see with the unaided eye, even on a dark night.');
  });
});
