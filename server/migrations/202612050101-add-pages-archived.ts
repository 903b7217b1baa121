import type { Migration } from './runner.ts';

// Archiving hides a page from the desk's lists and every public output without losing it; who archived
// it is kept beside the time so the desk can say so (the reason is in the audit log).
export const up: Migration['up'] = async ({ context: qi }) => {
  const q = (sql: string) => qi.sequelize.query(sql);
  await q('ALTER TABLE pages ADD COLUMN archived_at timestamptz');
  await q('ALTER TABLE pages ADD COLUMN archived_by_id uuid REFERENCES users (id) ON DELETE SET NULL');
  // An archived page is never live.
  await q('ALTER TABLE pages ADD CONSTRAINT pages_archived_not_live CHECK (archived_at IS NULL OR published_snapshot IS NULL)');
  await q('CREATE INDEX pages_archived ON pages (archived_at) WHERE archived_at IS NOT NULL');
};

export const down: Migration['down'] = async ({ context: qi }) => {
  const q = (sql: string) => qi.sequelize.query(sql);
  await q('ALTER TABLE pages DROP CONSTRAINT pages_archived_not_live');
  await q('ALTER TABLE pages DROP COLUMN archived_by_id');
  await q('ALTER TABLE pages DROP COLUMN archived_at');
};
