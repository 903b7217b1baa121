import { QueryTypes, type Transaction } from 'sequelize';
import { getSequelize } from '../../db.ts';

/**
 * Ends every server-side session of a user (sign-out everywhere, deactivation, password change).
 * @param exceptSid a session to keep, e.g. the one that just changed the password
 */
export async function endUserSessions(userId: string, exceptSid?: string, transaction?: Transaction): Promise<void> {
  await getSequelize().query(
    `DELETE FROM user_sessions WHERE sess->>'userId' = :userId ${exceptSid ? 'AND sid <> :exceptSid' : ''}`,
    { replacements: { userId, exceptSid }, type: QueryTypes.DELETE, transaction },
  );
}
