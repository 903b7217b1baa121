import { SOLAR_RADIUS } from '../../engine/constants.ts';
import { KM_PER_MPC } from '../../engine/units.ts';
import { compose, cosmologyFootnote, derivedStep, mapInterval } from '../compose.ts';
import { distanceToday } from '../distance.ts';
import type { StatementTemplate } from '../types.ts';
import { nameIn, verb } from '../names.ts';
import { frenchCount, isFrench, unitWord } from './words.ts';

/** The bead the Sun shrinks to, in metres. */
export const BEAD_DIAMETER_M = 0.01;

/** "If the Sun were a bead 1 cm across, it would be about X km away." */
export const scaleModel: StatementTemplate = {
  id: 'scale-model',
  title: 'Distance in a scale model where the Sun is a 1 cm bead',
  needs: 'a redshift (0.01 or more), a distance or a parallax',
  kinds: ['star', 'galaxy', 'quasar', 'nebula', 'cluster', 'other'],
  kindsReason: 'a solar-system body’s distance changes through the year; a single figure would be wrong most of the time.',
  usesCosmology: true,
  evaluate(ctx) {
    const d = distanceToday(ctx);
    const sunDiameterM = 2 * SOLAR_RADIUS.value * (SOLAR_RADIUS.unit === 'km' ? 1000 : 1);
    const scale = BEAD_DIAMETER_M / sunDiameterM;
    const toScaledKm = (mpc: number) => mpc * KM_PER_MPC * scale;
    const km = toScaledKm(d.mpc);
    const inMetres = km < 1;
    const value = inMetres ? km * 1000 : km;
    const step = derivedStep({
      title: 'Shrink the distance by the bead’s scale',
      formula: 'd_model = d × (1 cm / (2 R☉))',
      inputs: [{ symbol: 'd', name: 'distance', value: d.mpc * KM_PER_MPC, unit: 'km', source: 'previous step' }],
      constants: [
        {
          symbol: 'R☉',
          name: SOLAR_RADIUS.name,
          value: SOLAR_RADIUS.value,
          unit: SOLAR_RADIUS.unit,
          source: SOLAR_RADIUS.source,
        },
        { symbol: 'bead', name: 'diameter of the bead the Sun becomes', value: 1, unit: 'cm', source: 'the model’s choice' },
      ],
      result: { symbol: 'd_model', name: 'distance in the scale model', value, unit: inMetres ? 'm' : 'km' },
    });
    return compose({
      value,
      unit: inMetres ? 'm' : 'km',
      interval: mapInterval(d.interval ?? undefined, (mpc) => toScaledKm(mpc) * (inMetres ? 1000 : 1)),
      sentence: (locale, n) => {
        const unit = unitWord(locale, inMetres ? 'metre' : 'kilometre');
        return isFrench(locale)
          ? `Si le Soleil était une perle d’un ${unitWord(locale, 'centimetre')} de diamètre, ${nameIn(ctx.object, locale)} ${verb(ctx.object, locale, 'serait', 'seraient')} à environ ${frenchCount(n, unit)}.`
          : `If the Sun were a bead 1 ${unitWord(locale, 'centimetre')} across, ${nameIn(ctx.object, locale)} would be about ${n} ${unit} away.`;
      },
      footnote: d.basis === 'z' ? cosmologyFootnote(d.model) : undefined,
      working: [...d.working, step],
      warnings: d.warnings,
      inputs: d.inputs,
      model: d.model,
    });
  },
};
