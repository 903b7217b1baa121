import { LY_PER_PC } from '../../engine/units.ts';
import { compose, cosmologyFootnote, derivedStep, mapInterval } from '../compose.ts';
import { distanceToday as computeDistance } from '../distance.ts';
import type { StatementTemplate } from '../types.ts';
import { nameAtStart, verb } from '../names.ts';
import { frenchCount, isFrench, unitWord } from './words.ts';

/** "It is now about D light-years away", naming the distance measure in the working. */
export const distanceTodayTemplate: StatementTemplate = {
  id: 'distance-today',
  title: 'Distance today in light-years',
  needs: 'a redshift (0.01 or more), a distance or a parallax',
  kinds: ['star', 'galaxy', 'quasar', 'nebula', 'cluster', 'other'],
  kindsReason: 'a solar-system body’s distance changes through the year; a single figure would be wrong most of the time.',
  usesCosmology: true,
  phraseId: 'distance-today-phrase',
  evaluate(ctx) {
    const d = computeDistance(ctx);
    const toLy = (mpc: number) => mpc * 1e6 * LY_PER_PC;
    const step = derivedStep({
      title: d.basis === 'z' ? 'In light-years (proper distance today)' : 'In light-years',
      formula: 'd [ly] = d [Mpc] × 10⁶ × (pc / ly)',
      inputs: [
        {
          symbol: 'd',
          name: d.basis === 'z' ? 'proper distance today (= line-of-sight comoving distance)' : 'distance',
          value: d.mpc,
          unit: 'Mpc',
          source: 'previous step',
        },
      ],
      constants: [
        {
          symbol: 'pc/ly',
          name: 'light-years per parsec',
          value: LY_PER_PC,
          unit: 'ly/pc',
          source: 'IAU 2015 B2 (parsec) and the Julian year (light-year)',
        },
      ],
      result: { symbol: 'd', name: 'distance', value: toLy(d.mpc), unit: 'ly' },
      note:
        d.basis === 'z'
          ? 'The measure is the proper distance today: how far away the object is now, in the expanding universe. It is larger than the light-travel distance and smaller than the luminosity distance.'
          : 'At this range the distance measures agree; no cosmology is involved.',
    });
    const now = d.basis === 'z';
    return compose({
      value: toLy(d.mpc),
      unit: 'ly',
      interval: mapInterval(d.interval ?? undefined, toLy),
      sentence: (locale, n) =>
        isFrench(locale)
          ? `${nameAtStart(ctx.object, locale)} ${verb(ctx.object, locale, 'se trouve', 'se trouvent')} ${now ? 'aujourd’hui ' : ''}à environ ${frenchCount(n, unitWord(locale, 'light-year'))}.`
          : `${nameAtStart(ctx.object, locale)} ${verb(ctx.object, locale, 'is', 'are')} ${now ? 'now ' : ''}about ${n} ${unitWord(locale, 'light-year')} away.`,
      // Inside the writer's sentence there is no "now": the phrase form's small print says which distance it is.
      phrase: (locale, n) =>
        isFrench(locale)
          ? `environ ${frenchCount(n, unitWord(locale, 'light-year'))}`
          : `about ${n} ${unitWord(locale, 'light-year')}`,
      footnote: now ? cosmologyFootnote(d.model) : undefined,
      working: [...d.working, step],
      warnings: d.warnings,
      inputs: d.inputs,
      model: d.model,
    });
  },
};
