import { describe, expect, it } from 'vitest';
import { parallaxWarnings } from '../../../shared/catalogue/measurement-warnings.ts';
import { modelProblems } from '../../../shared/schemas/cosmology-check.ts';

const codes = (w: Array<{ code: string }>) => w.map((x) => x.code);

describe('parallax warnings', () => {
  it('a positive parallax close to the published one needs nothing', () => {
    expect(parallaxWarnings(130.5, 0.4, [{ value: 130.2, uncertainty: 0.4 }])).toEqual([]);
    expect(parallaxWarnings(2.1, 0.3, [])).toEqual([]);
  });

  it('a small negative parallax within its noise is only explained', () => {
    expect(codes(parallaxWarnings(-0.3, 0.4, []))).toEqual(['negative_parallax']);
    expect(codes(parallaxWarnings(0, null, []))).toEqual(['negative_parallax']);
  });

  it('the published value with its sign flipped is a likely sign error', () => {
    // About 130 mas: a bright nearby star's parallax, recalled from memory; only its size matters here.
    expect(codes(parallaxWarnings(-130.2, 0.4, [{ value: 130.2, uncertainty: 0.4 }]))).toEqual([
      'negative_parallax',
      'likely_sign_error',
    ]);
  });

  it('far below zero for its uncertainty, or far from the published value, is questioned', () => {
    expect(codes(parallaxWarnings(-40, 0.5, []))).toEqual(['negative_parallax', 'impossible_negative_parallax']);
    expect(codes(parallaxWarnings(81, 0.2, [{ value: 8.1, uncertainty: 0.2 }]))).toEqual(['far_from_published']);
  });
});

describe('which custom cosmologies can be adopted', () => {
  it('presets and ordinary models pass', () => {
    expect(modelProblems({ preset: 'planck18' })).toEqual({});
    expect(modelProblems({ H0: 70, Om0: 0.3 })).toEqual({});
    expect(modelProblems({ H0: 70, Om0: 0.3, Ode0: 0.7, Tcmb0: 2.7255 })).toEqual({});
    expect(modelProblems({ law: 'hubble', H0: 70 })).toEqual({});
  });

  it('says which field is wrong and why, in words', () => {
    expect(modelProblems({ law: 'hubble', H0: -5 }).H0).toMatch(/^H0 is the expansion rate today/);
    expect(modelProblems({ H0: 70, Om0: 1.4 }).Om0).toMatch(/In a flat model the shares add up to 1/);
    const noBigBang = modelProblems({ H0: 70, Om0: 0.3, Ode0: 3 });
    expect(Object.keys(noBigBang)).toEqual(['Ode0']);
    expect(noBigBang.Ode0).toMatch(/no big bang/);
    expect(noBigBang.Ode0).not.toMatch(/E\(z\)/);
    expect(modelProblems({ H0: 70, Om0: 0.3, Tcmb0: 300 }).Tcmb0).toMatch(/2\.7255 K/);
  });
});
