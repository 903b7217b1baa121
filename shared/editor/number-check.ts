import type { JSONContent } from '@tiptap/core';
import { blockTexts } from './doc-text.ts';

/** A hand-typed number with a unit or scale word, found in page text outside statements. */
export interface NumberFlag {
  /** The words as typed, e.g. "12 billion light-years". */
  text: string;
  /** Lower-case with spaces and dashes unified: the key a reviewer's resolution is stored under. */
  normalised: string;
  /** Which text block (0-based, document order) and where in its text. */
  block: number;
  from: number;
  to: number;
}

// Digits with separators ("300,000", "4.6", "1 000"), optional sign and ×10^n, or a number word.
const DIGITS = String.raw`[-−+]?\d(?:[\d,]*\d)?(?:[.·]\d+)?(?:\s?[×x]\s?10\^?[-−]?\d+)?`;
const WORDS = String.raw`(?:a|one|two|three|four|five|six|seven|eight|nine|ten|eleven|twelve|thirteen|fourteen|fifteen|twenty|thirty|forty|fifty|sixty|seventy|eighty|ninety|hundred|a\s+few|several|hundreds|thousands)`;
const NUMBER = `(?:${DIGITS}|${WORDS})`;
const SCALE = '(?:thousand|million|billion|trillion|quadrillion|quintillion|milliards?|billions?|millions?|trillions?)';
const UNIT = String.raw`(?:light[-\s]?(?:years?|minutes?|seconds?|hours?|days?)|ly|parsecs?|[kMG]?pc|kilo-?parsecs?|mega-?parsecs?|kilomet(?:re|er)s?|km(?:\/s)?|miles?|astronomical\s+units?|au|AU|mag(?:nitudes?)?|[GMk]yr|gigayears?|solar\s+(?:masses|mass|radii|radius|luminosit(?:y|ies))|earth\s+(?:masses|mass|radii)|années?[-\s]lumière|kelvin|K\b|degrees|years?(?:\s+(?:ago|old))?)`;
const COMPARE = String.raw`times\s+(?:brighter|fainter|bigger|larger|smaller|heavier|lighter|more|less|further|farther|closer|wider|hotter|older|as)`;

/**
 * The patterns, widest first. Plain years ("in 1054") and catalogue numbers ("Messier 87") carry
 * no unit or scale word, so they are never flagged; "12 years" is only flagged with a scale word.
 */
const PATTERNS: RegExp[] = [
  // "12 billion light-years", "4.2 light-years", "300,000 km/s", "a trillion Suns"
  new RegExp(String.raw`(?<![\w.])${NUMBER}(?:\s|-)?(?:${SCALE}\s?)?(?:${UNIT}|${COMPARE})(?![\w])`, 'giu'),
  // "12 billion", "billions of stars", "a million"
  new RegExp(String.raw`(?<![\w.])(?:${NUMBER}\s)?${SCALE}(?![\w])`, 'giu'),
  // "magnitude 6", "magnitude −1.46"
  new RegExp(String.raw`\bmagnitudes?\s+(?:of\s+)?${DIGITS}`, 'giu'),
  // "times brighter" without a number before it
  new RegExp(String.raw`\b${COMPARE}\b`, 'giu'),
];

// A bare "year(s)" with only a small number is ordinary prose ("two years ago"): keep only when scaled.
const PLAIN_YEARS = /^(?:[-−+]?\d[\d,.]*|[a-z\s]+)\s?years?(?:\s+(?:ago|old))?$/i;
const PLAIN_DEGREES = /^[-−+]?\d[\d,.]*\s?degrees$/i;

/** The key resolutions are stored under: case, spaces and dash kinds do not matter. */
export function normaliseFlagText(text: string): string {
  return text
    .toLowerCase()
    .replace(/[\u2010-\u2015−]/g, '-')
    .replace(/[\s\u00a0\u202f]+/g, ' ')
    .trim();
}

/**
 * Finds hand-typed numbers in one run of text. The caller replaces statements with a placeholder
 * character so that a number never runs into or out of a statement.
 * @returns matches with offsets into `text`, not overlapping, in order
 */
export function findNumbersInText(text: string): Array<{ text: string; from: number; to: number }> {
  const found: Array<{ text: string; from: number; to: number }> = [];
  for (const pattern of PATTERNS) {
    pattern.lastIndex = 0;
    for (const match of text.matchAll(pattern)) {
      const value = match[0].trim();
      const from = match.index + match[0].indexOf(value);
      const to = from + value.length;
      if (PLAIN_YEARS.test(value) && !new RegExp(SCALE, 'i').test(value)) continue;
      if (PLAIN_DEGREES.test(value)) continue;
      if (found.some((f) => from < f.to && to > f.from)) continue;
      found.push({ text: value, from, to });
    }
  }
  return found.sort((a, b) => a.from - b.from);
}

/**
 * The number check over a whole page: every hand-typed number with a unit or scale word outside
 * statement nodes, with its block and offsets. Runs in the editor as the writer types and on the
 * server at submission, so both agree.
 * @param doc the page's tiptap JSON
 */
export function checkNumbers(doc: JSONContent): NumberFlag[] {
  return blockTexts(doc).flatMap((block) =>
    findNumbersInText(block.text).map((m) => ({
      text: m.text,
      normalised: normaliseFlagText(m.text),
      block: block.index,
      from: m.from,
      to: m.to,
    })),
  );
}
