import type { Migration } from './runner.ts';

// When a page first went live. A page ever published may only be archived, never deleted (visitors,
// kiosks and the public API have seen it), even after it was unpublished; filled in from the audit log
// and the live version for pages published before the column existed.
export const up: Migration['up'] = async ({ context: qi }) => {
  const q = (sql: string) => qi.sequelize.query(sql);
  await q('ALTER TABLE pages ADD COLUMN first_published_at timestamptz');
  await q(`UPDATE pages p SET first_published_at = (
      SELECT min(a.created_at) FROM audit_events a
       WHERE a.subject_type = 'page' AND a.subject_id = p.id::text AND a.action = 'page.published')`);
  await q(`UPDATE pages SET first_published_at = coalesce((published_snapshot->>'publishedAt')::timestamptz, updated_at)
      WHERE first_published_at IS NULL AND published_snapshot IS NOT NULL`);
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.sequelize.query('ALTER TABLE pages DROP COLUMN first_published_at');
};
