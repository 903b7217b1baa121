import type { Sequelize } from 'sequelize';
import { getSequelize } from '../db.ts';
import { AuditEvent } from './audit-event.ts';
import { AuthToken } from './auth-token.ts';
import { OutboxMessage } from './outbox-message.ts';
import { User } from './user.ts';
import { Venue } from './venue.ts';

export { AuditEvent, AuthToken, OutboxMessage, User, Venue };
export type { TokenPurpose } from './auth-token.ts';

let initialised: Sequelize | undefined;

/** Binds every model to the Sequelize instance and sets up associations; safe to call twice. */
export function initModels(sequelize: Sequelize = getSequelize()): Sequelize {
  if (initialised === sequelize) return sequelize;
  for (const model of [User, AuthToken, AuditEvent, OutboxMessage, Venue]) model.initModel(sequelize);

  // associations
  AuthToken.belongsTo(User, { foreignKey: 'userId' });
  AuditEvent.belongsTo(User, { foreignKey: 'actorId', as: 'actor' });

  initialised = sequelize;
  return sequelize;
}
