import { Op } from 'sequelize';
import type { CalcModel } from '@shared/schemas/calc.ts';
import type { PreviewRow } from '@shared/schemas/settings.ts';
import { evaluateStatement, findTemplate, type StatementLocale } from '@shared/statements/index.ts';
import { SkyObject, Statement } from '../../models/index.ts';
import { getSettings } from '../organisation-settings.ts';
import { applyOutcome } from './apply-outcome.ts';
import { buildTemplateContext } from './context.ts';

/**
 * What switching the cosmology would do, without changing anything: every statement that depends on
 * the cosmology is computed with the proposed model, and those whose public text (in the
 * organisation's locale) would change, or that would break, are listed with old and new text.
 */
export async function previewCosmologyChange(model: CalcModel): Promise<{ rows: PreviewRow[]; checked: number }> {
  const settings = await getSettings();
  const locale = settings.defaultLocale as StatementLocale;
  const cosmological = ['luminosity-sun', 'brightness-at-10pc', 'light-travel', 'distance-today', 'scale-model'].filter((id) => findTemplate(id)?.usesCosmology);
  const statements = await Statement.findAll({ where: { templateId: { [Op.in]: cosmological } }, order: [['skyObjectId', 'ASC']] });
  const objects = new Map((await SkyObject.findAll({ where: { id: { [Op.in]: [...new Set(statements.map((s) => s.skyObjectId))] } } })).map((o) => [o.id, o]));
  const rows: PreviewRow[] = [];
  const contexts = new Map<string, Awaited<ReturnType<typeof buildTemplateContext>>>();
  for (const statement of statements) {
    const object = objects.get(statement.skyObjectId);
    if (!object) continue;
    let ctx = contexts.get(object.id);
    if (!ctx) {
      ctx = await buildTemplateContext(object, { model, band: settings.defaultBand, version: settings.version });
      contexts.set(object.id, ctx);
    }
    const fields = applyOutcome(statement, evaluateStatement(statement.templateId, ctx), settings.version);
    const oldText = statement.texts?.[locale] ?? null;
    const newText = fields.status === 'broken' ? null : (fields.texts?.[locale] ?? null);
    if (oldText !== newText || fields.status !== statement.status) {
      rows.push({
        statementId: statement.id,
        objectName: object.name,
        templateTitle: findTemplate(statement.templateId)?.title ?? statement.templateId,
        oldText,
        newText,
        newStatus: fields.status,
        reason: fields.status === 'broken' ? fields.statusReason : null,
      });
    }
  }
  return { rows, checked: statements.length };
}
