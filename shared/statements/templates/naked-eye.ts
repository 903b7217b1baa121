import { compose } from '../compose.ts';
import { asInput, find, missing, run, used } from '../inputs.ts';
import { nameAtStart, verb } from '../names.ts';
import type { StatementTemplate } from '../types.ts';
import { frenchCount, isFrench } from './words.ts';

/** The faintest stars the unaided eye sees on a dark night (common practice: about magnitude 6). */
export const NAKED_EYE_LIMIT = 6;

/** "It is about N times too faint to see with the unaided eye" (or N times brighter than that limit). */
export const nakedEye: StatementTemplate = {
  id: 'naked-eye',
  title: 'Brightness compared with the faintest stars the unaided eye sees',
  needs: 'an apparent magnitude in the V band',
  kinds: ['star', 'quasar', 'planet', 'moon'],
  kindsReason:
    'the unaided-eye limit is for points of light; a galaxy’s, nebula’s or cluster’s total magnitude is spread over its area, so comparing it with the faintest stars misleads (and the Sun is never to be looked at).',
  usesCosmology: false,
  evaluate(ctx) {
    const mag = find(ctx, 'apparent_magnitude', 'V');
    if (!mag)
      throw missing(
        ['apparent_magnitude'],
        'Needs a preferred apparent magnitude in the V band (the unaided-eye limit is a visual magnitude).',
      );
    const fainter = mag.value > NAKED_EYE_LIMIT;
    const limit = { value: NAKED_EYE_LIMIT, source: 'unaided-eye limit on a dark night, about magnitude 6 (common practice)' };
    // flux_ratio gives F1/F2 = 10^(−0.4 (m1 − m2)); put the brighter one first so the ratio is ≥ 1.
    const r = run({
      quantity: 'flux_ratio',
      inputs: fainter ? { m1: limit, m2: asInput(mag) } : { m1: asInput(mag), m2: limit },
    });
    return compose({
      value: r.value,
      unit: '',
      interval: r.interval ?? null,
      sentence: (locale, n, shown) => {
        const o = ctx.object;
        const subject = nameAtStart(o, locale);
        // A ratio that rounds to one is "at the limit", never "1 times" (house style, DEVELOPERS.md).
        if (isFrench(locale)) {
          if (shown === 1)
            return `${subject} ${verb(o, locale, 'est', 'sont')} à peu près à la limite de ce que l’œil nu peut voir par nuit noire.`;
          return fainter
            ? `${subject} ${verb(o, locale, 'est', 'sont')} environ ${frenchCount(n, 'fois')} trop ${verb(o, locale, 'faible', 'faibles')} pour être ${verb(o, locale, 'visible', 'visibles')} à l’œil nu, même par nuit noire.`
            : `${subject} ${verb(o, locale, 'a', 'ont')} un éclat environ ${frenchCount(n, 'fois')} supérieur à celui des étoiles les plus faibles visibles à l’œil nu par nuit noire.`;
        }
        if (shown === 1)
          return `${subject} ${verb(o, locale, 'is', 'are')} about at the limit of what the unaided eye can see on a dark night.`;
        return fainter
          ? `${subject} ${verb(o, locale, 'is', 'are')} about ${n} times too faint to see with the unaided eye, even on a dark night.`
          : `${subject} ${verb(o, locale, 'is', 'are')} about ${n} times as bright as the faintest stars the unaided eye can see on a dark night.`;
      },
      working: r.working,
      warnings: r.warnings,
      inputs: [used(mag)],
      model: null,
    });
  },
};
