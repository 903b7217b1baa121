import { SOLAR_MAGNITUDES } from '../../engine/solar-magnitudes.ts';
import { compose, cosmologyFootnote, derivedStep, mapInterval } from '../compose.ts';
import { asInput, distanceInputs, find, missing, requireDistance, runWithModel, used } from '../inputs.ts';
import type { StatementTemplate } from '../types.ts';
import { pickMagnitude } from './luminosity-sun.ts';
import { bandFootnote, frenchCount, isFrench } from './words.ts';

/** "From 10 parsecs it would look about N times as bright as the Sun does in our sky." */
export const brightnessAt10pc: StatementTemplate = {
  id: 'brightness-at-10pc',
  title: 'Brightness from 10 parsecs compared with the Sun in our sky',
  needs: 'an apparent magnitude in a band with a known solar magnitude, and a redshift, distance or parallax',
  usesCosmology: true,
  evaluate(ctx) {
    const mag = pickMagnitude(ctx);
    if (!mag?.band)
      throw missing(
        ['apparent_magnitude'],
        `Needs a preferred apparent magnitude in the ${ctx.band} band (or another band with a known solar magnitude).`,
      );
    const sun = SOLAR_MAGNITUDES[mag.band];
    const basis = requireDistance(ctx);
    const extinction = find(ctx, 'extinction', mag.band);
    const alpha = basis.kind === 'z' ? find(ctx, 'spectral_index') : undefined;
    const r = runWithModel(ctx, {
      quantity: 'absolute_magnitude',
      inputs: {
        m: asInput(mag),
        ...distanceInputs(basis),
        ...(extinction ? { extinction: asInput(extinction) } : {}),
        ...(alpha ? { alpha: asInput(alpha) } : {}),
      },
      model: ctx.model,
    });
    const ratioOf = (M: number) => 10 ** (-0.4 * (M - sun.apparent));
    const ratio = ratioOf(r.value);
    const brighter = ratio >= 1;
    const value = brighter ? ratio : 1 / ratio;
    const step = derivedStep({
      title: brighter ? 'Compare with the Sun as we see it' : 'Compare with the Sun as we see it (how many times fainter)',
      formula: brighter ? 'ratio = 10^(−0.4 (M − m☉))' : 'ratio = 10^(0.4 (M − m☉))',
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
        symbol: 'ratio',
        name: brighter ? 'times as bright as the Sun in our sky' : 'times fainter than the Sun in our sky',
        value,
        unit: '',
      },
      note: 'An object’s absolute magnitude is, by definition, how bright it would look from 10 parsecs (32.6 light-years).',
    });
    return compose({
      value,
      unit: '',
      interval: mapInterval(r.interval, (M) => (brighter ? ratioOf(M) : 1 / ratioOf(M))),
      sentence: (locale, n) =>
        isFrench(locale)
          ? `À 10 parsecs de nous (environ 33 années-lumière), ${ctx.object.name} brillerait environ ${frenchCount(n, 'fois')} ${brighter ? 'plus' : 'moins'} que le Soleil dans notre ciel.`
          : `Seen from 10 parsecs (about 33 light-years) away, ${ctx.object.name} would look about ${n} times ${brighter ? 'as bright as' : 'fainter than'} the Sun does in our sky.`,
      footnote: (locale) =>
        [bandFootnote(locale, mag.band!), basis.kind === 'z' ? cosmologyFootnote(r.model)(locale) : null]
          .filter(Boolean)
          .join(' '),
      working: [...r.working, step],
      warnings: r.warnings,
      inputs: [mag, basis.measurement, extinction, alpha].filter((m) => m !== undefined).map(used),
      model: r.model,
    });
  },
};
