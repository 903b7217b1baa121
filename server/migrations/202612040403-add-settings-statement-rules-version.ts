import type { Migration } from './runner.ts';

// Which release of the statement rules (template wording, kinds, required inputs) the stored
// statements were last computed by; a newer release recomputes them all at start-up, so none is
// left with old wording: each becomes current, changed (for a reviewer) or broken with its reason.
export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.sequelize.query('ALTER TABLE organisation_settings ADD COLUMN statement_rules_version integer NOT NULL DEFAULT 1');
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.sequelize.query('ALTER TABLE organisation_settings DROP COLUMN statement_rules_version');
};
