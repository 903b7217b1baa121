import { describe, expect, it } from 'vitest';
import { evaluateStatement, type StatementMeasurement, type TemplateContext } from '../../../shared/statements/index.ts';
import { modelInWords, publicEvidence, publicSourceName, workingSources } from '../../../shared/statements/public-evidence.ts';
import { testMeasurement } from '../../support/statement-fixtures.ts';

const m = testMeasurement;
const ctx = (kind: string, measurements: StatementMeasurement[]): TemplateContext => ({
  object: { id: 'o', name: 'Test object', kind },
  measurements,
  model: { preset: 'planck18' },
  band: 'V',
});
const MEASUREMENT_ID = '0b1c2d3e-4f50-4617-8293-a4b5c6d7e8f9';
const quasar = ctx('quasar', [m(MEASUREMENT_ID, 'redshift', 0.241, { sigma: 0.0005 })]);
const star = ctx('star', [m(MEASUREMENT_ID, 'parallax', 100, { sigma: 0.5, unit: 'mas' })]);

function evidenceOf(templateId: string, c: TemplateContext) {
  const r = evaluateStatement(templateId, c);
  if (!r.ok) throw new Error(`${templateId}: ${r.reason}`);
  const evidence = publicEvidence({
    templateId,
    inputs: r.inputs,
    sourceLinks: new Map([['src-1', 'https://doi.org/10.0000/example']]),
    working: r.working,
    model: r.model,
    checkedAt: '2026-12-03T10:00:00.000Z',
  });
  return { r, evidence, text: JSON.stringify(evidence) };
}

describe('"How we know": the working retold for visitors', () => {
  it('keeps every source of the working, without the measurement id the staff view shows', () => {
    const { r, evidence, text } = evidenceOf('light-travel', quasar);
    const sources = workingSources(r.working);
    expect(sources.length).toBeGreaterThan(3);
    for (const s of sources) expect(text).toContain(JSON.stringify(s).slice(1, -1));
    expect(text).not.toContain(MEASUREMENT_ID);
    expect(evidence.measurements).toEqual([
      {
        what: 'Redshift',
        value: '0.241 ± 0.0005',
        source: { name: 'Values for automated checks', url: 'https://doi.org/10.0000/example' },
      },
    ]);
    expect(evidence.method).toMatch(/^The redshift says how much the universe has stretched/);
    expect(evidence.checkedAt).toBe('2026-12-03T10:00:00.000Z');
    // Full machine precision in the staff working's names is cut to three figures for visitors.
    expect(text).not.toMatch(/\d\.\d{6,}/);
  });

  it('says the formula in words for the evidence actually used: a parallax, not a redshift', () => {
    const { evidence } = evidenceOf('distance-today', star);
    expect(evidence.method).toMatch(/^The parallax is the small shift/);
    expect(evidence.model).toBeNull();
    expect(evidence.measurements[0]).toMatchObject({ what: 'Parallax', value: '100 ± 0.5 mas' });
  });

  it('has words of its own for every template a page can carry today', () => {
    const cases: Array<[string, TemplateContext]> = [
      ['distance-today', quasar],
      ['light-travel', quasar],
      ['distance-today-phrase', quasar],
      ['light-travel-phrase', star],
      ['scale-model', star],
      ['naked-eye', ctx('star', [m('v', 'apparent_magnitude', 3, { sigma: 0.1, band: 'V', unit: 'mag' })])],
    ];
    for (const [id, c] of cases) expect(evidenceOf(id, c).evidence.method, id).not.toMatch(/^Worked out in these steps/);
  });

  it('tells the cosmology in words, with its shares of matter and dark energy', () => {
    const { r } = evidenceOf('distance-today', quasar);
    expect(modelInWords(r.model!)).toMatch(
      /^A flat expanding universe following the Friedmann equations \(Planck 2018.*\), expanding today at 67\.66 km\/s per megaparsec \(the Hubble constant\), 31 % of its content matter \(ordinary and dark\) and 69 % dark energy\.$/,
    );
    expect(publicSourceName('Cat (measurement abc), with a peculiar velocity of 300 km/s')).toBe(
      'Cat, with a peculiar velocity of 300 km/s',
    );
  });
});
