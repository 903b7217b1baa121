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
  /** False for another writer's private draft: listed, but not openable by this viewer. */
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
