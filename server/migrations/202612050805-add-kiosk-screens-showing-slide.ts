import type { Migration } from './runner.ts';

// The slide a screen reported on its last heartbeat, and the orientation it lays slides out in.
export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.sequelize.query(
    `ALTER TABLE kiosk_screens ADD COLUMN showing_slide_id uuid, ADD COLUMN showing_slide_title varchar(200), ADD COLUMN reported_orientation varchar(10)`,
  );
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.sequelize.query(
    `ALTER TABLE kiosk_screens DROP COLUMN showing_slide_id, DROP COLUMN showing_slide_title, DROP COLUMN reported_orientation`,
  );
};
