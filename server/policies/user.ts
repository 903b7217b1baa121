import type { User } from '../models/index.ts';
import { isAdmin, type Rule } from './utils.ts';

/** Only admins manage users; nobody deactivates or demotes themselves (a venue must keep an admin). */
export const userPolicy = {
  list: isAdmin,
  invite: isAdmin,
  update: ((actor, target) => isAdmin(actor) && !!target) as Rule<User>,
  changeOwnAccess: ((actor, target) => isAdmin(actor) && !!target && target.id !== actor.id) as Rule<User>,
};
