import { bandLight } from '../../catalogue/bands.ts';
import { compose, cosmologyFootnote, derivedStep } from '../compose.ts';
import { language, type StatementLocale } from '../locales.ts';
import { nameAtStart, verb } from '../names.ts';
import { photometryRun } from '../photometry.ts';
import { aboutEqual, readRatio } from '../ratio.ts';
import type { StatementTemplate } from '../types.ts';
import { bandFootnote, frenchCount, isFrench } from './words.ts';

/** Half-width of a luminosity ratio's interval, in magnitudes. */
const ratioHalfWidthMag = (value: number, interval?: { low: number; high: number }) =>
  interval && interval.low > 0 ? 2.5 * Math.max(Math.log10(interval.high / value), Math.log10(value / interval.low)) : null;

/**
 * "It gives out about N times as much visible light as the Sun": a luminosity in one band, said to
 * be in that band's light. No bolometric correction is applied, so it never claims total output.
 */
export const luminositySun: StatementTemplate = {
  id: 'luminosity-sun',
  title: 'Light output in one band compared with the Sun',
  needs:
    'an apparent magnitude in a band with a known solar magnitude, and a redshift, distance or parallax (plus a spectral index at higher redshift, an extinction for distant stars, nebulae and clusters)',
  kinds: ['star', 'galaxy', 'quasar', 'nebula', 'cluster'],
  kindsReason:
    'it compares the light an object gives out with the Sun’s; planets and moons only reflect sunlight, and the Sun would be compared with itself.',
  usesCosmology: true,
  evaluate(ctx) {
    const p = photometryRun(ctx, 'luminosity_ratio_sun', (r) => ratioHalfWidthMag(r.value, r.interval));
    const { r, mag, basis } = p;
    const reading = readRatio(r.value, r.interval);
    const o = ctx.object;
    const footnote = (locale: StatementLocale) =>
      [bandFootnote(locale, mag.band), basis.kind === 'z' ? cosmologyFootnote(r.model)(locale) : null].filter(Boolean).join(' ');
    const pct =
      reading.form === 'times'
        ? []
        : [
            derivedStep({
              title: reading.form === 'percent' ? 'As a percentage of the Sun' : 'How many times less than the Sun',
              formula: reading.form === 'percent' ? 'p = 100 × L/L☉' : 'f = L☉/L = 1 / (L/L☉)',
              inputs: [
                { symbol: 'L/L☉', name: 'luminosity relative to the Sun', value: r.value, unit: '', source: 'previous step' },
              ],
              result:
                reading.form === 'percent'
                  ? { symbol: 'p', name: 'percentage of the Sun’s output', value: reading.value, unit: '%' }
                  : { symbol: 'f', name: 'times less light than the Sun', value: reading.value, unit: '' },
              note: 'House style: below one, a percentage down to 1 %, and "N times less" only below that (DEVELOPERS.md).',
            }),
          ];
    return compose({
      value: reading.value,
      unit: reading.form === 'times' ? '× Sun' : reading.form === 'percent' ? '%' : '× less than the Sun',
      interval: reading.interval,
      sentence: (locale, n, shown) => {
        const light = bandLight(mag.band, language(locale)).light;
        const subject = nameAtStart(o, locale);
        if (isFrench(locale)) {
          const emits = verb(o, locale, 'émet', 'émettent');
          if (aboutEqual(reading, shown)) return `${subject} ${emits} à peu près autant de ${light} que le Soleil.`;
          if (reading.form === 'times')
            return `${subject} ${emits} environ ${frenchCount(n, 'fois')} plus de ${light} que le Soleil.`;
          if (reading.form === 'percent') return `${subject} ${emits} seulement environ ${n} % de la ${light} du Soleil.`;
          return `${subject} ${emits} environ ${frenchCount(n, 'fois')} moins de ${light} que le Soleil.`;
        }
        const gives = verb(o, locale, 'gives', 'give');
        if (aboutEqual(reading, shown)) return `${subject} ${gives} out about as much ${light} as the Sun.`;
        if (reading.form === 'times') return `${subject} ${gives} out about ${n} times as much ${light} as the Sun.`;
        if (reading.form === 'percent') return `${subject} ${gives} out only about ${n} per cent as much ${light} as the Sun.`;
        return `${subject} ${gives} out about ${n} times less ${light} than the Sun.`;
      },
      footnote,
      working: [...r.working, ...p.steps, ...pct],
      warnings: p.warnings,
      inputs: p.inputs,
      model: r.model,
    });
  },
};
