/**
 * The one registry of locales. Everything that offers, checks or negotiates a language reads this
 * list: the statement renderer, the zod schemas (page, settings, channel, screen), the version
 * picker, the kiosk feed and the public API's `?lang=` / `Accept-Language`. The database stores
 * locale tags without a fixed list (a format check only), so adding one needs no migration.
 *
 * Adding a locale (DEVELOPERS.md, "Adding a locale"): one entry below. Its `language` must be one we
 * write sentences in (`LANGUAGES`); numbers follow the tag through Intl (grouping, decimal mark,
 * scale words). A new language also needs its wording (the `language === …` branches of the
 * templates and `BIG_WORDS` in number-words.ts) before it can be listed here.
 */
export const LOCALE_REGISTRY = [
  { tag: 'en-GB', label: 'English (UK)', language: 'en', addLabel: 'Add an English (UK) version' },
  { tag: 'en-US', label: 'English (US)', language: 'en', addLabel: 'Add an English (US) version' },
  { tag: 'fr-FR', label: 'Français', language: 'fr', addLabel: 'Add a French version' },
] as const satisfies readonly LocaleEntry[];

/** The languages statement templates write sentences in. */
export const LANGUAGES = ['en', 'fr'] as const;
export type Language = (typeof LANGUAGES)[number];

/** One locale: its BCP 47 tag (also its hreflang), its name in its own language, the language its words come from. */
export interface LocaleEntry {
  tag: string;
  label: string;
  language: Language;
  /** The desk's button for making a version in this locale. */
  addLabel: string;
}

/** Locales every statement is rendered in, in registry order. */
export const STATEMENT_LOCALES = LOCALE_REGISTRY.map((l) => l.tag) as unknown as readonly [StatementLocale, ...StatementLocale[]];
export type StatementLocale = (typeof LOCALE_REGISTRY)[number]['tag'];

export const LOCALE_LABELS = Object.fromEntries(LOCALE_REGISTRY.map((l) => [l.tag, l.label])) as Record<StatementLocale, string>;

/** Whether a string is a registered locale tag (exactly). */
export const isStatementLocale = (value: string): value is StatementLocale =>
  STATEMENT_LOCALES.includes(value as StatementLocale);

/** Per-locale text, one entry for every supported locale. */
export type LocalisedText = Record<StatementLocale, string>;

/** Builds a LocalisedText by calling fn for each locale. */
export function perLocale(fn: (locale: StatementLocale) => string): LocalisedText {
  return Object.fromEntries(STATEMENT_LOCALES.map((l) => [l, fn(l)])) as LocalisedText;
}

/** The language part, for choosing words. */
export const language = (locale: StatementLocale): Language =>
  LOCALE_REGISTRY.find((l) => l.tag === locale)?.language ?? (locale.slice(0, 2) as Language);
