import type { Migration } from './runner.ts';

// The languages a channel plays, in order; screens without a language of their own alternate between
// them. Empty: every page slide in the language of the page chosen for it (as before).
export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.sequelize.query("ALTER TABLE channels ADD COLUMN languages varchar(10)[] NOT NULL DEFAULT '{}'");
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.sequelize.query('ALTER TABLE channels DROP COLUMN languages');
};
