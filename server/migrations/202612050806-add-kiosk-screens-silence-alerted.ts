import type { Migration } from './runner.ts';

// When admins were told the screen had gone silent; cleared by its next heartbeat, so one outage sends one e-mail.
export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.sequelize.query(`ALTER TABLE kiosk_screens ADD COLUMN silence_alerted_at timestamptz`);
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.sequelize.query(`ALTER TABLE kiosk_screens DROP COLUMN silence_alerted_at`);
};
