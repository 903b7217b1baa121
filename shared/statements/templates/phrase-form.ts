import type { LocalisedText } from '../locales.ts';
import { perLocale } from '../locales.ts';
import type { StatementTemplate } from '../types.ts';

/**
 * The phrase form of a sentence template: the same computation, working and review, worded as a
 * noun phrase that replaces a number inside a writer's own sentence ("… it lies about 2.4 billion
 * light-years away"). A separate template id, so it is stored, recomputed, signed off and
 * published exactly like the sentence form.
 * @param base the sentence template (it must compose a `phrase`)
 * @param options.title how the picker names it
 * @param options.footnote extra small print the phrase needs because the sentence's words are gone
 */
export function phraseForm(base: StatementTemplate, options: { title: string; footnote?: LocalisedText }): StatementTemplate {
  const { phraseId, ...rest } = base;
  if (!phraseId) throw new Error(`The template “${base.id}” has no phrase form.`);
  return {
    ...rest,
    id: phraseId,
    title: options.title,
    phraseOf: base.id,
    evaluate(ctx) {
      const outcome = base.evaluate(ctx);
      if (!outcome.ok) return outcome;
      const { phrases, ...sentence } = outcome;
      if (!phrases) throw new Error(`The template “${base.id}” composed no phrase.`);
      const extra = options.footnote;
      const footnotes = extra
        ? perLocale((l) => [extra[l], sentence.footnotes?.[l]].filter(Boolean).join(' '))
        : sentence.footnotes;
      return { ...sentence, texts: phrases, footnotes };
    },
  };
}
