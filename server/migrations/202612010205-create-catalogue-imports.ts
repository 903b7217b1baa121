import { DataTypes } from 'sequelize';
import type { Migration } from './runner.ts';

export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.createTable('catalogue_imports', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    created_by_id: { type: DataTypes.UUID, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    file_name: { type: DataTypes.STRING(255), allowNull: false },
    status: { type: DataTypes.STRING(12), allowNull: false, defaultValue: 'checked' },
    report: { type: DataTypes.JSONB, allowNull: false },
    // The accepted rows, already resolved to ids and canonical units, waiting for a commit.
    accepted_rows: { type: DataTypes.JSONB },
    committed_at: { type: DataTypes.DATE },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.sequelize.query(
    "ALTER TABLE catalogue_imports ADD CONSTRAINT catalogue_imports_status_check CHECK (status IN ('checked','committed'))",
  );
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.dropTable('catalogue_imports');
};
