import type { Migration } from './runner.ts';

// A screen may play one language only (null: it alternates between the languages its channel lists).
export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.sequelize.query('ALTER TABLE kiosk_screens ADD COLUMN language varchar(10)');
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.sequelize.query('ALTER TABLE kiosk_screens DROP COLUMN language');
};
