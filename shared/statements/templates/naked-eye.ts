import { compose } from '../compose.ts';
import { asInput, find, missing, run, used } from '../inputs.ts';
import type { StatementTemplate } from '../types.ts';
import { frenchCount, isFrench } from './words.ts';

/** The faintest stars the unaided eye sees on a dark night (common practice: about magnitude 6). */
export const NAKED_EYE_LIMIT = 6;

/** "It is about N times too faint to see with the unaided eye" (or N times brighter than that limit). */
export const nakedEye: StatementTemplate = {
  id: 'naked-eye',
  title: 'Brightness compared with the faintest stars the unaided eye sees',
  needs: 'an apparent magnitude in the V band',
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
      sentence: (locale, n) => {
        if (isFrench(locale)) {
          return fainter
            ? `${ctx.object.name} est environ ${frenchCount(n, 'fois')} trop faible pour être visible à l’œil nu, même par nuit noire.`
            : `${ctx.object.name} a un éclat environ ${frenchCount(n, 'fois')} supérieur à celui des étoiles les plus faibles visibles à l’œil nu par nuit noire.`;
        }
        return fainter
          ? `${ctx.object.name} is about ${n} times too faint to see with the unaided eye, even on a dark night.`
          : `${ctx.object.name} is about ${n} times brighter than the faintest stars the unaided eye can see on a dark night.`;
      },
      working: r.working,
      warnings: r.warnings,
      inputs: [used(mag)],
      model: null,
    });
  },
};
