import { DataTypes } from 'sequelize';
import type { Migration } from './runner.ts';

export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.createTable('pages', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    title: { type: DataTypes.STRING(200), allowNull: false },
    sky_object_id: {
      type: DataTypes.UUID,
      allowNull: false,
      references: { model: 'sky_objects', key: 'id' },
      onDelete: 'RESTRICT',
    },
    locale: { type: DataTypes.STRING(10), allowNull: false },
    status: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'draft' },
    writer_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'RESTRICT' },
    // Optimistic locking: every save sends the version it started from.
    version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    current_revision_id: { type: DataTypes.UUID },
    approved_revision_id: { type: DataTypes.UUID },
    published_revision_id: { type: DataTypes.UUID },
    // What was signed off and what is live: rendered HTML and the statement wording as signed.
    approved_snapshot: { type: DataTypes.JSONB },
    published_snapshot: { type: DataTypes.JSONB },
    scheduled_publish_at: { type: DataTypes.DATE },
    submitted_at: { type: DataTypes.DATE },
    last_reviewer_id: { type: DataTypes.UUID, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    recheck_statement_ids: { type: DataTypes.ARRAY(DataTypes.UUID), allowNull: false, defaultValue: [] },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  const q = (sql: string) => qi.sequelize.query(sql);
  await q(
    "ALTER TABLE pages ADD CONSTRAINT pages_status_check CHECK (status IN ('draft','in_review','approved','published','needs_recheck'))",
  );
  await q("ALTER TABLE pages ADD CONSTRAINT pages_locale_check CHECK (locale IN ('en-GB','en-US','fr-FR'))");
  // A published page always has a live version to serve.
  await q(
    "ALTER TABLE pages ADD CONSTRAINT pages_published_has_snapshot CHECK (status <> 'published' OR published_snapshot IS NOT NULL)",
  );
  await q('CREATE INDEX pages_status ON pages (status, updated_at DESC)');
  await q('CREATE INDEX pages_writer ON pages (writer_id)');
  await q('CREATE INDEX pages_object ON pages (sky_object_id)');
  await q('CREATE INDEX pages_scheduled ON pages (scheduled_publish_at) WHERE scheduled_publish_at IS NOT NULL');
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.dropTable('pages');
};
