import { Op, type WhereOptions } from 'sequelize';
import type { StatementListQuery } from '@shared/schemas/statement.ts';
import type { Step } from '@shared/engine/working.ts';
import { CosmologyDescription, SkyObject, Statement, Venue } from '../../models/index.ts';
import { readWorking } from './working-store.ts';

/** The object a statement is about, as its presenter shows it. */
export type StatementObject = Pick<SkyObject, 'id' | 'name' | 'kind'>;

/** What presenting a statement needs loaded with it: its cosmology and its venue. */
export function statementIncludes() {
  return [
    { model: CosmologyDescription, as: 'modelDescription' },
    { model: Venue, as: 'venue', attributes: ['id', 'name', 'timeZone'] },
  ];
}

/**
 * One page of statements, those that need attention first (broken, then changed), then the newest
 * computations, each with its object. The list shows no working, so it stays in the database.
 */
export async function listStatements(
  q: StatementListQuery,
): Promise<{ rows: Array<{ statement: Statement; object: StatementObject }>; total: number }> {
  const where: WhereOptions<Statement> = {
    ...(q.status ? { status: q.status } : {}),
    ...(q.objectId ? { skyObjectId: q.objectId } : {}),
    ...(q.templateId ? { templateId: q.templateId } : {}),
  };
  const { rows, count } = await Statement.findAndCountAll({
    where,
    attributes: { exclude: ['working'] },
    include: statementIncludes(),
    order: [
      [Statement.sequelize!.literal("CASE status WHEN 'broken' THEN 0 WHEN 'changed' THEN 1 ELSE 2 END"), 'ASC'],
      ['computedAt', 'DESC'],
    ],
    limit: q.pageSize,
    offset: (q.page - 1) * q.pageSize,
  });
  const objects = new Map(
    (
      await SkyObject.findAll({
        where: { id: { [Op.in]: [...new Set(rows.map((s) => s.skyObjectId))] } },
        attributes: ['id', 'name', 'kind'],
      })
    ).map((o) => [o.id, o]),
  );
  return { rows: rows.map((statement) => ({ statement, object: objects.get(statement.skyObjectId)! })), total: count };
}

/** What a statement's page shows beside the statement itself: its object and its unpacked working. */
export async function loadStatementView(statement: Statement): Promise<{ object: StatementObject; working: Step[] }> {
  const object = await SkyObject.findByPk(statement.skyObjectId, { attributes: ['id', 'name', 'kind'] });
  return { object: object!, working: await readWorking(statement.working) };
}
