import type { Role } from '@shared/roles.ts';
import type { User } from '../models/index.ts';

/** A rule: may this user act (optionally on this record)? */
export type Rule<T = unknown> = (user: User, record?: T) => boolean;

export const hasRole =
  (...roles: Role[]): Rule =>
  (user) =>
    roles.includes(user.role);

export const isAdmin: Rule = hasRole('admin');
export const anyStaff: Rule = (user) => user.active;
