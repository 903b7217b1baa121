import { z } from 'zod';
import type { PageStatus } from './page.ts';
import { isStatementLocale, LOCALE_LABELS, STATEMENT_LOCALES, type StatementLocale } from '../statements/locales.ts';

const localeList = STATEMENT_LOCALES.map((l) => `${l} (${LOCALE_LABELS[l]})`).join(', ');

/** A locale tag from the registry, refused in words otherwise. */
export const LocaleTagSchema = z
  .string({ message: `Choose a language: ${localeList}` })
  .trim()
  .refine(isStatementLocale, { message: `Choose a language we write in: ${localeList}` })
  .transform((l) => l as StatementLocale);

/** "Add a French version": which locale the new version is in. */
export const PageVersionCreateSchema = z.object({ locale: LocaleTagSchema });
export type PageVersionCreateInput = z.infer<typeof PageVersionCreateSchema>;

/** One language version of a page, as the desk lists it on each version. */
export interface PageVersionDto {
  id: string;
  locale: StatementLocale;
  label: string;
  title: string;
  status: PageStatus;
  /** A published version is live on screens and the public API. */
  live: boolean;
  /** What a reader gets when none of their languages is there. */
  isDefault: boolean;
  /** The version being looked at. */
  current: boolean;
  /** False for another writer's private draft: listed (its language is taken), without its title, and not openable. */
  readable: boolean;
}

/** A page's language versions and the locales it could still have. */
export interface PageVersionsDto {
  groupId: string | null;
  versions: PageVersionDto[];
  /** Locales with no version yet, each with its button label ("Add a French version"). */
  missing: Array<{ locale: StatementLocale; label: string; addLabel: string }>;
  can: { add: boolean };
}

const languageList = [...STATEMENT_LOCALES, ...new Set(STATEMENT_LOCALES.map((l) => l.slice(0, 2)))].join(', ');

/** Whether a `?lang=` value names a registered locale (any case) or the language of one ("fr"). */
export const isKnownLanguageTag = (value: string) => {
  const v = value.toLowerCase();
  return STATEMENT_LOCALES.some((l) => l.toLowerCase() === v || l.slice(0, 2).toLowerCase() === v);
};

/** `?lang=` on the public API: a registered locale or its language; anything else is refused in words. */
export const PublicLangQuerySchema = z.object({
  lang: z
    .string()
    .trim()
    .max(35, 'A language tag is at most 35 characters')
    .refine(isKnownLanguageTag, { message: `There is no such language here. Ask for one of: ${languageList}` })
    .optional(),
});
