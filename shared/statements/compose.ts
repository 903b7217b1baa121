import type { ResolvedModel } from '../schemas/calc.ts';
import type { Step } from '../engine/working.ts';
import { language, perLocale, type StatementLocale } from './locales.ts';
import { formatApproximate } from './number-words.ts';
import { choosePrecision, type PrecisionChoice } from './precision.ts';
import type { TemplateSuccess, UsedInput } from './types.ts';

/** What a template hands over once its numbers are computed. */
export interface ComposeArgs {
  /** The number the sentence rounds, e.g. a luminosity ratio or a time in years. */
  value: number;
  unit: string;
  interval: { low: number; high: number } | null;
  /**
   * Builds the sentence around the rounded number's words; `shown` is the value as rounded, so a
   * ratio that rounds to one can read "about as bright as" (house style, DEVELOPERS.md).
   */
  sentence: (locale: StatementLocale, number: string, shown: number) => string;
  /**
   * The same number as a phrase that fits inside a writer's own sentence ("about 2.4 billion
   * light-years"), for templates that have one (their phrase form: `phraseForm`).
   */
  phrase?: (locale: StatementLocale, number: string, shown: number) => string;
  footnote?: (locale: StatementLocale) => string | null;
  working: Step[];
  warnings?: string[];
  inputs: UsedInput[];
  model: ResolvedModel | null;
  /** A precision the template chose itself (e.g. one that holds all evening); else the rule's, from the interval. */
  precision?: PrecisionChoice;
}

/**
 * Rounds the headline number by the precision rule, writes the sentence in every locale, and adds
 * the wording step to the working so a reviewer sees why the public text says what it says.
 */
export function compose(args: ComposeArgs): TemplateSuccess {
  const precision = args.precision ? { ...args.precision } : choosePrecision(args.value, args.interval);
  const unknown = args.inputs.filter((i) => i.sigma == null && (i.minus == null || i.plus == null));
  if (unknown.length > 0) {
    const names = unknown.map((i) => `${i.quantity}${i.band ? ` (${i.band})` : ''} from ${i.citation}`).join(', ');
    if (!args.interval || precision.significantFigures > 2) {
      // One input without an uncertainty makes the whole result's precision unknown.
      precision.significantFigures = Math.min(precision.significantFigures, 2);
      precision.reason = `${names} has no stated uncertainty, so the precision is unknown; shown to ${precision.significantFigures} significant figure${precision.significantFigures > 1 ? 's' : ''} (our rule for unknown precision).`;
    } else {
      precision.reason += ` Note: ${names} has no stated uncertainty, so the interval understates the true uncertainty.`;
    }
  }
  const n = precision.significantFigures;
  const shown = formatApproximate(args.value, n, 'en-GB').shown;
  const texts = perLocale((locale) => args.sentence(locale, formatApproximate(args.value, n, locale).text, shown));
  const phrases = args.phrase
    ? perLocale((locale) => args.phrase!(locale, formatApproximate(args.value, n, locale).text, shown))
    : undefined;
  const footnotes = args.footnote ? perLocale((locale) => args.footnote!(locale) ?? '') : null;
  const wording: Step = {
    title: 'Public wording: round to what the data supports',
    formula: `shown = round(value, ${n} significant figure${n > 1 ? 's' : ''})`,
    inputs: [
      { symbol: 'value', name: 'computed value', value: args.value, unit: args.unit, source: 'previous step' },
      ...(args.interval
        ? [
            {
              symbol: 'low',
              name: '68 % interval, lower end',
              value: args.interval.low,
              unit: args.unit,
              source: 'uncertainty step',
            },
            {
              symbol: 'high',
              name: '68 % interval, upper end',
              value: args.interval.high,
              unit: args.unit,
              source: 'uncertainty step',
            },
          ]
        : []),
    ],
    constants: [],
    result: { symbol: 'shown', name: 'value as worded', value: shown, unit: args.unit },
    note: `${precision.reason} Large numbers are written in words in each locale (short scale in English); "about" marks the rounding.`,
  };
  return {
    ok: true,
    value: args.value,
    unit: args.unit,
    interval: args.interval,
    significantFigures: n,
    texts,
    ...(phrases ? { phrases } : {}),
    footnotes: footnotes && Object.values(footnotes).some(Boolean) ? footnotes : null,
    working: [...args.working, wording],
    warnings: args.warnings ?? [],
    inputs: args.inputs,
    model: args.model,
  };
}

/** A derived step (a transform of an engine result) recorded in the same shape as the engine's. */
export function derivedStep(step: Omit<Step, 'constants'> & { constants?: Step['constants'] }): Step {
  return { constants: [], ...step };
}

/** Maps an interval through a monotonic function (ordering the ends if it decreases). */
export function mapInterval(
  interval: { low: number; high: number } | undefined,
  fn: (x: number) => number,
): { low: number; high: number } | null {
  if (!interval) return null;
  const a = fn(interval.low);
  const b = fn(interval.high);
  return { low: Math.min(a, b), high: Math.max(a, b) };
}

/** Which cosmology a statement assumed, as small print. */
export function cosmologyFootnote(model: ResolvedModel | null) {
  return (locale: StatementLocale): string | null => {
    if (!model) return null;
    if (model.kind === 'hubble_law') {
      return language(locale) === 'fr'
        ? `Calculé avec la loi de Hubble simple (H0 = ${model.H0}), un modèle d'enseignement valable seulement pour les faibles décalages vers le rouge.`
        : `Worked out with the simple Hubble law (H0 = ${model.H0}), a classroom model that only holds for small redshifts.`;
    }
    return language(locale) === 'fr'
      ? `Calculé avec le modèle cosmologique ${model.label}.`
      : `Worked out with the ${model.label} cosmology.`;
  };
}
