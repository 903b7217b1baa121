import type { Migration } from './runner.ts';

// Catalogue search matches anywhere in a name ("Andromeda" finds "Andromeda Galaxy"); a trigram
// index keeps that fast at 100,000 objects.
export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.sequelize.query('CREATE EXTENSION IF NOT EXISTS pg_trgm');
  await qi.sequelize.query('CREATE INDEX sky_objects_name_trgm ON sky_objects USING gin (lower(name) gin_trgm_ops)');
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.sequelize.query('DROP INDEX IF EXISTS sky_objects_name_trgm');
};
