import { ForeignKeyConstraintError, QueryTypes } from 'sequelize';
import { allowLongStatements, getSequelize } from '../../db.ts';
import { ConflictError, NotFoundError } from '../../errors.ts';
import { CatalogueImport, Measurement, type User } from '../../models/index.ts';
import { recordAudit } from '../audit.ts';

const RECORDSET = `jsonb_to_recordset(ci.accepted_rows) AS r(
  "objectId" uuid, quantity text, band text, value float8, uncertainty float8, "uncertaintyMinus" float8,
  "uncertaintyPlus" float8, "enteredValue" float8, "enteredUnit" text, "sourceId" uuid, note text)`;

/** What a commit did: the import, how many measurements it added, and whether an earlier commit already had. */
interface CommitOutcome {
  record: CatalogueImport;
  inserted: number;
  alreadyCommitted: boolean;
}

/**
 * Commits a checked import: every accepted row becomes a measurement, with a history row each, in
 * one transaction, or nothing does. Refused if the catalogue changed since the dry run so that a
 * row would now duplicate a measurement, or an object or source has been deleted.
 *
 * One commit per import: a second commit (a double click, a retried request) waits for the first
 * on the import's row lock and answers the first one's result, adding nothing.
 * @returns the import, how many measurements it added, and whether it had been committed before
 * @param options.confirm true once the rows the dry run asked to confirm have been read
 * @throws HttpError 404 when there is no such import, 409 (catalogue_changed, confirmation_needed)
 */
export async function commitCatalogueImport(
  importId: string,
  actor: User,
  options: { confirm: boolean; ip?: string },
): Promise<CommitOutcome> {
  const { ip } = options;
  const sequelize = getSequelize();
  let inserted = 0;
  let alreadyCommitted = false;
  try {
    const record = await sequelize.transaction(async (transaction) => {
      // A bulk commit of up to 100,000 rows may outlast the limit meant for ordinary requests.
      await allowLongStatements(transaction, 120);
      // The rows stay in the database: they are read by the INSERT below, never into Node.
      const record = await CatalogueImport.findByPk(importId, {
        attributes: { exclude: ['acceptedRows'] },
        transaction,
        lock: transaction.LOCK.UPDATE,
      });
      if (!record) throw NotFoundError('There is no import with that id; upload the file again.');
      if (record.status === 'committed') {
        alreadyCommitted = true;
        inserted = await Measurement.count({ where: { importId }, transaction });
        return record;
      }
      const needing = record.report.confirmationCount ?? 0;
      if (needing > 0 && !options.confirm)
        throw ConflictError(
          `${needing} row${needing === 1 ? ' needs' : 's need'} a second look (a negative parallax, a likely sign error): read the warnings in the dry run and confirm them. Nothing was imported.`,
          'confirmation_needed',
        );

      const [{ duplicates }] = await sequelize.query<{ duplicates: string }>(
        `SELECT count(*) AS duplicates FROM catalogue_imports ci, ${RECORDSET}
         WHERE ci.id = $1 AND EXISTS (SELECT 1 FROM measurements m WHERE m.object_id = r."objectId" AND m.quantity = r.quantity
           AND coalesce(m.band, '') = coalesce(r.band, '') AND m.value = r.value AND m.source_id = r."sourceId"
           AND m.retired_at IS NULL AND m.status <> 'declined')`,
        { type: QueryTypes.SELECT, bind: [importId], transaction },
      );
      if (Number(duplicates) > 0) {
        throw ConflictError(
          `Since the dry run, ${duplicates} of these rows have been added by someone else. Check the file again before importing.`,
          'catalogue_changed',
        );
      }

      const [, insertedCount] = (await sequelize.query(
        `INSERT INTO measurements (id, object_id, quantity, band, value, uncertainty, uncertainty_minus, uncertainty_plus,
           entered_value, entered_unit, source_id, note, status, preferred, created_by_id, import_id, created_at, updated_at)
         SELECT gen_random_uuid(), r."objectId", r.quantity, r.band, r.value, r.uncertainty, r."uncertaintyMinus", r."uncertaintyPlus",
           r."enteredValue", coalesce(r."enteredUnit", ''), r."sourceId", coalesce(r.note, ''), 'accepted', false, $2, ci.id, now(), now()
         FROM catalogue_imports ci, ${RECORDSET} WHERE ci.id = $1`,
        { type: QueryTypes.INSERT, bind: [importId, actor.id], transaction },
      )) as [unknown, number];
      inserted = insertedCount;
      await sequelize.query(
        `INSERT INTO measurement_history (measurement_id, object_id, action, changed_by_id, reason, old_values, new_values, created_at)
         SELECT m.id, m.object_id, 'imported', $2, $3, NULL,
           jsonb_build_object('quantity', m.quantity, 'band', m.band, 'value', m.value, 'uncertainty', m.uncertainty,
             'uncertaintyMinus', m.uncertainty_minus, 'uncertaintyPlus', m.uncertainty_plus, 'enteredValue', m.entered_value,
             'enteredUnit', m.entered_unit, 'sourceId', m.source_id, 'preferred', m.preferred, 'status', m.status, 'note', m.note, 'retired', false),
           now()
         FROM measurements m WHERE m.import_id = $1`,
        { bind: [importId, actor.id, `Imported from ${record.fileName}`], transaction },
      );
      record.set({ status: 'committed', committedAt: new Date(), acceptedRows: null });
      await record.save({ transaction });
      await recordAudit(
        {
          actorId: actor.id,
          action: 'catalogue.import_committed',
          subjectType: 'catalogue_import',
          subjectId: record.id,
          data: { fileName: record.fileName, inserted },
          ip,
        },
        transaction,
      );
      return record;
    });
    // No events: imported measurements are new and never preferred, so nothing that listens
    // (statements use preferred values only) can depend on them yet, and 50,000 events would
    // flood the listeners' job queue. Choosing one as preferred later emits preferredChanged.
    return { record, inserted, alreadyCommitted };
  } catch (error) {
    if (error instanceof ForeignKeyConstraintError) {
      throw ConflictError(
        'An object or source named in this file was deleted after the dry run. Check the file again; nothing was imported.',
        'catalogue_changed',
      );
    }
    throw error;
  }
}
