import { QueryTypes, type Transaction } from 'sequelize';
import type { SourceValues } from '@shared/schemas/source.ts';
import { getSequelize } from '../../db.ts';
import { ConflictError } from '../../errors.ts';
import { Source, type User } from '../../models/index.ts';
import { recordAudit } from '../audit.ts';
import { catalogueEvents } from './events.ts';

const sql = () => getSequelize();

/**
 * Citation, bibcode and DOI each identify one source (CSV rows name sources by them).
 * @throws HttpError 409 `source_exists`
 */
export async function assertUnique(values: SourceValues, exceptId?: string, transaction?: Transaction): Promise<void> {
  const [clash] = await sql().query<{ citation: string; bibcode: string | null }>(
    `SELECT citation, bibcode FROM sources
     WHERE (lower(citation) = lower($1) OR bibcode = $2 OR lower(doi) = lower($3)) AND ($4::uuid IS NULL OR id <> $4) LIMIT 1`,
    { type: QueryTypes.SELECT, bind: [values.citation, values.bibcode, values.doi, exceptId ?? null], transaction },
  );
  if (!clash) return;
  const what =
    clash.citation.toLowerCase() === values.citation.toLowerCase()
      ? 'citation'
      : clash.bibcode === values.bibcode
        ? 'bibcode'
        : 'DOI';
  throw ConflictError(`A source with this ${what} already exists: "${clash.citation}". Use that one.`, 'source_exists');
}

/**
 * Adds a source.
 * @param within the caller's transaction (accepting a proposal), or none for one of its own
 * @throws HttpError 409 when its citation, bibcode or DOI is already used
 */
export async function createSource(values: SourceValues, actor: User, ip?: string, within?: Transaction): Promise<Source> {
  await assertUnique(values, undefined, within);
  const run = <T>(work: (t: Transaction) => Promise<T>) => (within ? work(within) : sql().transaction(work));
  return run(async (transaction) => {
    const source = await Source.create({ ...values, createdById: actor.id }, { transaction });
    await recordAudit(
      {
        actorId: actor.id,
        action: 'catalogue.source_created',
        subjectType: 'source',
        subjectId: source.id,
        data: { citation: source.citation },
        ip,
      },
      transaction,
    );
    return source;
  });
}

/**
 * Corrects a source; statements citing it are told through `sourceChanged`.
 * @throws HttpError 409 when its citation, bibcode or DOI clashes with another source
 */
export async function updateSource(source: Source, values: SourceValues, actor: User, ip?: string): Promise<Source> {
  await assertUnique(values, source.id);
  return sql().transaction(async (transaction) => {
    const before = { citation: source.citation, bibcode: source.bibcode, doi: source.doi, url: source.url };
    source.set(values);
    await source.save({ transaction });
    await recordAudit(
      {
        actorId: actor.id,
        action: 'catalogue.source_updated',
        subjectType: 'source',
        subjectId: source.id,
        data: { before },
        ip,
      },
      transaction,
    );
    transaction.afterCommit(() => void catalogueEvents.emit('sourceChanged', { sourceId: source.id }));
    return source;
  });
}
