import type { SessionUser, UserDto } from '@shared/schemas/user.ts';
import type { User } from '../models/index.ts';
import { can } from '../policies/index.ts';

/** The API contract for a user, with what the viewer may do to them. */
export function presentUser(user: User, viewer: User): UserDto {
  return {
    id: user.id,
    email: user.email,
    name: user.name,
    role: user.role,
    active: user.active,
    invitationPending: !user.passwordHash,
    lastSignInAt: user.lastSignInAt?.toISOString() ?? null,
    createdAt: user.createdAt.toISOString(),
    can: { update: can(viewer, 'user', 'update', user), deactivate: can(viewer, 'user', 'changeOwnAccess', user) },
  };
}

/** The signed-in user, as the client keeps it. */
export function presentSessionUser(user: User): SessionUser {
  return { id: user.id, email: user.email, name: user.name, role: user.role };
}
