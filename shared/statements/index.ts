/**
 * Checked statements: sentence templates that turn an object's preferred measurements and the
 * organisation's cosmology into public wording with its full working.
 */
import { TemplateProblem } from './inputs.ts';
import { brightnessAt10pc } from './templates/brightness-at-10pc.ts';
import { distanceTodayTemplate } from './templates/distance-today.ts';
import { lightSetOutTimeline } from './templates/light-set-out-timeline.ts';
import { lightTravel } from './templates/light-travel.ts';
import { luminositySun } from './templates/luminosity-sun.ts';
import { nakedEye } from './templates/naked-eye.ts';
import { phraseForm } from './templates/phrase-form.ts';
import { planetLightTonight } from './templates/planet-light-tonight.ts';
import { scaleModel } from './templates/scale-model.ts';
import { KIND_LABELS, type SkyObjectKind } from '../catalogue/kinds.ts';
import type { StatementTemplate, TemplateContext, TemplateOutcome } from './types.ts';

export * from './types.ts';
export * from './locales.ts';
export { choosePrecision, roundToSignificant } from './precision.ts';
export { formatApproximate } from './number-words.ts';
export { nightFromSky } from './tonight.ts';
export type { SentenceNames } from './names.ts';
export { chooseTimelineEntry, type TimelineEntry, type TimelineRelation } from './timeline.ts';

/**
 * The release of the statement rules: raise it whenever a release changes templates' wording, the
 * kinds they are valid for or the inputs they require. The server recomputes every stored statement
 * once when it starts under a newer release (server/services/statements/rules-release.ts).
 * 2: band light in the sentence, names with article and number, ratio house style, template kinds,
 *    K-correction and extinction rules.
 * 3: intervals include the adopted model's H0 range and a peculiar-velocity term; trailing zeros
 *    kept; Hubble-law figures limited by the law's own error; planet light time holds for the evening.
 * 4: phrase forms (a number inside a writer's sentence); "when the light set out" on Earth's timeline;
 *    the working names a measurement by its object, quantity and source, never by its id.
 */
export const STATEMENT_RULES_VERSION = 4;

/** Every template, in the order the picker lists them. */
export const STATEMENT_TEMPLATES: readonly StatementTemplate[] = [
  luminositySun,
  brightnessAt10pc,
  lightTravel,
  lightSetOutTimeline,
  distanceTodayTemplate,
  nakedEye,
  scaleModel,
  planetLightTonight,
  phraseForm(distanceTodayTemplate, {
    title: 'Distance today in light-years, as a phrase inside your sentence',
    footnote: {
      'en-GB': 'The distance given is how far away it is today.',
      'en-US': 'The distance given is how far away it is today.',
      'fr-FR': 'La distance indiquée est celle d’aujourd’hui.',
    },
  }),
  phraseForm(lightTravel, { title: 'How long its light has travelled, as a phrase inside your sentence' }),
];

/** The templates that read Earth's timeline (a timeline edit recomputes their statements). */
export const TIMELINE_TEMPLATE_IDS: readonly string[] = STATEMENT_TEMPLATES.filter((t) => t.usesTimeline).map((t) => t.id);

export function findTemplate(id: string): StatementTemplate | undefined {
  return STATEMENT_TEMPLATES.find((t) => t.id === id);
}

/**
 * Why a template cannot be used for an object of this kind, or null when it can.
 * @param template the template
 * @param kind the object's kind
 * @returns a sentence for the writer (and the reviewer, when a stored statement breaks the rule)
 */
export function kindRefusal(template: StatementTemplate, kind: string): string | null {
  if ((template.kinds as readonly string[]).includes(kind)) return null;
  const label = KIND_LABELS[kind as SkyObjectKind]?.toLowerCase() ?? kind;
  return `“${template.title}” is not for an object of kind “${label}”: ${template.kindsReason}`;
}

/** The templates valid for an object of this kind, in picker order. */
export function templatesForKind(kind: string): StatementTemplate[] {
  return STATEMENT_TEMPLATES.filter((t) => kindRefusal(t, kind) === null);
}

/**
 * Evaluates a template; never throws. An object of a kind the template is not valid for is
 * refused first (code `not_applicable`), whatever its measurements. A missing input or a failed calculation comes back as a
 * failure that says why, in words.
 */
export function evaluateStatement(templateId: string, ctx: TemplateContext): TemplateOutcome {
  const template = findTemplate(templateId);
  if (!template) return { ok: false, code: 'not_applicable', reason: `There is no statement template “${templateId}”.` };
  const refusal = kindRefusal(template, ctx.object.kind);
  if (refusal) return { ok: false, code: 'not_applicable', reason: `Needs review: ${refusal}` };
  try {
    return template.evaluate(ctx);
  } catch (error) {
    if (error instanceof TemplateProblem) return error.failure;
    return { ok: false, code: 'calculation_failed', reason: 'The statement could not be worked out from these inputs.' };
  }
}
