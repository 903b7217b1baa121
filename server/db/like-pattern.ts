/**
 * A LIKE / ILIKE pattern that finds the text anywhere, with `%`, `_` and `\` taken literally (a
 * search for "50%" or "m_31" finds those characters, not everything). PostgreSQL's default escape
 * character is the backslash, so no ESCAPE clause is needed.
 * @param text what the person typed
 * @param lower lower-case it too, for `lower(column) LIKE` comparisons
 */
export function containsPattern(text: string, { lower = false } = {}): string {
  const escaped = (lower ? text.toLowerCase() : text).replace(/[\\%_]/g, (c) => `\\${c}`);
  return `%${escaped}%`;
}
