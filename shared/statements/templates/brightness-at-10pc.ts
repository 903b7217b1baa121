import { bandLight } from '../../catalogue/bands.ts';
import { SOLAR_MAGNITUDES } from '../../engine/solar-magnitudes.ts';
import { compose, cosmologyFootnote, derivedStep } from '../compose.ts';
import { language } from '../locales.ts';
import { nameIn, verb } from '../names.ts';
import { photometryRun } from '../photometry.ts';
import { aboutEqual, readRatio } from '../ratio.ts';
import type { StatementTemplate } from '../types.ts';
import { bandFootnote, frenchCount, isFrench } from './words.ts';

/** Half-width of an absolute magnitude's interval, in magnitudes. */
const magHalfWidth = (value: number, interval?: { low: number; high: number }) =>
  interval ? Math.max(interval.high - value, value - interval.low) : null;

/**
 * "From 10 parsecs it would look about N times as bright in visible light as the Sun does in our
 * sky." Only for objects that would still be points of light from 10 pc.
 */
export const brightnessAt10pc: StatementTemplate = {
  id: 'brightness-at-10pc',
  title: 'Brightness from 10 parsecs compared with the Sun in our sky',
  needs:
    'an apparent magnitude in a band with a known solar magnitude, and a redshift, distance or parallax (plus a spectral index at higher redshift, an extinction for distant stars)',
  kinds: ['star', 'quasar'],
  kindsReason:
    'it imagines the object as a point of light 10 parsecs away; a galaxy, nebula or cluster is parsecs to tens of thousands of parsecs across, so from 10 pc it would fill the sky, and a solar-system body has no use for it.',
  usesCosmology: true,
  evaluate(ctx) {
    const p = photometryRun(ctx, 'absolute_magnitude', (r) => magHalfWidth(r.value, r.interval));
    const { r, mag, basis } = p;
    const sun = SOLAR_MAGNITUDES[mag.band];
    const ratioOf = (M: number) => 10 ** (-0.4 * (M - sun.apparent));
    const ratio = ratioOf(r.value);
    const ratioInterval = r.interval ? { low: ratioOf(r.interval.high), high: ratioOf(r.interval.low) } : null;
    const reading = readRatio(ratio, ratioInterval);
    const step = derivedStep({
      title: 'Compare with the Sun as we see it',
      formula:
        reading.form === 'times'
          ? 'ratio = 10^(−0.4 (M − m☉))'
          : reading.form === 'percent'
            ? 'p = 100 × 10^(−0.4 (M − m☉))'
            : 'f = 10^(0.4 (M − m☉)) (how many times fainter)',
      inputs: [
        {
          symbol: 'M',
          name: 'absolute magnitude (its apparent magnitude seen from 10 pc)',
          value: r.value,
          unit: 'mag',
          source: 'previous step',
        },
      ],
      constants: [
        {
          symbol: 'm☉',
          name: `apparent magnitude of the Sun (${sun.label})`,
          value: sun.apparent,
          unit: 'mag',
          source: sun.source,
        },
      ],
      result: {
        symbol: reading.form === 'times' ? 'ratio' : reading.form === 'percent' ? 'p' : 'f',
        name:
          reading.form === 'times'
            ? 'times as bright as the Sun in our sky'
            : reading.form === 'percent'
              ? 'per cent of the Sun’s brightness in our sky'
              : 'times fainter than the Sun in our sky',
        value: reading.value,
        unit: reading.form === 'percent' ? '%' : '',
      },
      note: 'An object’s absolute magnitude is, by definition, how bright it would look from 10 parsecs (32.6 light-years). House style for ratios: DEVELOPERS.md.',
    });
    const o = ctx.object;
    return compose({
      value: reading.value,
      unit: reading.form === 'percent' ? '%' : '',
      interval: reading.interval,
      sentence: (locale, n, shown) => {
        const inLight = bandLight(mag.band, language(locale)).inLight;
        if (isFrench(locale)) {
          const shines = verb(o, locale, 'brillerait', 'brilleraient');
          const lead = `À 10 parsecs de nous (environ 33 années-lumière), ${nameIn(o, locale)}`;
          if (aboutEqual(reading, shown)) return `${lead} ${shines} à peu près autant que le Soleil dans notre ciel, ${inLight}.`;
          if (reading.form === 'times')
            return `${lead} ${shines} environ ${frenchCount(n, 'fois')} plus que le Soleil dans notre ciel, ${inLight}.`;
          if (reading.form === 'percent')
            return `${lead} ${verb(o, locale, 'aurait', 'auraient')} environ ${n} % de l’éclat du Soleil dans notre ciel, ${inLight}.`;
          return `${lead} ${shines} environ ${frenchCount(n, 'fois')} moins que le Soleil dans notre ciel, ${inLight}.`;
        }
        const lead = `Seen from 10 parsecs (about 33 light-years) away, ${nameIn(o, locale)} would look about`;
        if (aboutEqual(reading, shown)) return `${lead} as bright ${inLight} as the Sun does in our sky.`;
        if (reading.form === 'times') return `${lead} ${n} times as bright ${inLight} as the Sun does in our sky.`;
        if (reading.form === 'percent') return `${lead} ${n} per cent as bright ${inLight} as the Sun does in our sky.`;
        return `${lead} ${n} times fainter ${inLight} than the Sun does in our sky.`;
      },
      footnote: (locale) =>
        [bandFootnote(locale, mag.band), basis.kind === 'z' ? cosmologyFootnote(r.model)(locale) : null]
          .filter(Boolean)
          .join(' '),
      working: [...r.working, ...p.steps, step],
      warnings: p.warnings,
      inputs: p.inputs,
      model: r.model,
    });
  },
};
