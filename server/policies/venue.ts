import type { Venue } from '../models/index.ts';
import { anyStaff, hasRole, isAdmin, type Rule } from './utils.ts';

const adminOnRecord = ((user, venue) => isAdmin(user) && !!venue) as Rule<Venue>;
const readerOnRecord = ((user, venue) => hasRole('admin', 'editor')(user) && !!venue) as Rule<Venue>;

/**
 * Admins manage venues and their kiosk screens; editors read them; every member of staff may read a
 * venue's sky and choose among venues by name (e.g. the venue a statement is for).
 */
export const venuePolicy = {
  list: hasRole('admin', 'editor'),
  choose: anyStaff,
  create: isAdmin,
  read: readerOnRecord,
  update: adminOnRecord,
  delete: adminOnRecord,
  manageScreens: adminOnRecord,
  readSky: ((user, venue) => anyStaff(user) && !!venue) as Rule<Venue>,
};
