import { anyStaff, isAdmin } from './utils.ts';

/** Everyone sees which cosmology and band are adopted; only admins change them. */
export const settingsPolicy = {
  read: anyStaff,
  update: isAdmin,
};
