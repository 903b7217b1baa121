import type { Migration } from './runner.ts';

// Failed sign-ins counted per address typed (known account or not), so the count can be taken in
// one atomic statement before any password is compared, and unknown addresses are locked exactly
// as known ones are (nothing tells them apart).
export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.sequelize.query(`
    CREATE TABLE sign_in_attempts (
      email varchar(254) PRIMARY KEY,
      failed integer NOT NULL DEFAULT 0,
      throttled_until timestamptz,
      updated_at timestamptz NOT NULL DEFAULT now()
    )`);
  await qi.sequelize.query('CREATE INDEX sign_in_attempts_updated_at ON sign_in_attempts (updated_at)');
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.sequelize.query('DROP TABLE sign_in_attempts');
};
