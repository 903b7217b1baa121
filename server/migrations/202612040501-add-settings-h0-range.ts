import type { Migration } from './runner.ts';

// The organisation's H0 range with its source (the adopted model's own uncertainty); null means the
// default range, which spans the CMB and distance-ladder values.
export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.sequelize.query('ALTER TABLE organisation_settings ADD COLUMN h0_range jsonb');
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.sequelize.query('ALTER TABLE organisation_settings DROP COLUMN h0_range');
};
