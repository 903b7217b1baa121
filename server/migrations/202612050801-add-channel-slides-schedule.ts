import type { Migration } from './runner.ts';

// When a slide shows by the venue's clock (weekdays, local dates, clock or sunrise/sunset times); null = always.
export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.sequelize.query(`ALTER TABLE channel_slides ADD COLUMN schedule jsonb`);
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.sequelize.query(`ALTER TABLE channel_slides DROP COLUMN schedule`);
};
