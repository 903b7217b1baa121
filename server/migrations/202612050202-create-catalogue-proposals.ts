import { DataTypes } from 'sequelize';
import type { Migration } from './runner.ts';

// Objects and sources proposed by writers and editors, waiting for a reviewer. The proposed fields
// stay here as entered (parsed) until a reviewer accepts, when the object or source is created and
// record_id names it; nothing unreviewed reaches the catalogue's own tables.
export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.createTable('catalogue_proposals', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    kind: { type: DataTypes.STRING(8), allowNull: false },
    status: { type: DataTypes.STRING(12), allowNull: false, defaultValue: 'proposed' },
    // The object's name or the source's citation: what lists show and what duplicates are found by.
    title: { type: DataTypes.STRING(500), allowNull: false },
    proposed_values: { type: DataTypes.JSONB, allowNull: false },
    source_id: { type: DataTypes.UUID, references: { model: 'sources', key: 'id' }, onDelete: 'RESTRICT' },
    created_by_id: { type: DataTypes.UUID, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    reviewed_by_id: { type: DataTypes.UUID, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    reviewed_at: { type: DataTypes.DATE },
    review_reason: { type: DataTypes.TEXT },
    record_id: { type: DataTypes.UUID },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  const q = (sql: string) => qi.sequelize.query(sql);
  await q("ALTER TABLE catalogue_proposals ADD CONSTRAINT catalogue_proposals_kind_check CHECK (kind IN ('object','source'))");
  await q(
    "ALTER TABLE catalogue_proposals ADD CONSTRAINT catalogue_proposals_status_check CHECK (status IN ('proposed','accepted','declined'))",
  );
  // Every object proposal cites a source.
  await q(
    "ALTER TABLE catalogue_proposals ADD CONSTRAINT catalogue_proposals_object_source CHECK (kind <> 'object' OR source_id IS NOT NULL)",
  );
  // One waiting proposal per name: a second writer proposing the same object is told it is waiting.
  await q(
    "CREATE UNIQUE INDEX catalogue_proposals_waiting_title ON catalogue_proposals (kind, lower(title)) WHERE status = 'proposed'",
  );
  await q('CREATE INDEX catalogue_proposals_status ON catalogue_proposals (status, created_at)');
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.dropTable('catalogue_proposals');
};
