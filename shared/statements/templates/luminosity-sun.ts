import { SOLAR_MAGNITUDES } from '../../engine/solar-magnitudes.ts';
import { compose, cosmologyFootnote, derivedStep } from '../compose.ts';
import { asInput, distanceInputs, find, missing, requireDistance, runWithModel, used } from '../inputs.ts';
import type { StatementTemplate, TemplateContext } from '../types.ts';
import { bandFootnote, frenchCount, isFrench } from './words.ts';

/** The apparent magnitude to use: in the organisation's band if there is one, else any band with a known solar magnitude. */
export function pickMagnitude(ctx: TemplateContext) {
  return (
    find(ctx, 'apparent_magnitude', ctx.band) ??
    ctx.measurements.find((m) => m.quantity === 'apparent_magnitude' && m.band && SOLAR_MAGNITUDES[m.band])
  );
}

/** "It gives out about N times as much light as the Sun" (in the same band). */
export const luminositySun: StatementTemplate = {
  id: 'luminosity-sun',
  title: 'Light output compared with the Sun',
  needs: 'an apparent magnitude in a band with a known solar magnitude, and a redshift, distance or parallax',
  usesCosmology: true,
  evaluate(ctx) {
    const mag = pickMagnitude(ctx);
    if (!mag?.band)
      throw missing(
        ['apparent_magnitude'],
        `Needs a preferred apparent magnitude in the ${ctx.band} band (or another band with a known solar magnitude).`,
      );
    const basis = requireDistance(ctx);
    const extinction = find(ctx, 'extinction', mag.band);
    const alpha = basis.kind === 'z' ? find(ctx, 'spectral_index') : undefined;
    const r = runWithModel(ctx, {
      quantity: 'luminosity_ratio_sun',
      inputs: {
        m: asInput(mag),
        band: mag.band,
        ...distanceInputs(basis),
        ...(extinction ? { extinction: asInput(extinction) } : {}),
        ...(alpha ? { alpha: asInput(alpha) } : {}),
      },
      model: ctx.model,
    });
    const inputs = [mag, basis.measurement, extinction, alpha].filter((m) => m !== undefined).map(used);
    const footnote = (locale: Parameters<ReturnType<typeof cosmologyFootnote>>[0]) =>
      [bandFootnote(locale, mag.band!), basis.kind === 'z' ? cosmologyFootnote(r.model)(locale) : null].filter(Boolean).join(' ');
    if (r.value >= 1) {
      return compose({
        value: r.value,
        unit: '× Sun',
        interval: r.interval ?? null,
        sentence: (locale, n) =>
          isFrench(locale)
            ? `${ctx.object.name} émet environ ${frenchCount(n, 'fois')} plus de lumière que le Soleil.`
            : `${ctx.object.name} gives out about ${n} times as much light as the Sun.`,
        footnote,
        working: r.working,
        warnings: r.warnings,
        inputs,
        model: r.model,
      });
    }
    const pct = derivedStep({
      title: 'As a percentage of the Sun',
      formula: 'p = 100 × L/L☉',
      inputs: [{ symbol: 'L/L☉', name: 'luminosity relative to the Sun', value: r.value, unit: '', source: 'previous step' }],
      result: { symbol: 'p', name: 'percentage of the Sun’s output', value: r.value * 100, unit: '%' },
    });
    return compose({
      value: r.value * 100,
      unit: '%',
      interval: r.interval ? { low: r.interval.low * 100, high: r.interval.high * 100 } : null,
      sentence: (locale, n) =>
        isFrench(locale)
          ? `${ctx.object.name} émet seulement environ ${n} % de la lumière du Soleil.`
          : `${ctx.object.name} gives out only about ${n} per cent as much light as the Sun.`,
      footnote,
      working: [...r.working, pct],
      warnings: r.warnings,
      inputs,
      model: r.model,
    });
  },
};
