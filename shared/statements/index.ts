/**
 * Checked statements: sentence templates that turn an object's preferred measurements and the
 * organisation's cosmology into public wording with its full working.
 */
import { TemplateProblem } from './inputs.ts';
import { brightnessAt10pc } from './templates/brightness-at-10pc.ts';
import { distanceTodayTemplate } from './templates/distance-today.ts';
import { lightTravel } from './templates/light-travel.ts';
import { luminositySun } from './templates/luminosity-sun.ts';
import { nakedEye } from './templates/naked-eye.ts';
import { planetLightTonight } from './templates/planet-light-tonight.ts';
import { scaleModel } from './templates/scale-model.ts';
import type { StatementTemplate, TemplateContext, TemplateOutcome } from './types.ts';

export * from './types.ts';
export * from './locales.ts';
export { choosePrecision, roundToSignificant } from './precision.ts';
export { formatApproximate } from './number-words.ts';
export { nightFromSky, planetOf } from './tonight.ts';

/** Every template, in the order the picker lists them. */
export const STATEMENT_TEMPLATES: readonly StatementTemplate[] = [
  luminositySun,
  brightnessAt10pc,
  lightTravel,
  distanceTodayTemplate,
  nakedEye,
  scaleModel,
  planetLightTonight,
];

export const TEMPLATE_IDS = STATEMENT_TEMPLATES.map((t) => t.id) as [string, ...string[]];

export function findTemplate(id: string): StatementTemplate | undefined {
  return STATEMENT_TEMPLATES.find((t) => t.id === id);
}

/**
 * Evaluates a template; never throws. A missing input or a failed calculation comes back as a
 * failure that says why, in words.
 */
export function evaluateStatement(templateId: string, ctx: TemplateContext): TemplateOutcome {
  const template = findTemplate(templateId);
  if (!template) return { ok: false, code: 'not_applicable', reason: `There is no statement template “${templateId}”.` };
  try {
    return template.evaluate(ctx);
  } catch (error) {
    if (error instanceof TemplateProblem) return error.failure;
    return { ok: false, code: 'calculation_failed', reason: 'The statement could not be worked out from these inputs.' };
  }
}
