import { getSequelize } from '../../db.ts';
import { ConflictError } from '../../errors.ts';
import type { Statement, User } from '../../models/index.ts';
import { recordAudit } from '../audit.ts';
import { statementEvents } from './events.ts';

/**
 * A reviewer accepts a changed statement's new wording: it becomes the accepted text and the
 * statement is current again (for one that follows tonight, its method becomes the accepted one). A broken statement cannot be accepted; its inputs need fixing.
 * @throws HttpError 409 when the statement is not in the changed state
 */
export async function acceptStatementWording(statement: Statement, reviewer: User): Promise<Statement> {
  if (statement.status !== 'changed') {
    throw ConflictError(
      statement.status === 'broken'
        ? `This statement cannot be accepted while it is broken: ${statement.statusReason ?? 'its inputs are missing'}.`
        : 'This statement already shows its accepted wording.',
      'not_changed',
    );
  }
  await getSequelize().transaction(async (transaction) => {
    const before = statement.acknowledgedTexts;
    // For a statement that follows tonight the reviewer accepts its method too: later nights follow it.
    const night = statement.night ? { ...statement.night, acceptedMethod: statement.night.method } : null;
    statement.set({
      acknowledgedTexts: statement.texts,
      acknowledgedById: reviewer.id,
      acknowledgedAt: new Date(),
      status: 'current',
      statusReason: null,
      night,
    });
    await statement.save({ transaction });
    await recordAudit(
      {
        actorId: reviewer.id,
        action: 'statement.wording_accepted',
        subjectType: 'statement',
        subjectId: statement.id,
        data: { before, after: statement.texts },
      },
      transaction,
    );
  });
  statementEvents.emit('accepted', { statementIds: [statement.id] });
  return statement;
}
