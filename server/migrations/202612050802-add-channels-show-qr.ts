import type { Migration } from './runner.ts';

// Whether object slides carry a QR code to the page's public address (on unless the channel turns it off).
export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.sequelize.query(`ALTER TABLE channels ADD COLUMN show_qr boolean NOT NULL DEFAULT true`);
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.sequelize.query(`ALTER TABLE channels DROP COLUMN show_qr`);
};
