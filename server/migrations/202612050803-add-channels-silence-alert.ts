import type { Migration } from './runner.ts';

// After how many minutes without a heartbeat a screen of the channel is reported to admins by e-mail; null = never.
export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.sequelize.query(
    `ALTER TABLE channels ADD COLUMN silence_alert_minutes integer CHECK (silence_alert_minutes BETWEEN 5 AND 10080)`,
  );
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.sequelize.query(`ALTER TABLE channels DROP COLUMN silence_alert_minutes`);
};
