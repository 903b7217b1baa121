import { Op } from 'sequelize';
import { findTemplate } from '@shared/statements/index.ts';
import type { StatementLocale } from '@shared/statements/locales.ts';
import { SkyObject, Statement } from '../../models/index.ts';

/** A statement with what a page needs to show it. */
export interface LoadedStatement {
  statement: Statement;
  objectName: string;
  templateTitle: string;
}

/**
 * Loads the statements a page uses, with their object names and template titles.
 * @param ids statement ids in document order
 */
export async function loadStatements(ids: string[]): Promise<Map<string, LoadedStatement>> {
  if (!ids.length) return new Map();
  const statements = await Statement.findAll({ where: { id: { [Op.in]: ids } } });
  const objects = new Map(
    (
      await SkyObject.findAll({
        where: { id: { [Op.in]: [...new Set(statements.map((s) => s.skyObjectId))] } },
        attributes: ['id', 'name'],
      })
    ).map((o) => [o.id, o.name]),
  );
  return new Map(
    statements.map((s) => [
      s.id,
      {
        statement: s,
        objectName: objects.get(s.skyObjectId) ?? '',
        templateTitle: findTemplate(s.templateId)?.title ?? s.templateId,
      },
    ]),
  );
}

/** The statement's current public wording in a locale, or null when it has none (broken from the start). */
export function currentText(statement: Statement, locale: StatementLocale): string | null {
  return statement.texts?.[locale] ?? null;
}
