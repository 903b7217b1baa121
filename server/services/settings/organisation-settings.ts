import type { Transaction } from 'sequelize';
import type { CalcModel } from '@shared/schemas/calc.ts';
import { OrganisationSettings } from '../../models/index.ts';

/** What a new organisation starts with; admins change all of it. */
export const DEFAULT_SETTINGS = {
  cosmologyModel: { preset: 'planck18' } as CalcModel,
  defaultBand: 'V',
  defaultLocale: 'en-GB',
  eyeSafetyNotice:
    'Never look at the Sun directly, or through binoculars, a telescope or a camera, without a certified solar filter made for that instrument. ' +
    'Eclipse glasses and hand-held viewers must meet ISO 12312-2. Sunglasses are not safe. Follow the instructions of our safety staff at every solar event.',
};

/**
 * The organisation's settings, created with the defaults on first use.
 * @param transaction read inside a transaction, optionally locking the row against a concurrent change
 */
export async function getSettings(transaction?: Transaction, lock?: 'update' | 'share'): Promise<OrganisationSettings> {
  const found = await OrganisationSettings.findByPk(1, {
    transaction,
    lock: lock === 'update' ? transaction?.LOCK.UPDATE : lock === 'share' ? transaction?.LOCK.SHARE : undefined,
  });
  if (found) return found;
  const [created] = await OrganisationSettings.findOrCreate({
    where: { id: 1 },
    defaults: { id: 1, ...DEFAULT_SETTINGS },
    transaction,
  });
  return created;
}
