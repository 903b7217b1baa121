import { evaluateStatement, findTemplate } from '@shared/statements/index.ts';
import { getSequelize } from '../../db.ts';
import { HttpError, NotFoundError } from '../../errors.ts';
import { SkyObject, Statement, type User } from '../../models/index.ts';
import { recordAudit } from '../audit.ts';
import { getSettings } from '../organisation-settings.ts';
import { applyOutcome } from './apply-outcome.ts';
import { cosmologyDescriptionId } from './cosmology-descriptions.ts';
import { packForStorage } from './working-pack.ts';
import { saveSkeletons } from './working-store.ts';
import { linkStatementInputs } from './statement-inputs.ts';
import { buildTemplateContext } from './context.ts';

/**
 * Finds the statement for an object and template, or creates and computes it now so the writer
 * sees its text at once. One statement per pair: every page that uses it shows the same number.
 * A template whose inputs are missing is refused with the reason (nothing is stored).
 * @throws HttpError 404 unknown object or template, 422 `statement_not_computable`
 */
export async function findOrCreateStatement(objectId: string, templateId: string, actor: User): Promise<{ statement: Statement; created: boolean }> {
  const template = findTemplate(templateId);
  if (!template) throw NotFoundError(`There is no statement template “${templateId}”.`);
  const existing = await Statement.findOne({ where: { skyObjectId: objectId, templateId } });
  if (existing) return { statement: existing, created: false };
  const object = await SkyObject.findByPk(objectId);
  if (!object) throw NotFoundError('That object is not in the catalogue.');
  const settings = await getSettings();
  const ctx = await buildTemplateContext(object, { model: settings.cosmologyModel, band: settings.defaultBand, version: settings.version });
  const outcome = evaluateStatement(templateId, ctx);
  if (!outcome.ok) {
    throw new HttpError(422, 'statement_not_computable', `“${template.title}” cannot be worked out for ${object.name}: ${outcome.reason}`);
  }
  const computed = applyOutcome(null, outcome);
  if (computed.status === 'broken') throw new HttpError(422, 'statement_not_computable', `“${template.title}” cannot be worked out for ${object.name}: ${computed.statusReason}`);
  const { model, working, ...fields } = computed;
  const packed = packForStorage(working);
  return getSequelize().transaction(async (transaction) => {
    const modelId = model ? await cosmologyDescriptionId(model, transaction) : null;
    await saveSkeletons(packed.skeletons, transaction);
    const [statement, created] = await Statement.findOrCreate({
      where: { skyObjectId: objectId, templateId },
      defaults: { ...fields, working: packed.stored, modelId, settingsVersion: settings.version, computedAt: new Date(), skyObjectId: objectId, templateId, createdById: actor.id },
      transaction,
    });
    if (created) {
      await linkStatementInputs(statement.id, fields.inputs, transaction);
      await recordAudit({ actorId: actor.id, action: 'statement.created', subjectType: 'statement', subjectId: statement.id, data: { objectId, templateId } }, transaction);
    }
    return { statement, created };
  });
}
