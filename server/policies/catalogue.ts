import type { CatalogueProposal, Measurement } from '../models/index.ts';
import { anyStaff, hasRole, type Rule } from './utils.ts';

/** Reviewers keep the catalogue's data; admins may step in. */
const keeper = hasRole('reviewer', 'admin');
/** Writers and editors read the catalogue and may propose measurements for a reviewer to check. */
const proposer = hasRole('writer', 'editor');

const current = (m?: Measurement) => !!m && !m.retiredAt;

/**
 * Who may do what in the catalogue. Reviewers and admins edit objects, measurements and sources;
 * everyone on the staff reads and exports; writers and editors propose.
 */
export const cataloguePolicy = {
  read: anyStaff,
  export: anyStaff,
  editObject: keeper,
  editSource: keeper,
  import: keeper,
  addMeasurement: keeper,
  /** Role-level: routes check this, services answer 409 when the measurement's state forbids the change. */
  keepMeasurements: keeper,
  proposeMeasurement: proposer,
  updateMeasurement: ((user, m) => keeper(user) && current(m) && m!.status === 'accepted') as Rule<Measurement>,
  preferMeasurement: ((user, m) => keeper(user) && current(m) && m!.status === 'accepted') as Rule<Measurement>,
  reviewMeasurement: ((user, m) => keeper(user) && current(m) && m!.status === 'proposed') as Rule<Measurement>,
  retireMeasurement: ((user, m) => keeper(user) && current(m)) as Rule<Measurement>,
  /** Writers and editors propose objects and sources; reviewers and admins add them directly. */
  proposeEntry: proposer,
  /** A keeper reviews proposals, never their own (an admin who proposed nothing may review any). */
  reviewProposal: ((user, p) => keeper(user) && !!p && p.createdById !== user.id) as Rule<CatalogueProposal>,
};
