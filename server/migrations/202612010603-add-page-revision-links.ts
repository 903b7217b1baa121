import type { Migration } from './runner.ts';

// pages and page_revisions point at each other; the links from pages are added once both exist.
export const up: Migration['up'] = async ({ context: qi }) => {
  const q = (sql: string) => qi.sequelize.query(sql);
  for (const column of ['current_revision_id', 'approved_revision_id', 'published_revision_id']) {
    await q(
      `ALTER TABLE pages ADD CONSTRAINT pages_${column}_fkey FOREIGN KEY (${column}) REFERENCES page_revisions (id) ON DELETE SET NULL DEFERRABLE INITIALLY DEFERRED`,
    );
  }
};

export const down: Migration['down'] = async ({ context: qi }) => {
  const q = (sql: string) => qi.sequelize.query(sql);
  for (const column of ['current_revision_id', 'approved_revision_id', 'published_revision_id'])
    await q(`ALTER TABLE pages DROP CONSTRAINT pages_${column}_fkey`);
};
