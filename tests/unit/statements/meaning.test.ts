/**
 * Statements an astronomer would sign: which light (band), which object (kind, name and its
 * grammar), ratios near and below one, and the K-correction and extinction rules.
 */
import { describe, expect, it } from 'vitest';
import { bandLight } from '../../../shared/catalogue/bands.ts';
import { calculate } from '../../../shared/engine/calculate.ts';
import {
  evaluateStatement,
  findTemplate,
  kindRefusal,
  STATEMENT_LOCALES,
  STATEMENT_TEMPLATES,
  type StatementMeasurement,
  type TemplateContext,
  type TemplateSuccess,
  templatesForKind,
} from '../../../shared/statements/index.ts';
import { frenchOf, nameAtStart, nameIn } from '../../../shared/statements/names.ts';
import { kAssumptionShiftMag, kCorrectionRedshiftLimit, SPECTRAL_INDEX_SPREAD } from '../../../shared/statements/photometry.ts';
import { PERCENT_FLOOR, readRatio } from '../../../shared/statements/ratio.ts';

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
const mag = (value: number, band = 'V', sigma = 0.05) =>
  m(`m-${band}`, 'apparent_magnitude', value, { band, sigma, unit: 'mag' });

function ctx(
  object: Partial<TemplateContext['object']> & { kind: string },
  measurements: StatementMeasurement[],
  extra: Partial<TemplateContext> = {},
): TemplateContext {
  return {
    object: { id: 'o', name: 'Object', ...object },
    measurements,
    model: { preset: 'planck18' },
    band: 'V',
    ...extra,
  };
}

function ok(templateId: string, c: TemplateContext): TemplateSuccess {
  const r = evaluateStatement(templateId, c);
  if (!r.ok) throw new Error(r.reason);
  return r;
}

const ANDROMEDA = {
  name: 'Andromeda Galaxy',
  kind: 'galaxy',
  sentenceNames: {
    en: { text: 'the Andromeda Galaxy', plural: false },
    fr: { text: 'la galaxie d’Andromède', plural: false },
  },
};
const PLEIADES = {
  name: 'Pleiades',
  kind: 'cluster',
  sentenceNames: { en: { text: 'the Pleiades', plural: true }, fr: { text: 'les Pléiades', plural: true } },
};

describe('1. band light is worded as band light, never as all light', () => {
  // A nearby star (parallax 130.23 mas, as Vega; recalled from memory) measured in B and in V.
  const star = (band: string) =>
    ctx({ name: 'Vega', kind: 'star' }, [mag(0.03, 'V'), mag(0.0, 'B'), m('p', 'parallax', 130.23, { sigma: 0.36 })], { band });

  it('says "visible light" for V and "blue light" for B, in every locale, and names the band in the small print', () => {
    const v = ok('luminosity-sun', star('V'));
    const b = ok('luminosity-sun', star('B'));
    expect(v.texts['en-GB']).toMatch(/^Vega gives out about [\d.,]+ times as much visible light as the Sun\.$/);
    expect(v.texts['en-US']).toMatch(/as much visible light as the Sun/);
    expect(v.texts['fr-FR']).toMatch(/^Vega émet environ [\d, ]+ fois plus de lumière visible que le Soleil\.$/);
    expect(b.texts['en-GB']).toMatch(/as much blue light as the Sun/);
    expect(b.texts['en-US']).toMatch(/as much blue light as the Sun/);
    expect(b.texts['fr-FR']).toMatch(/plus de lumière bleue que le Soleil/);
    expect(v.footnotes?.['en-GB']).toMatch(/Johnson V/);
    expect(b.footnotes?.['fr-FR']).toMatch(/Johnson B/);
    // Two numbers from two bands never share one wording.
    expect(v.texts['en-GB'].replace(/[\d.,]+/, 'N')).not.toBe(b.texts['en-GB'].replace(/[\d.,]+/, 'N'));
  });

  it('never claims total light output (no bolometric correction is applied)', () => {
    for (const band of ['V', 'B']) {
      for (const id of ['luminosity-sun', 'brightness-at-10pc']) {
        const r = ok(id, star(band));
        for (const text of Object.values(r.texts)) expect(text).not.toMatch(/total|bolom|toute la lumière|lumière totale/i);
      }
    }
  });

  it('the brightness from 10 pc says which light the comparison is in', () => {
    const r = ok('brightness-at-10pc', star('B'));
    expect(r.texts['en-GB']).toMatch(/fainter in blue light than the Sun does in our sky\.$/);
    expect(r.texts['fr-FR']).toMatch(/en lumière bleue\.$/);
  });

  it('has plain words for every band the engine knows, and names infrared bands too', () => {
    for (const band of [
      'U',
      'B',
      'V',
      'R_C',
      'I_C',
      'J_2MASS',
      'H_2MASS',
      'Ks_2MASS',
      'u_SDSS',
      'g_SDSS',
      'r_SDSS',
      'i_SDSS',
      'z_SDSS',
    ]) {
      expect(bandLight(band, 'en').light).toMatch(/light/);
      expect(bandLight(band, 'fr').light).toMatch(/^lumière /);
    }
    expect(bandLight('J_2MASS', 'en').inLight).toBe('in infrared light (J band)');
    expect(bandLight('Ks_2MASS', 'fr').inLight).toBe('en lumière infrarouge (bande Ks)');
    expect(bandLight('W1', 'en').light).toBe('light in the W1 band');
  });
});

describe('2. the K-correction and extinction rules', () => {
  it('check values: the shift a spread of ±0.5 in α makes, and the redshift limits', () => {
    // Hand-worked: 2.5 × 0.5 × log10(3.22) = 1.25 × 0.50786 = 0.6348 mag, a factor 10^(0.4 × 0.6348) = 1.794 in light:
    // "about a factor two" at z = 2.22 between K = 0 (α = −1) and α = −0.5.
    expect(SPECTRAL_INDEX_SPREAD).toBe(0.5);
    expect(kAssumptionShiftMag(2.22)).toBeCloseTo(0.6348, 4);
    expect(10 ** (0.4 * kAssumptionShiftMag(2.22))).toBeCloseTo(1.794, 3);
    // z_K = 10^(w / 1.25) − 1: 0.0965 for an unknown interval (0.05 mag), 0.2023 for ±0.1 mag (hand-worked).
    expect(kCorrectionRedshiftLimit(null)).toBeCloseTo(0.0965, 4);
    expect(kCorrectionRedshiftLimit(0.1)).toBeCloseTo(0.2023, 4);
  });

  it('the engine agrees: at z = 2.22, α = −0.5 against K = 0 moves the luminosity by that factor', () => {
    const base = { m: { value: 15.9 }, z: { value: 2.22 }, band: 'V' };
    const noK = calculate({ quantity: 'luminosity_ratio_sun', inputs: base, model: { preset: 'planck18' } });
    const withK = calculate({
      quantity: 'luminosity_ratio_sun',
      inputs: { ...base, alpha: { value: -0.5 } },
      model: { preset: 'planck18' },
    });
    if ('error' in noK || 'error' in withK) throw new Error('engine failed');
    expect(noK.value / withK.value).toBeCloseTo(3.22 ** 0.5, 3);
  });

  const farQuasar = (extra: StatementMeasurement[] = [], more: Partial<TemplateContext> = {}) =>
    ctx({ name: 'TON 618', kind: 'quasar' }, [mag(15.9, 'V', 0.05), m('z', 'redshift', 2.22, { sigma: 0.001 }), ...extra], more);

  it('above the limit, without a spectral index, a light or brightness statement needs input and says which', () => {
    for (const id of ['luminosity-sun', 'brightness-at-10pc']) {
      const r = evaluateStatement(id, farQuasar());
      expect(r).toMatchObject({ ok: false, code: 'missing_input', missing: ['spectral_index'] });
      if (!r.ok) expect(r.reason).toMatch(/^Needs input: a preferred spectral index \(α\) for TON 618\. At z = 2\.22/);
    }
    // Distances do not depend on the spectrum.
    expect(evaluateStatement('distance-today', farQuasar()).ok).toBe(true);
  });

  it('with a measured spectral index it is computed', () => {
    const r = ok('luminosity-sun', farQuasar([m('a', 'spectral_index', -0.5, { sigma: 0.1 })]));
    expect(r.inputs.map((i) => i.quantity)).toContain('spectral_index');
    expect(r.working.some((s) => /K-correction for a power-law/.test(s.title))).toBe(true);
  });

  it('with an organisation default for the kind it is computed, and the working and warnings state the assumption', () => {
    const assumptions = {
      spectralIndex: {
        quasar: { value: -0.44, sigma: 0.3, source: 'Vanden Berk et al. (2001), AJ 122, 549 (recalled from memory)' },
      },
    };
    const r = ok('luminosity-sun', farQuasar([], { assumptions }));
    const k = r.working.find((s) => /K-correction for a power-law/.test(s.title));
    expect(k?.inputs.find((i) => i.symbol === 'α')?.source).toMatch(
      /^ASSUMPTION — the organisation’s default spectral index for quasars/,
    );
    expect(r.warnings.join(' ')).toMatch(/Assumed spectral index α = -0\.44 for quasars \(organisation setting; Vanden Berk/);
    expect(r.working.some((s) => s.title === 'K-correction: is a spectral index needed?')).toBe(true);
    // A default for galaxies does not stand in for a quasar.
    expect(
      evaluateStatement(
        'luminosity-sun',
        farQuasar([], { assumptions: { spectralIndex: { galaxy: assumptions.spectralIndex.quasar } } }),
      ).ok,
    ).toBe(false);
  });

  it('a default without a stated spread carries the rule’s ±0.5, so the rounding admits it', () => {
    const source = 'Vanden Berk et al. (2001), AJ 122, 549 (recalled from memory)';
    const bare = ok(
      'luminosity-sun',
      farQuasar([], { assumptions: { spectralIndex: { quasar: { value: -0.44, sigma: null, source } } } }),
    );
    const spread = ok(
      'luminosity-sun',
      farQuasar([], { assumptions: { spectralIndex: { quasar: { value: -0.44, sigma: 0.05, source } } } }),
    );
    const alpha = bare.working.find((s) => /K-correction for a power-law/.test(s.title))?.inputs.find((i) => i.symbol === 'α');
    expect(alpha?.source).toMatch(/spread ±0\.5 assumed \(none given\)$/);
    // ±0.5 in α at z = 2.22 is ±0.63 mag (above): more than 30 %, so one significant figure.
    expect(bare.significantFigures).toBe(1);
    expect(spread.significantFigures).toBeGreaterThan(1);
  });

  it('below the limit K = 0 is kept, and the working says why', () => {
    const near = ctx({ name: 'Near quasar', kind: 'quasar' }, [mag(14, 'V', 0.05), m('z', 'redshift', 0.05, { sigma: 0.0001 })]);
    const r = ok('luminosity-sun', near);
    const rule = r.working.find((s) => s.title === 'K-correction: is a spectral index needed?');
    // 2.5 × 0.5 × log10(1.05) = 0.0265 mag, below the ±0.05 mag of the magnitude (hand-worked).
    expect(rule?.result.value).toBeCloseTo(0.0265, 4);
    expect(rule?.note).toMatch(/^Below z_K = /);
  });

  it('a star, nebula or cluster beyond 100 pc needs a measured extinction; nearer, or a galaxy, it does not', () => {
    const far = ctx({ name: 'Far star', kind: 'star' }, [mag(5), m('d', 'distance', 500, { sigma: 20 })]);
    const r = evaluateStatement('luminosity-sun', far);
    expect(r).toMatchObject({ ok: false, code: 'missing_input', missing: ['extinction'] });
    if (!r.ok)
      expect(r.reason).toMatch(/Needs input: a preferred extinction in the V band\. Far star is a star about 500 pc away/);
    expect(
      ok('luminosity-sun', { ...far, measurements: [...far.measurements, m('e', 'extinction', 0.5, { band: 'V', sigma: 0.1 })] })
        .ok,
    ).toBe(true);
    expect(
      ok('luminosity-sun', ctx({ name: 'Near star', kind: 'star' }, [mag(5), m('d', 'distance', 50, { sigma: 1 })])).ok,
    ).toBe(true);
    expect(evaluateStatement('luminosity-sun', ctx({ ...PLEIADES }, [mag(1.6), m('d', 'distance', 136, { sigma: 1 })])).ok).toBe(
      false,
    );
    expect(ok('luminosity-sun', ctx({ ...ANDROMEDA }, [mag(3.44), m('d', 'distance', 765000, { sigma: 30000 })])).ok).toBe(true);
  });
});

describe('3. each template is valid for some kinds of object only', () => {
  it('every template declares its kinds and why the others are refused', () => {
    for (const t of STATEMENT_TEMPLATES) {
      expect(t.kinds.length).toBeGreaterThan(0);
      expect(t.kindsReason.length).toBeGreaterThan(20);
    }
  });

  it('the planet-light template is not offered for a quasar; nor brightness from 10 pc or the naked-eye limit for a galaxy', () => {
    expect(templatesForKind('quasar').map((t) => t.id)).not.toContain('planet-light-tonight');
    expect(templatesForKind('galaxy').map((t) => t.id)).toEqual([
      'luminosity-sun',
      'light-travel',
      'light-set-out-timeline',
      'distance-today',
      'scale-model',
      'distance-today-phrase',
      'light-travel-phrase',
    ]);
    expect(templatesForKind('planet').map((t) => t.id)).toEqual(['naked-eye', 'planet-light-tonight']);
    expect(templatesForKind('sun')).toEqual([]);
    expect(kindRefusal(findTemplate('planet-light-tonight')!, 'quasar')).toMatch(/not for an object of kind “quasar”/);
  });

  it('refuses with the reason, whatever the measurements, so a stored statement goes to review', () => {
    const andromeda = ctx({ ...ANDROMEDA }, [mag(3.44), m('d', 'distance', 765000, { sigma: 30000 })]);
    for (const id of ['brightness-at-10pc', 'naked-eye']) {
      const r = evaluateStatement(id, andromeda);
      expect(r).toMatchObject({ ok: false, code: 'not_applicable' });
      if (!r.ok) expect(r.reason).toMatch(/^Needs review: “.+” is not for an object of kind “galaxy”: /);
    }
    const r = evaluateStatement('brightness-at-10pc', andromeda);
    if (!r.ok) expect(r.reason).toMatch(/fill the sky/);
  });
});

describe('4. names with their article and number, and ratios near or below one', () => {
  it('uses the sentence name in every template, with the verb agreeing, in every locale', () => {
    const pleiades = ctx({ ...PLEIADES }, [
      mag(1.6),
      m('d', 'distance', 136, { sigma: 1 }),
      m('e', 'extinction', 0.12, { band: 'V', sigma: 0.03 }),
    ]);
    expect(ok('distance-today', pleiades).texts).toEqual({
      'en-GB': 'The Pleiades are about 444 light-years away.',
      'en-US': 'The Pleiades are about 444 light-years away.',
      'fr-FR': 'Les Pléiades se trouvent à environ 444 années-lumière.',
    });
    const light = ok('luminosity-sun', pleiades).texts;
    expect(light['en-GB']).toMatch(/^The Pleiades give out about /);
    expect(light['fr-FR']).toMatch(/^Les Pléiades émettent environ /);
    expect(ok('light-travel', pleiades).texts['fr-FR']).toMatch(/^La lumière que nous recevons des Pléiades est partie/);
    expect(ok('scale-model', pleiades).texts['fr-FR']).toMatch(/les Pléiades seraient à environ/);
    const andromeda = ctx({ ...ANDROMEDA }, [mag(3.44), m('d', 'distance', 765000, { sigma: 30000 })]);
    expect(ok('distance-today', andromeda).texts['en-GB']).toBe('The Andromeda Galaxy is about 2.5 million light-years away.');
    expect(ok('light-travel', andromeda).texts['en-US']).toMatch(/^The light we see from the Andromeda Galaxy set out/);
    expect(ok('light-travel', andromeda).texts['fr-FR']).toMatch(/^La lumière que nous recevons de la galaxie d’Andromède/);
  });

  it('French "de" contracts with the article', () => {
    const o = (fr: string, plural = false) => ({ name: 'x', sentenceNames: { fr: { text: fr, plural } } });
    expect(frenchOf(o('le Soleil'))).toBe('du Soleil');
    expect(frenchOf(o('les Pléiades', true))).toBe('des Pléiades');
    expect(frenchOf(o('la galaxie d’Andromède'))).toBe('de la galaxie d’Andromède');
    expect(frenchOf(o('l’amas globulaire d’Hercule'))).toBe('de l’amas globulaire d’Hercule');
    expect(frenchOf(o('Oméga du Centaure'))).toBe('d’Oméga du Centaure');
    expect(frenchOf({ name: 'Sirius' })).toBe('de Sirius');
    expect(nameAtStart({ name: 'x', sentenceNames: { en: { text: 'the Moon', plural: false } } }, 'en-GB')).toBe('The Moon');
    expect(nameIn({ name: '3C 279' }, 'fr-FR')).toBe('3C 279');
  });

  // Check values, hand-worked from M = m − 5 log10(d / 10 pc) and m☉(V) = −26.76 (Willmer 2018, Table 3).
  // A quasar placed by a measured distance: no extinction rule (not in our Galaxy), no K-correction (no redshift).
  const at10pc = (m0: number, dPc: number) =>
    ctx({ name: 'Test star', kind: 'quasar' }, [mag(m0, 'V', 0.01), m('d', 'distance', dPc, { sigma: dPc * 1e-4 })]);

  it('a ratio that rounds to one reads "about as bright as", never "about 1 times"', () => {
    // d = 10^((0 + 26.76) / 5 + 1) pc gives M = −26.76 exactly: as bright as the Sun in our sky.
    const r = ok('brightness-at-10pc', at10pc(0, 10 ** (26.76 / 5 + 1)));
    expect(r.texts['en-GB']).toBe(
      'Seen from 10 parsecs (about 33 light-years) away, Test star would look about as bright in visible light as the Sun does in our sky.',
    );
    expect(r.texts['fr-FR']).toMatch(/brillerait à peu près autant que le Soleil dans notre ciel, en lumière visible\.$/);
    for (const text of Object.values(r.texts)) expect(text).not.toMatch(/\b1 (times|fois)\b/);
    const eye = ok('naked-eye', ctx({ name: 'Limit star', kind: 'star' }, [mag(6.0, 'V', 0.01)]));
    expect(eye.texts['en-GB']).toBe('Limit star is about at the limit of what the unaided eye can see on a dark night.');
    expect(eye.texts['fr-FR']).toBe('Limit star est à peu près à la limite de ce que l’œil nu peut voir par nuit noire.');
  });

  it('below one: a percentage down to 1 %, "times fainter" below', () => {
    // M = −26.76 + 1 (2.5 times fainter): 10^(−0.4) = 39.8 % (hand-worked).
    const pct = ok('brightness-at-10pc', at10pc(1, 10 ** (26.76 / 5 + 1)));
    expect(pct.texts['en-GB']).toBe(
      'Seen from 10 parsecs (about 33 light-years) away, Test star would look about 39.8 per cent as bright in visible light as the Sun does in our sky.',
    );
    expect(pct.texts['fr-FR']).toMatch(/aurait environ 39,8 % de l’éclat du Soleil dans notre ciel, en lumière visible\.$/);
    // 10 magnitudes fainter: 10^4 times (hand-worked).
    const far = ok('brightness-at-10pc', at10pc(10, 10 ** (26.76 / 5 + 1)));
    expect(far.texts['en-GB']).toMatch(/about 10,000 times fainter in visible light than the Sun/);
    expect(readRatio(0.5, null).form).toBe('percent');
    expect(readRatio(PERCENT_FLOOR / 2, null).form).toBe('fainter');
    expect(readRatio(2, null).form).toBe('times');
  });

  it('every locale is written for every template and form', () => {
    const r = ok(
      'luminosity-sun',
      ctx({ name: 'Dim star', kind: 'star' }, [mag(15, 'V', 0.01), m('p', 'parallax', 300, { sigma: 0.1 })]),
    );
    // d = 3.333 pc: M = 15 − 5 log10(0.3333) = 17.39; L/L☉ = 10^(−0.4 (17.39 − 4.81)) = 9.2e-6 → "times less" (hand-worked).
    expect(r.texts['en-GB']).toMatch(/^Dim star gives out about [\d,]+ times less visible light than the Sun\.$/);
    expect(r.texts['fr-FR']).toMatch(/^Dim star émet environ [\d\s\u202f]+ fois moins de lumière visible que le Soleil\.$/);
    expect(Object.keys(r.texts)).toEqual([...STATEMENT_LOCALES]);
  });
});
