import type { TimelineEntry } from '../models/index.ts';
import { anyStaff, isAdmin, type Rule } from './utils.ts';

const adminOnRecord = ((user, entry) => isAdmin(user) && !!entry) as Rule<TimelineEntry>;

/**
 * Earth's timeline is the organisation's reference data: every member of staff reads it (writers
 * see what a statement may compare with); only admins add, change or remove entries.
 */
export const timelinePolicy = {
  list: anyStaff,
  create: isAdmin,
  update: adminOnRecord,
  delete: adminOnRecord,
};
