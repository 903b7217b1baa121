import type { Migration } from './runner.ts';

// The table connect-pg-simple expects, plus an index to end one user's sessions at once.
export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.sequelize.query(`
    CREATE TABLE user_sessions (
      sid varchar NOT NULL PRIMARY KEY,
      sess json NOT NULL,
      expire timestamp(6) NOT NULL
    );
    CREATE INDEX user_sessions_expire ON user_sessions (expire);
    CREATE INDEX user_sessions_user ON user_sessions ((sess->>'userId'));
  `);
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.dropTable('user_sessions');
};
