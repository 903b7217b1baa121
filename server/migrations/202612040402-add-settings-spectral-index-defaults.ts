import type { Migration } from './runner.ts';

// The organisation's default spectral index per object kind ({ quasar: { value, sigma, source } }),
// used as a stated assumption when an object at a redshift that needs one has no measured index.
export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.sequelize.query(
    `ALTER TABLE organisation_settings ADD COLUMN spectral_index_defaults jsonb NOT NULL DEFAULT '{}'::jsonb`,
  );
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.sequelize.query('ALTER TABLE organisation_settings DROP COLUMN spectral_index_defaults');
};
