import type { Migration } from './runner.ts';

// A page belongs to at most one version group, and a group holds at most one version per locale
// (the unique index is what answers a second French version with a 409, even for two requests at once).
export const up: Migration['up'] = async ({ context: qi }) => {
  const q = (sql: string) => qi.sequelize.query(sql);
  await q('ALTER TABLE pages ADD COLUMN version_group_id uuid REFERENCES page_version_groups (id) ON DELETE SET NULL');
  await q(
    'CREATE UNIQUE INDEX pages_version_group_locale ON pages (version_group_id, locale) WHERE version_group_id IS NOT NULL',
  );
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.sequelize.query('ALTER TABLE pages DROP COLUMN version_group_id');
};
