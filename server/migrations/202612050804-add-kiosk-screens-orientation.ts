import type { Migration } from './runner.ts';

// How the screen hangs: auto (the player's viewport decides), landscape or portrait.
export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.sequelize.query(
    `ALTER TABLE kiosk_screens ADD COLUMN orientation varchar(10) NOT NULL DEFAULT 'auto' CHECK (orientation IN ('auto', 'landscape', 'portrait'))`,
  );
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.sequelize.query(`ALTER TABLE kiosk_screens DROP COLUMN orientation`);
};
