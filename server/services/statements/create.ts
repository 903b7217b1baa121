import { evaluateStatement, findTemplate } from '@shared/statements/index.ts';
import { getSequelize } from '../../db.ts';
import { HttpError, NotFoundError } from '../../errors.ts';
import { SkyObject, Statement, Venue, type User } from '../../models/index.ts';
import { recordAudit } from '../audit.ts';
import { getSettings } from '../organisation-settings.ts';
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
 * @throws HttpError 400 `venue_required` / `venue_not_used`, 404 unknown object, template or venue, 422 `statement_not_computable`
 */
export async function findOrCreateStatement(
  objectId: string,
  templateId: string,
  actor: User,
  venueId: string | null = null,
): Promise<{ statement: Statement; created: boolean }> {
  const template = findTemplate(templateId);
  if (!template) throw NotFoundError(`There is no statement template “${templateId}”.`);
  if (template.needsVenue && !venueId) {
    const message = `“${template.title}” is about one venue’s night: choose the venue it is for.`;
    throw new HttpError(400, 'venue_required', message, { venueId: message });
  }
  if (!template.needsVenue && venueId) {
    const message = `“${template.title}” is the same for every venue: leave the venue out.`;
    throw new HttpError(400, 'venue_not_used', message, { venueId: message });
  }
  const venue = venueId ? await Venue.findByPk(venueId) : null;
  if (venueId && !venue) throw NotFoundError('There is no such venue.');
  const existing = await Statement.findOne({ where: { skyObjectId: objectId, templateId, venueId } });
  if (existing) return { statement: existing, created: false };
  const object = await SkyObject.findByPk(objectId);
  if (!object) throw NotFoundError('That object is not in the catalogue.');
  const settings = await getSettings();
  const base = await buildTemplateContext(object, {
    model: settings.cosmologyModel,
    band: settings.defaultBand,
    h0Range: settings.h0Range ?? null,
    version: settings.version,
  });
  const night = venue ? (await buildVenueNights([venue.id], new Date())).get(venue.id) : undefined;
  const ctx = night ? withVenue(base, night) : base;
  const outcome = evaluateStatement(templateId, ctx);
  if (!outcome.ok) {
    throw new HttpError(
      422,
      'statement_not_computable',
      `“${template.title}” cannot be worked out for ${object.name}: ${outcome.reason}`,
    );
  }
  const computed = applyOutcome(null, outcome);
  if (computed.status === 'broken')
    throw new HttpError(
      422,
      'statement_not_computable',
      `“${template.title}” cannot be worked out for ${object.name}: ${computed.statusReason}`,
    );
  const { model, working, followedNight: _first, ...fields } = computed;
  const packed = packForStorage(working);
  return getSequelize().transaction(async (transaction) => {
    const modelId = model ? await cosmologyDescriptionId(model, transaction) : null;
    await saveSkeletons(packed.skeletons, transaction);
    const [statement, created] = await Statement.findOrCreate({
      where: { skyObjectId: objectId, templateId, venueId },
      defaults: {
        ...fields,
        working: packed.stored,
        modelId,
        settingsVersion: settings.version,
        computedAt: new Date(),
        skyObjectId: objectId,
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
          data: { objectId, templateId, venueId },
        },
        transaction,
      );
    }
    return { statement, created };
  });
}
