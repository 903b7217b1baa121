/**
 * The one registry of locales: every entry is well formed, its language is one we write, and every
 * template writes its sentence in each registered locale's own language (so a locale added without
 * its wording fails here, not on a visitor's screen).
 */
import { describe, expect, it } from 'vitest';
import { PageVersionCreateSchema, PublicLangQuerySchema } from '../../../shared/schemas/page-version.ts';
import {
  evaluateStatement,
  LANGUAGES,
  LOCALE_REGISTRY,
  language,
  STATEMENT_LOCALES,
  STATEMENT_TEMPLATES,
  type StatementMeasurement,
  type TemplateContext,
} from '../../../shared/statements/index.ts';
import { chooseVersion } from '../../../server/services/publishing/public-languages.ts';
import { testMeasurement } from '../../support/statement-fixtures.ts';

const m = testMeasurement;
const context = (kind: string, measurements: StatementMeasurement[]): TemplateContext => ({
  object: { id: 'o', name: 'Test object', kind },
  measurements,
  model: { preset: 'planck18' },
  band: 'V',
});
// Invented values for automated checks, chosen only so every template has inputs it accepts.
const CANDIDATES = [
  context('quasar', [
    m('z', 'redshift', 0.158, { sigma: 0.0003 }),
    m('v', 'apparent_magnitude', 12.9, { sigma: 0.1, band: 'V', unit: 'mag' }),
  ]),
  context('star', [
    m('p', 'parallax', 100, { sigma: 0.5, unit: 'mas' }),
    m('v', 'apparent_magnitude', 5, { sigma: 0.02, band: 'V', unit: 'mag' }),
  ]),
];

describe('the locale registry', () => {
  it('holds well-formed, distinct tags whose language we write, in the shape the database checks', () => {
    const tags = LOCALE_REGISTRY.map((l) => l.tag);
    expect(new Set(tags).size).toBe(tags.length);
    expect(STATEMENT_LOCALES).toEqual(tags);
    for (const entry of LOCALE_REGISTRY) {
      expect(entry.tag).toMatch(/^[a-z]{2,3}-[A-Z]{2}$/); // pages_locale_check
      expect(LANGUAGES).toContain(entry.language);
      expect(language(entry.tag)).toBe(entry.language);
      expect(entry.label.length).toBeGreaterThan(0);
      expect(entry.addLabel).toMatch(/^Add an? .+ version$/);
    }
  });

  it('every template (but the venue-night one, tested on its own) writes each locale in its own language', () => {
    for (const template of STATEMENT_TEMPLATES.filter((t) => t.id !== 'planet-light-tonight')) {
      const outcome = CANDIDATES.map((c) => evaluateStatement(template.id, c)).find((r) => r.ok);
      if (!outcome?.ok) throw new Error(`no test input works for ${template.id}`);
      for (const locale of STATEMENT_LOCALES) {
        expect(outcome.texts[locale], `${template.id} ${locale}`).toMatch(/\p{L}/u);
        const english = outcome.texts[STATEMENT_LOCALES.find((l) => language(l) === 'en')!];
        if (language(locale) !== 'en') expect(outcome.texts[locale], `${template.id} ${locale} is not English`).not.toBe(english);
      }
    }
  });

  it('the schemas take only registered locales', () => {
    expect(PageVersionCreateSchema.safeParse({ locale: 'fr-FR' }).success).toBe(true);
    for (const locale of ['fr', 'de-DE', 'FR-fr', ' ', 'fr-FR; DROP TABLE pages'])
      expect(PageVersionCreateSchema.safeParse({ locale }).success, locale).toBe(false);
    for (const lang of ['fr', 'EN', 'en-us', 'fr-FR']) expect(PublicLangQuerySchema.safeParse({ lang }).success, lang).toBe(true);
    for (const lang of ['de', 'english', 'x'.repeat(40)])
      expect(PublicLangQuerySchema.safeParse({ lang }).success, lang).toBe(false);
  });
});

describe('choosing a version for a reader', () => {
  const en = { id: 'en', locale: 'en-GB' };
  const fr = { id: 'fr', locale: 'fr-FR' };
  const us = { id: 'us', locale: 'en-US' };
  const versions = [en, fr, us];

  it('?lang= wins; then the ranked Accept-Language ranges; then the version named', () => {
    expect(chooseVersion(versions, fr, 'en-us', ['fr'])).toBe(us);
    expect(chooseVersion(versions, en, 'fr', null)).toBe(fr);
    expect(chooseVersion(versions, fr, undefined, null)).toBe(fr);
    expect(chooseVersion(versions, en, undefined, ['fr-CA', 'en'])).toBe(fr);
    expect(chooseVersion(versions, fr, undefined, ['en-US', 'en-GB'])).toBe(us);
    expect(chooseVersion(versions, fr, undefined, ['en-AU'])).toBe(en);
  });

  it('falls back to the default version (first) when nothing asked for is there', () => {
    expect(chooseVersion(versions, fr, undefined, ['de', 'es'])).toBe(en);
    expect(chooseVersion(versions, fr, undefined, ['*'])).toBe(en);
    expect(chooseVersion([fr], fr, 'en', null)).toBe(fr);
  });
});
