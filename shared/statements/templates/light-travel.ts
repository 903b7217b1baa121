import type { ResolvedModel } from '../../schemas/calc.ts';
import type { Step } from '../../engine/working.ts';
import { LY_PER_PC } from '../../engine/units.ts';
import { compose, cosmologyFootnote, derivedStep, mapInterval } from '../compose.ts';
import { distanceToday } from '../distance.ts';
import { asInput, distanceBasis, runWithModel, used } from '../inputs.ts';
import type { StatementLocale } from '../locales.ts';
import { formatApproximate } from '../number-words.ts';
import { frenchOf, nameIn } from '../names.ts';
import { choosePrecision } from '../precision.ts';
import type { StatementTemplate, TemplateContext, UsedInput } from '../types.ts';
import { isFrench, yearsPhrase } from './words.ts';

/** How long the light has travelled, with everything a statement needs to show its working. */
export interface TravelTime {
  years: number;
  interval: { low: number; high: number } | null;
  working: Step[];
  warnings: string[];
  inputs: UsedInput[];
  model: ResolvedModel | null;
  /** True when it is the lookback time of a redshift (the cosmology's), false for a distance or parallax. */
  lookback: boolean;
  /** The redshift measurement, for templates that go on to the age of the universe then. */
  redshift?: ReturnType<typeof asInput>;
}

/**
 * The light-travel time: for a redshift in the Hubble flow the lookback time in the adopted
 * cosmology (how long the light has been on its way through the expanding universe, which is not
 * the distance today divided by c), else the distance in light-years.
 */
export function travelTime(ctx: TemplateContext): TravelTime {
  const basis = distanceBasis(ctx);
  if (basis?.kind !== 'z') {
    // Nearby: the light-travel time in years is the distance in light-years.
    const d = distanceToday(ctx);
    const toYears = (mpc: number) => mpc * 1e6 * LY_PER_PC;
    const step = derivedStep({
      title: 'Light-travel time from the distance',
      formula: 't [years] = d [light-years] = d [pc] × (pc / ly)',
      inputs: [{ symbol: 'd', name: 'distance', value: d.mpc * 1e6, unit: 'pc', source: 'previous step' }],
      constants: [
        {
          symbol: 'pc/ly',
          name: 'light-years per parsec',
          value: LY_PER_PC,
          unit: 'ly/pc',
          source: 'IAU 2015 B2 (parsec) and the Julian year (light-year)',
        },
      ],
      result: { symbol: 't', name: 'light-travel time', value: toYears(d.mpc), unit: 'yr' },
    });
    return {
      years: toYears(d.mpc),
      interval: mapInterval(d.interval ?? undefined, toYears),
      working: [...d.working, step],
      warnings: d.warnings,
      inputs: d.inputs,
      model: null,
      lookback: false,
    };
  }
  const z = asInput(basis.measurement);
  const lookback = runWithModel(ctx, { quantity: 'lookback_time', inputs: { z }, model: ctx.model });
  return {
    years: lookback.value * 1e9,
    interval: lookback.interval ? { low: lookback.interval.low * 1e9, high: lookback.interval.high * 1e9 } : null,
    working: lookback.working,
    warnings: lookback.warnings,
    inputs: [used(basis.measurement)],
    model: lookback.model,
    lookback: true,
    redshift: z,
  };
}

/** "about 2.5 million years" / "environ 2,5 millions d’années": the phrase form's words. */
export function aboutYears(locale: StatementLocale, numberText: string, years: number): string {
  return `${isFrench(locale) ? 'environ' : 'about'} ${yearsPhrase(locale, numberText, years)}`;
}

/** "Its light set out about T ago, when the universe was about A old." */
export const lightTravel: StatementTemplate = {
  id: 'light-travel',
  title: 'When its light set out, and the age of the universe then',
  needs: 'a redshift (0.01 or more) for the age of the universe then; otherwise a distance or parallax',
  kinds: ['star', 'galaxy', 'quasar', 'nebula', 'cluster', 'other'],
  kindsReason:
    'a solar-system body’s distance changes through the year, so its light-travel time is given for one night (the planet-light template) or not at all.',
  usesCosmology: true,
  phraseId: 'light-travel-phrase',
  evaluate(ctx) {
    const t = travelTime(ctx);
    const age =
      t.redshift && t.model?.kind === 'flrw'
        ? runWithModel(ctx, { quantity: 'age_at_z', inputs: { z: t.redshift }, model: ctx.model }, { budget: false })
        : undefined;
    const ageYears = age ? age.value * 1e9 : 0;
    const agePrecision = age
      ? choosePrecision(ageYears, age.interval ? { low: age.interval.low * 1e9, high: age.interval.high * 1e9 } : null)
      : undefined;
    const ageWords = (locale: StatementLocale) =>
      agePrecision
        ? yearsPhrase(locale, formatApproximate(ageYears, agePrecision.significantFigures, locale).text, ageYears)
        : '';
    const ageStep =
      age && agePrecision
        ? [
            derivedStep({
              title: 'Public wording of the age then',
              formula: `round(age, ${agePrecision.significantFigures} significant figures)`,
              inputs: [
                {
                  symbol: 't(z)',
                  name: 'age of the universe when the light set out',
                  value: age.value,
                  unit: 'Gyr',
                  source: 'previous step',
                },
              ],
              result: {
                symbol: 't(z)',
                name: 'age as worded',
                value: Number(age.value.toPrecision(agePrecision.significantFigures)),
                unit: 'Gyr',
              },
              note: agePrecision.reason,
            }),
          ]
        : [];
    return compose({
      value: t.years,
      unit: 'yr',
      interval: t.interval,
      sentence: (locale, n) => {
        const words = yearsPhrase(locale, n, t.years);
        if (isFrench(locale))
          return `La lumière que nous recevons ${frenchOf(ctx.object)} est partie il y a environ ${words}${age ? `, quand l’univers avait environ ${ageWords(locale)}` : ''}.`;
        return `The light we see from ${nameIn(ctx.object, locale)} set out about ${words} ago${age ? `, when the universe was about ${ageWords(locale)} old` : ''}.`;
      },
      phrase: (locale, n) => aboutYears(locale, n, t.years),
      footnote: t.lookback ? cosmologyFootnote(t.model) : undefined,
      working: [...t.working, ...(age?.working ?? []), ...ageStep],
      warnings: [...t.warnings, ...(age?.warnings ?? [])],
      inputs: t.inputs,
      model: t.model,
    });
  },
};
