import { describe, expect, it } from 'vitest';
import { evaluateStatement, findTemplate, STATEMENT_LOCALES, type TemplateContext } from '../../../shared/statements/index.ts';
import { workingForPeople } from '../../../shared/statements/working-names.ts';
import { testMeasurement } from '../../support/statement-fixtures.ts';

const m = testMeasurement;
const quasar: TemplateContext = {
  object: { id: 'o', name: 'Q1', kind: 'quasar' },
  measurements: [m('3f1c2a9e-0b7d-4c52-9a3e-2f6d8b1c4e70', 'redshift', 0.158, { sigma: 0.0005 })],
  model: { preset: 'planck18' },
  band: 'V',
};

function ok(templateId: string, c: TemplateContext) {
  const r = evaluateStatement(templateId, c);
  if (!r.ok) throw new Error(r.reason);
  return r;
}

describe('phrase forms: a checked number inside the writer’s own sentence', () => {
  it('the distance phrase is a noun phrase in every locale, with the sentence form’s number', () => {
    const sentence = ok('distance-today', quasar);
    const phrase = ok('distance-today-phrase', quasar);
    expect(findTemplate('distance-today-phrase')?.phraseOf).toBe('distance-today');
    expect(phrase.value).toBe(sentence.value);
    expect(phrase.working).toEqual(sentence.working);
    expect(phrase.texts['en-GB']).toBe('about 2.2 billion light-years');
    expect(phrase.texts['en-US']).toBe('about 2.2 billion light-years');
    expect(phrase.texts['fr-FR']).toBe('environ 2,2 milliards d’années-lumière');
    expect(sentence.texts['en-GB']).toContain('about 2.2 billion light-years away');
    // No sentence punctuation, so the writer's sentence stays whole around it.
    for (const l of STATEMENT_LOCALES) expect(phrase.texts[l]).not.toMatch(/[.!?]$|^[A-Z]/);
    expect(phrase.footnotes?.['en-GB']).toMatch(/^The distance given is how far away it is today\. Worked out with/);
  });

  it('the light-travel phrase reads "about N years" in every locale', () => {
    const phrase = ok('light-travel-phrase', quasar);
    expect(phrase.texts['en-GB']).toMatch(/^about 2\.\d billion years$/);
    expect(phrase.texts['fr-FR']).toMatch(/^environ 2,\d milliards d’années$/);
    const star = ok('light-travel-phrase', {
      ...quasar,
      object: { id: 's', name: 'S', kind: 'star' },
      measurements: [m('p', 'parallax', 379.21, { sigma: 1.58, unit: 'mas' })],
    });
    expect(star.texts['en-GB']).toBe('about 8.60 years');
    expect(star.texts['fr-FR']).toBe('environ 8,60 ans');
  });

  it('a template without a phrase form has none to offer', () => {
    expect(findTemplate('naked-eye')?.phraseId).toBeUndefined();
  });
});

describe('the working shown to people names measurements, never their ids', () => {
  it('replaces "(measurement <uuid>)" with the object and quantity, and drops an id it cannot name', () => {
    const r = ok('distance-today', quasar);
    const raw = JSON.stringify(r.working);
    expect(raw).toMatch(/measurement 3f1c2a9e-/);
    const shown = workingForPeople(r.working, r.inputs, 'Q1');
    const text = JSON.stringify(shown);
    expect(text).not.toMatch(/[0-9a-f]{8}-[0-9a-f]{4}-/);
    expect(text).toContain('Values for automated checks (Q1: redshift)');
    const orphan = workingForPeople(r.working, [], 'Q1');
    expect(JSON.stringify(orphan)).not.toMatch(/measurement [0-9a-f]{8}/);
  });
});
