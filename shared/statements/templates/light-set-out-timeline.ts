import { compose, cosmologyFootnote, derivedStep } from '../compose.ts';
import type { StatementLocale } from '../locales.ts';
import { frenchOf, nameIn } from '../names.ts';
import { AROUND_MAX_RELATIVE_WIDTH, chooseTimelineEntry, type TimelineChoice } from '../timeline.ts';
import type { StatementTemplate } from '../types.ts';
import { travelTime } from './light-travel.ts';
import { isFrench, yearsPhrase } from './words.ts';

const RULE =
  `An entry fits when the light-travel interval overlaps the entry's date ± its uncertainty and is at most ${AROUND_MAX_RELATIVE_WIDTH * 100} % of the entry's age wide ("around the time …"), ` +
  'or, for a "before" entry, when the whole interval is older than the entry’s date plus its uncertainty. ' +
  'Of the fitting "around" entries the one with the smallest uncertainty is named; failing those, the latest "before" entry; otherwise none, and the sentence makes no comparison.';

/** The working step that shows which timeline entry was chosen and why. */
function timelineStep(choice: TimelineChoice, years: number, lookback: boolean) {
  const e = choice.entry;
  const meaning = lookback
    ? 'For a redshift the light-travel time is the lookback time: how long the light has been on its way through the expanding universe (not today’s distance divided by the speed of light).'
    : 'At this distance the light-travel time is the distance in light-years; no cosmology is involved.';
  return derivedStep({
    title: 'Placing it on Earth’s timeline',
    formula: e
      ? e.relation === 'before'
        ? 't_low > date + uncertainty'
        : 'interval of t overlaps date ± uncertainty'
      : 'no timeline entry fits',
    inputs: [
      { symbol: 't', name: 'light-travel time', value: years, unit: 'yr', source: 'previous step' },
      { symbol: 't_low', name: '68 % interval, lower end', value: choice.light.low, unit: 'yr', source: 'uncertainty step' },
      { symbol: 't_high', name: '68 % interval, upper end', value: choice.light.high, unit: 'yr', source: 'uncertainty step' },
      ...(e
        ? [
            { symbol: 'date', name: e.label, value: e.yearsAgo, unit: 'yr ago', source: e.source.citation },
            {
              symbol: 'σ_date',
              name: `${e.label}: uncertainty`,
              value: e.uncertaintyYears,
              unit: 'yr',
              source: e.source.citation,
            },
          ]
        : []),
    ],
    result: e
      ? {
          symbol: 'entry',
          name: `${e.relation === 'before' ? 'before' : 'around'}: ${e.label}`,
          value: e.yearsAgo,
          unit: 'yr ago',
        }
      : { symbol: 'entry', name: 'none', value: 0, unit: '' },
    note: `${meaning} ${RULE} ${choice.compatible.length} of the timeline’s entries fit.`,
  });
}

/**
 * "The light we see tonight from X set out about T ago, around the time …" / "… before the Sun and
 * Earth had formed": the light-travel time placed on the timeline admins keep, only where the rule
 * (shared/statements/timeline.ts) finds an entry compatible with the figure's own interval.
 */
export const lightSetOutTimeline: StatementTemplate = {
  id: 'light-set-out-timeline',
  title: 'When its light set out, on Earth’s timeline',
  needs: 'a redshift (0.01 or more), a distance or a parallax; compared with the timeline of Earth’s history when an entry fits',
  kinds: ['star', 'galaxy', 'quasar', 'nebula', 'cluster', 'other'],
  kindsReason:
    'a solar-system body’s light takes minutes or hours to reach us, and its distance changes through the year (the planet-light template gives it for one night).',
  usesCosmology: true,
  usesTimeline: true,
  evaluate(ctx) {
    const t = travelTime(ctx);
    const choice = chooseTimelineEntry(t.years, t.interval, ctx.timeline ?? []);
    const entry = choice.entry;
    const tail = (locale: StatementLocale) => (entry ? `, ${entry.phrases[locale]}` : '');
    return compose({
      value: t.years,
      unit: 'yr',
      interval: t.interval,
      sentence: (locale, n) => {
        const words = yearsPhrase(locale, n, t.years);
        return isFrench(locale)
          ? `La lumière que nous recevons ce soir ${frenchOf(ctx.object)} est partie il y a environ ${words}${tail(locale)}.`
          : `The light we see tonight from ${nameIn(ctx.object, locale)} set out about ${words} ago${tail(locale)}.`;
      },
      footnote: t.lookback ? cosmologyFootnote(t.model) : undefined,
      working: [...t.working, timelineStep(choice, t.years, t.lookback)],
      warnings: t.warnings,
      inputs: t.inputs,
      model: t.model,
    });
  },
};
