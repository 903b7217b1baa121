/**
 * An object's name as a sentence uses it: with its article and its number ("the Andromeda Galaxy",
 * "the Pleiades are", "la galaxie d’Andromède", "les Pléiades sont"). The catalogue stores one per
 * language (en-GB and en-US share the English one); an object without one is named as it is listed,
 * as a singular without an article (right for "Sirius", "3C 279", "Jupiter").
 */
import { z } from 'zod';
import { language, type StatementLocale } from './locales.ts';

/** One language's sentence name. */
export interface SentenceName {
  /** The name with its article as it stands inside a sentence, e.g. "the Pleiades". */
  text: string;
  /** True when the name takes a plural verb ("the Pleiades are", "les Pléiades sont"). */
  plural: boolean;
}

/** Sentence names by language. */
export type SentenceNames = Partial<Record<'en' | 'fr', SentenceName>>;

const SentenceNameSchema = z.object({
  text: z.string().trim().max(160, 'A sentence name is at most 160 characters'),
  plural: z.boolean().default(false),
});

/** As stored and as sent: a blank text means "use the catalogue name". */
export const SentenceNamesSchema = z
  .object({ en: SentenceNameSchema.optional(), fr: SentenceNameSchema.optional() })
  .transform((v): SentenceNames => {
    const out: SentenceNames = {};
    if (v.en?.text) out.en = { text: v.en.text, plural: v.en.plural };
    if (v.fr?.text) out.fr = { text: v.fr.text, plural: v.fr.plural };
    return out;
  });

/** What a template needs of the object to name it. */
export interface NamedObject {
  name: string;
  sentenceNames?: SentenceNames | null;
}

function entry(object: NamedObject, locale: StatementLocale): SentenceName {
  return object.sentenceNames?.[language(locale)] ?? { text: object.name, plural: false };
}

const capitalise = (s: string) => s.charAt(0).toLocaleUpperCase() + s.slice(1);

/** The name inside a sentence: "the Andromeda Galaxy", "les Pléiades". */
export function nameIn(object: NamedObject, locale: StatementLocale): string {
  return entry(object, locale).text;
}

/** The name opening a sentence: "The Andromeda Galaxy", "Les Pléiades". */
export function nameAtStart(object: NamedObject, locale: StatementLocale): string {
  return capitalise(entry(object, locale).text);
}

/** True when the name takes a plural verb. */
export function isPlural(object: NamedObject, locale: StatementLocale): boolean {
  return entry(object, locale).plural;
}

/** The verb form agreeing with the name: verb(o, l, 'is', 'are'). */
export function verb(object: NamedObject, locale: StatementLocale, singular: string, plural: string): string {
  return isPlural(object, locale) ? plural : singular;
}

/**
 * French "de" + the name, with the contractions French requires: "du Soleil", "des Pléiades",
 * "de la galaxie d’Andromède", "d’Arcturus", "de Sirius".
 */
export function frenchOf(object: NamedObject): string {
  const text = entry(object, 'fr-FR').text;
  if (/^le /i.test(text)) return `du ${text.slice(3)}`;
  if (/^les /i.test(text)) return `des ${text.slice(4)}`;
  if (/^(la |l['’])/i.test(text)) return `de ${text}`;
  if (/^[aeiouyéèêàâîôh]/i.test(text)) return `d’${text}`;
  return `de ${text}`;
}
