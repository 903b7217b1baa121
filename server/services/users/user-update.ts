import type { UserUpdateInput } from '@shared/schemas/user.ts';
import { getSequelize } from '../../db.ts';
import { AuthorizationError } from '../../errors.ts';
import type { User } from '../../models/index.ts';
import { recordAudit } from '../audit.ts';
import { endUserSessions } from './user-sessions.ts';

/**
 * Changes a user's name, role or active flag. Deactivation ends their sessions at once; an admin
 * cannot change their own role or deactivate themselves.
 */
export async function updateUser(target: User, input: UserUpdateInput, actor: User, ip?: string): Promise<User> {
  const touchesAccess = input.role !== undefined || input.active !== undefined;
  if (touchesAccess && target.id === actor.id && (input.role !== actor.role || input.active === false)) {
    throw AuthorizationError('You cannot change your own role or deactivate yourself; ask another admin.');
  }
  return getSequelize().transaction(async (transaction) => {
    const before = { name: target.name, role: target.role, active: target.active };
    target.set(input);
    await target.save({ transaction });
    if (input.active === false) await endUserSessions(target.id, undefined, transaction);
    await recordAudit(
      {
        actorId: actor.id,
        action: 'user.updated',
        subjectType: 'user',
        subjectId: target.id,
        data: { before, after: input },
        ip,
      },
      transaction,
    );
    return target;
  });
}
