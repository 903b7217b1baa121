import { evaluateStatement, findTemplate, kindRefusal } from '@shared/statements/index.ts';
import { getSequelize } from '../../db.ts';
import { BadRequestError, NotFoundError, UnprocessableError } from '../../errors.ts';
import { SkyObject, Statement, Venue, type User } from '../../models/index.ts';
import { recordAudit } from '../audit.ts';
import { getSettings, timelineForStatements } from '../settings/index.ts';
import { applyOutcome } from './apply-outcome.ts';
import { cosmologyDescriptionId } from './cosmology-descriptions.ts';
import { packForStorage } from './working-pack.ts';
import { saveSkeletons } from './working-store.ts';
import { linkStatementInputs } from './statement-inputs.ts';
import { buildTemplateContext, buildVenueNights, withVenue } from './context.ts';

/**
 * Finds the statement for an object and template (and venue, for a template about a venue's
 * night), or creates and computes it now so the writer sees its text at once. One statement per
 * object, template and venue: every page that uses it shows the same number. A template whose
 * inputs are missing is refused with the reason (nothing is stored).
 * @param venueId the venue, required by templates that need one and refused by the others
 * @throws HttpError 400 `template_not_for_kind` (the template is not valid for the object's kind), `venue_required` / `venue_not_used`, 404 unknown object, template or venue, 422 `statement_not_computable`
 */
export async function findOrCreateStatement(
  skyObjectId: string,
  templateId: string,
  actor: User,
  venueId: string | null = null,
): Promise<{ statement: Statement; created: boolean }> {
  const template = findTemplate(templateId);
  if (!template) throw NotFoundError(`There is no statement template “${templateId}”.`);
  if (template.needsVenue && !venueId) {
    const message = `“${template.title}” is about one venue’s night: choose the venue it is for.`;
    throw BadRequestError(message, 'venue_required', { venueId: message });
  }
  if (!template.needsVenue && venueId) {
    const message = `“${template.title}” is the same for every venue: leave the venue out.`;
    throw BadRequestError(message, 'venue_not_used', { venueId: message });
  }
  const venue = venueId ? await Venue.findByPk(venueId) : null;
  if (venueId && !venue) throw NotFoundError('There is no such venue.');
  const object = await SkyObject.findByPk(skyObjectId);
  if (!object) throw NotFoundError('That object is not in the catalogue.');
  const refusal = kindRefusal(template, object.kind);
  if (refusal) throw BadRequestError(refusal, 'template_not_for_kind', { templateId: refusal });
  const existing = await Statement.findOne({ where: { skyObjectId, templateId, venueId } });
  if (existing) return { statement: existing, created: false };
  const settings = await getSettings();
  const base = await buildTemplateContext(object, {
    model: settings.cosmologyModel,
    band: settings.defaultBand,
    h0Range: settings.h0Range ?? null,
    version: settings.version,
    assumptions: { spectralIndex: settings.spectralIndexDefaults ?? {} },
    timeline: template.usesTimeline ? await timelineForStatements() : [],
  });
  const night = venue ? (await buildVenueNights([venue.id], new Date())).get(venue.id) : undefined;
  const ctx = night ? withVenue(base, night) : base;
  const outcome = evaluateStatement(templateId, ctx);
  if (!outcome.ok) {
    throw UnprocessableError(
      `“${template.title}” cannot be worked out for ${object.name}: ${outcome.reason}`,
      'statement_not_computable',
    );
  }
  const computed = applyOutcome(null, outcome);
  if (computed.status === 'broken')
    throw UnprocessableError(
      `“${template.title}” cannot be worked out for ${object.name}: ${computed.statusReason}`,
      'statement_not_computable',
    );
  const { model, working, followedNight: _first, ...fields } = computed;
  const packed = packForStorage(working);
  return getSequelize().transaction(async (transaction) => {
    const modelId = model ? await cosmologyDescriptionId(model, transaction) : null;
    await saveSkeletons(packed.skeletons, transaction);
    const [statement, created] = await Statement.findOrCreate({
      where: { skyObjectId, templateId, venueId },
      defaults: {
        ...fields,
        working: packed.stored,
        modelId,
        settingsVersion: settings.version,
        computedAt: new Date(),
        skyObjectId,
        templateId,
        venueId,
        createdById: actor.id,
      },
      transaction,
    });
    if (created) {
      await linkStatementInputs(statement.id, fields.inputs, transaction);
      await recordAudit(
        {
          actorId: actor.id,
          action: 'statement.created',
          subjectType: 'statement',
          subjectId: statement.id,
          data: { objectId: skyObjectId, templateId, venueId },
        },
        transaction,
      );
    }
    return { statement, created };
  });
}
