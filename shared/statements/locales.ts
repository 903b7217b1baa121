/** Locales every statement is rendered in. English in both spellings, and French. */
export const STATEMENT_LOCALES = ['en-GB', 'en-US', 'fr-FR'] as const;
export type StatementLocale = (typeof STATEMENT_LOCALES)[number];

export const LOCALE_LABELS: Record<StatementLocale, string> = {
  'en-GB': 'English (UK)',
  'en-US': 'English (US)',
  'fr-FR': 'Français',
};

/** Per-locale text, one entry for every supported locale. */
export type LocalisedText = Record<StatementLocale, string>;

/** Builds a LocalisedText by calling fn for each locale. */
export function perLocale(fn: (locale: StatementLocale) => string): LocalisedText {
  return Object.fromEntries(STATEMENT_LOCALES.map((l) => [l, fn(l)])) as LocalisedText;
}

/** The language part, for choosing words. */
export const language = (locale: StatementLocale) => locale.slice(0, 2) as 'en' | 'fr';
