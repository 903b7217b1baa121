/** Where a hand-typed number sits in its paragraph: the text before it, the number, the text after. */
export interface ReplacingContext {
  before: string;
  text: string;
  after: string;
}

/** How a statement's words replace a hand-typed number so the writer's sentence stays whole. */
export interface PhraseFit {
  /** Characters before the number that the statement's own hedge replaces ("about" before "about 2.4 …"). */
  absorbBefore: number;
  /** Characters at the end of the number that stay ("ago" of "2.5 million years ago"). */
  keepAfter: number;
  /** The paragraph as it will read, in three parts (the statement's words in the middle). */
  preview: { before: string; statement: string; after: string };
}

// A hedge the writer typed before the number; the phrase brings its own ("about", "environ").
const HEDGE_BEFORE = /(?:^|\s)((?:about|around|roughly|approximately|some|nearly|almost|environ|presque|à peu près)\s+)$/i;
const PHRASE_HEDGE = /^(?:about|environ)\s/i;
// Words the number check counts as part of a time ("2.5 million years ago") that a time phrase leaves out.
const TRAILING_KEEP = /(\s+(?:ago|old))$/i;

/**
 * Fits a statement's words in place of a hand-typed number: a writer's "about" before the number
 * gives way to the phrase's own, and "ago"/"old" typed with the number stays when the phrase ends
 * without it. A whole-sentence statement is fitted the same way, so the preview shows what it does
 * to the sentence.
 * @param context the paragraph around the number
 * @param statement the statement's words in the page's locale
 */
export function fitPhrase(context: ReplacingContext, statement: string): PhraseFit {
  const hedge = PHRASE_HEDGE.test(statement) ? HEDGE_BEFORE.exec(context.before) : null;
  const absorbBefore = hedge ? hedge[1].length : 0;
  const trailing = TRAILING_KEEP.exec(context.text);
  const keepAfter = trailing && !statement.toLowerCase().endsWith(trailing[1].trim().toLowerCase()) ? trailing[1].length : 0;
  return {
    absorbBefore,
    keepAfter,
    preview: {
      before: context.before.slice(0, context.before.length - absorbBefore),
      statement,
      after: `${keepAfter ? context.text.slice(context.text.length - keepAfter) : ''}${context.after}`,
    },
  };
}
