import type { VenueCreateValues, VenueUpdateValues } from '@shared/schemas/venue.ts';
import { getSequelize } from '../../db.ts';
import { ConflictError } from '../../errors.ts';
import { enqueueVenueSky } from './sky-snapshot-jobs.ts';
import { SkyObject, SkySnapshot, Statement, Venue, type User } from '../../models/index.ts';
import { recordAudit } from '../audit.ts';

const SKY_FIELDS = ['latitude', 'longitude', 'elevationM', 'timeZone'] as const;

async function assertNameFree(name: string, exceptId?: string) {
  const clash = await Venue.findOne({
    where: getSequelize().where(getSequelize().fn('lower', getSequelize().col('name')), name.toLowerCase()),
  });
  if (clash && clash.id !== exceptId) throw ConflictError(`There is already a venue called "${clash.name}".`, 'venue_name_taken');
}

/**
 * Creates a venue and computes its sky for tonight and tomorrow.
 * @throws HttpError 409 `venue_name_taken`
 */
export async function createVenue(values: VenueCreateValues, actor: User, ip?: string): Promise<Venue> {
  await assertNameFree(values.name);
  const venue = await getSequelize().transaction(async (transaction) => {
    const created = await Venue.create(values, { transaction });
    await recordAudit(
      { actorId: actor.id, action: 'venue.created', subjectType: 'venue', subjectId: created.id, data: { ...values }, ip },
      transaction,
    );
    return created;
  });
  await enqueueVenueSky({ venueId: venue.id });
  return venue;
}

/**
 * Changes a venue. When its position, elevation or time zone changes, its stored skies are removed
 * in the same transaction (never served stale) and recomputed by a job.
 * @throws HttpError 409 `venue_name_taken`
 */
export async function updateVenue(venue: Venue, values: VenueUpdateValues, actor: User, ip?: string): Promise<Venue> {
  if (values.name !== undefined) await assertNameFree(values.name, venue.id);
  const before = {
    name: venue.name,
    latitude: venue.latitude,
    longitude: venue.longitude,
    elevationM: venue.elevationM,
    timeZone: venue.timeZone,
  };
  const skyChanged = SKY_FIELDS.some((f) => values[f] !== undefined && values[f] !== venue[f]);
  await getSequelize().transaction(async (transaction) => {
    venue.set(Object.fromEntries(Object.entries(values).filter(([, v]) => v !== undefined)));
    await venue.save({ transaction });
    if (skyChanged) await SkySnapshot.destroy({ where: { venueId: venue.id }, transaction });
    await recordAudit(
      {
        actorId: actor.id,
        action: 'venue.updated',
        subjectType: 'venue',
        subjectId: venue.id,
        data: { before, after: values },
        ip,
      },
      transaction,
    );
  });
  if (skyChanged) await enqueueVenueSky({ venueId: venue.id });
  return venue;
}

/**
 * Deletes a venue with its screens (their tokens stop working) and stored skies. A venue that
 * checked statements are about is kept: pages show those statements, and each needs its venue's
 * night (the foreign key restricts too, should a statement be made meanwhile).
 * @throws HttpError 409 `venue_in_use`
 */
export async function deleteVenue(venue: Venue, actor: User, ip?: string): Promise<void> {
  const statements = await Statement.findAll({ attributes: ['skyObjectId'], where: { venueId: venue.id }, limit: 3 });
  if (statements.length > 0) {
    const count = await Statement.count({ where: { venueId: venue.id } });
    const names = (
      await SkyObject.findAll({ attributes: ['name'], where: { id: [...new Set(statements.map((s) => s.skyObjectId))] } })
    ).map((o) => o.name);
    throw ConflictError(
      `${venue.name} cannot be deleted: ${count === 1 ? 'a checked statement is' : `${count} checked statements are`} about its sky tonight (${names.join(', ')}${count > names.length ? ', …' : ''}), and pages may show ${count === 1 ? 'it' : 'them'}. Rename the venue or change its position instead.`,
      'venue_in_use',
    );
  }
  await getSequelize().transaction(async (transaction) => {
    await recordAudit(
      { actorId: actor.id, action: 'venue.deleted', subjectType: 'venue', subjectId: venue.id, data: { name: venue.name }, ip },
      transaction,
    );
    await venue.destroy({ transaction });
  });
}
