import { Op, type Transaction } from 'sequelize';
import { constellationAt } from '@shared/catalogue/constellations.ts';
import type { SkyObjectValues } from '@shared/schemas/sky-object.ts';
import { getSequelize } from '../../db.ts';
import { ConflictError } from '../../errors.ts';
import { Measurement, SkyObject, type User } from '../../models/index.ts';
import { recordAudit } from '../audit.ts';
import { catalogueEvents } from './events.ts';

const withConstellation = (values: SkyObjectValues) => ({
  ...values,
  constellation: values.raDeg !== null && values.decDeg !== null ? constellationAt(values.raDeg, values.decDeg) : null,
});

/**
 * Refuses a name another object has (ignoring case).
 * @throws HttpError 409 `name_taken`
 */
export async function assertNameFree(name: string, exceptId?: string, transaction?: Transaction): Promise<void> {
  const clash = await SkyObject.findOne({
    transaction,
    where: {
      [Op.and]: [
        getSequelize().where(getSequelize().fn('lower', getSequelize().col('name')), name.toLowerCase()),
        exceptId ? { id: { [Op.ne]: exceptId } } : {},
      ],
    },
  });
  if (clash) throw ConflictError(`There is already an object named "${clash.name}".`, 'name_taken');
}

/**
 * Adds an object; its constellation is computed from the position.
 * @param within the caller's transaction (accepting a proposal), or none for one of its own
 * @throws HttpError 409 when the name is taken (names are unique, ignoring case)
 */
export async function createSkyObject(
  values: SkyObjectValues,
  actor: User,
  ip?: string,
  within?: Transaction,
): Promise<SkyObject> {
  await assertNameFree(values.name, undefined, within);
  const run = <T>(work: (t: Transaction) => Promise<T>) => (within ? work(within) : getSequelize().transaction(work));
  return run(async (transaction) => {
    const object = await SkyObject.create({ ...withConstellation(values), createdById: actor.id }, { transaction });
    await recordAudit(
      {
        actorId: actor.id,
        action: 'catalogue.object_created',
        subjectType: 'sky_object',
        subjectId: object.id,
        data: { name: object.name },
        ip,
      },
      transaction,
    );
    return object;
  });
}

/**
 * Changes an object's name, designations, kind, position, notes or sentence names; the constellation
 * follows the position. A new name, kind or sentence name recomputes the object's statements.
 * @throws HttpError 409 when the new name is taken
 */
export async function updateSkyObject(object: SkyObject, values: SkyObjectValues, actor: User, ip?: string): Promise<SkyObject> {
  await assertNameFree(values.name, object.id);
  return getSequelize().transaction(async (transaction) => {
    const before = { name: object.name, kind: object.kind, raDeg: object.raDeg, decDeg: object.decDeg };
    const wordingBefore = JSON.stringify([object.name, object.kind, object.sentenceNames ?? {}]);
    object.set(withConstellation(values));
    if (JSON.stringify([object.name, object.kind, object.sentenceNames ?? {}]) !== wordingBefore)
      transaction.afterCommit(() => void catalogueEvents.emit('objectChanged', { skyObjectId: object.id }));
    await object.save({ transaction });
    await recordAudit(
      {
        actorId: actor.id,
        action: 'catalogue.object_updated',
        subjectType: 'sky_object',
        subjectId: object.id,
        data: { before, after: { name: object.name, kind: object.kind, raDeg: object.raDeg, decDeg: object.decDeg } },
        ip,
      },
      transaction,
    );
    return object;
  });
}

/**
 * Deletes an object entered by mistake. Objects with measurements are kept (their history must
 * stay readable); retire the measurements' use instead.
 * @throws HttpError 409 when the object has measurements
 */
export async function deleteSkyObject(object: SkyObject, actor: User, ip?: string): Promise<void> {
  await getSequelize().transaction(async (transaction) => {
    const count = await Measurement.count({ where: { skyObjectId: object.id }, transaction });
    if (count > 0)
      throw ConflictError(
        `${object.name} has ${count} measurement${count === 1 ? '' : 's'} with history, so it is kept. Only an object without measurements can be deleted.`,
        'has_measurements',
      );
    await object.destroy({ transaction });
    await recordAudit(
      {
        actorId: actor.id,
        action: 'catalogue.object_deleted',
        subjectType: 'sky_object',
        subjectId: object.id,
        data: { name: object.name },
        ip,
      },
      transaction,
    );
  });
}
