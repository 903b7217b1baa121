import { isAdmin } from './utils.ts';

/** Caught mail holds sign-in links: admins only. */
export const outboxPolicy = {
  read: isAdmin,
};
