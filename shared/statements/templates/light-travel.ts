import { LY_PER_PC } from '../../engine/units.ts';
import { compose, cosmologyFootnote, derivedStep, mapInterval } from '../compose.ts';
import { distanceToday } from '../distance.ts';
import { asInput, distanceBasis, runWithModel, used } from '../inputs.ts';
import { formatApproximate } from '../number-words.ts';
import { frenchOf, nameIn } from '../names.ts';
import { choosePrecision } from '../precision.ts';
import type { StatementTemplate } from '../types.ts';
import { isFrench, yearsPhrase } from './words.ts';

/** "Its light set out about T ago, when the universe was about A old." */
export const lightTravel: StatementTemplate = {
  id: 'light-travel',
  title: 'When its light set out, and the age of the universe then',
  needs: 'a redshift (0.01 or more) for the age of the universe then; otherwise a distance or parallax',
  kinds: ['star', 'galaxy', 'quasar', 'nebula', 'cluster', 'other'],
  kindsReason:
    'a solar-system body’s distance changes through the year, so its light-travel time is given for one night (the planet-light template) or not at all.',
  usesCosmology: true,
  evaluate(ctx) {
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
      return compose({
        value: toYears(d.mpc),
        unit: 'yr',
        interval: mapInterval(d.interval ?? undefined, toYears),
        sentence: (locale, n) =>
          isFrench(locale)
            ? `La lumière que nous recevons ${frenchOf(ctx.object)} est partie il y a environ ${yearsPhrase(locale, n, toYears(d.mpc))}.`
            : `The light we see from ${nameIn(ctx.object, locale)} set out about ${yearsPhrase(locale, n, toYears(d.mpc))} ago.`,
        working: [...d.working, step],
        warnings: d.warnings,
        inputs: d.inputs,
        model: null,
      });
    }
    const z = { z: asInput(basis.measurement) };
    const lookback = runWithModel(ctx, { quantity: 'lookback_time', inputs: z, model: ctx.model });
    const age =
      lookback.model?.kind === 'flrw'
        ? runWithModel(ctx, { quantity: 'age_at_z', inputs: z, model: ctx.model }, { budget: false })
        : undefined;
    const years = lookback.value * 1e9;
    const ageYears = age ? age.value * 1e9 : 0;
    const agePrecision = age
      ? choosePrecision(ageYears, age.interval ? { low: age.interval.low * 1e9, high: age.interval.high * 1e9 } : null)
      : undefined;
    const ageWords = (locale: Parameters<typeof isFrench>[0]) =>
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
      value: years,
      unit: 'yr',
      interval: lookback.interval ? { low: lookback.interval.low * 1e9, high: lookback.interval.high * 1e9 } : null,
      sentence: (locale, n) => {
        const t = yearsPhrase(locale, n, years);
        if (isFrench(locale))
          return `La lumière que nous recevons ${frenchOf(ctx.object)} est partie il y a environ ${t}${age ? `, quand l’univers avait environ ${ageWords(locale)}` : ''}.`;
        return `The light we see from ${nameIn(ctx.object, locale)} set out about ${t} ago${age ? `, when the universe was about ${ageWords(locale)} old` : ''}.`;
      },
      footnote: cosmologyFootnote(lookback.model),
      working: [...lookback.working, ...(age?.working ?? []), ...ageStep],
      warnings: [...lookback.warnings, ...(age?.warnings ?? [])],
      inputs: [used(basis.measurement)],
      model: lookback.model,
    });
  },
};
