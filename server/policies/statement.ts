import type { Statement } from '../models/index.ts';
import { anyStaff, hasRole, type Rule } from './utils.ts';

/** Everyone reads and inserts statements; reviewers and admins recompute them and accept new wording. */
export const statementPolicy = {
  read: anyStaff,
  create: anyStaff,
  recompute: hasRole('reviewer', 'admin'),
  accept: ((user, statement) => hasRole('reviewer', 'admin')(user) && !!statement) as Rule<Statement>,
};
