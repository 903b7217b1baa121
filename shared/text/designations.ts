/**
 * Catalogue designations such as "NGC 4486", "3C 279", "M 87", "HD 209458" or "PKS 2155-304" are one
 * name: a line break between the catalogue and the number makes a reader see two words. This puts a
 * no-break space (U+00A0) there. A catalogue prefix is an all-capital token, optionally led by digits
 * ("3C", "4C", "2MASS"), followed by a number (optionally signed); ordinary words are left alone.
 */
const DESIGNATION = /(^|[^\p{L}\p{N}])(\d*\p{Lu}{1,6}) (?=[+−-]?\d)/gu;

/** The text with a no-break space inside every catalogue designation. */
export function keepDesignationsTogether(text: string): string {
  return text.replace(DESIGNATION, (_m, before: string, prefix: string) => `${before}${prefix}\u00a0`);
}
