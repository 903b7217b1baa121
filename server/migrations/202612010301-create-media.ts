import { DataTypes } from 'sequelize';
import type { Migration } from './runner.ts';

export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.createTable('media', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    // The original's SHA-256 names its private file; one row per distinct file.
    sha256: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    original_key: { type: DataTypes.STRING(200), allowNull: false },
    file_name: { type: DataTypes.STRING(255), allowNull: false },
    format: { type: DataTypes.STRING(16), allowNull: false },
    bytes: { type: DataTypes.BIGINT, allowNull: false },
    width: { type: DataTypes.INTEGER, allowNull: false },
    height: { type: DataTypes.INTEGER, allowNull: false },
    alt_text: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    credit: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
    licence_id: { type: DataTypes.STRING(40) },
    source_url: { type: DataTypes.STRING(2000), allowNull: false, defaultValue: '' },
    focal_x: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0.5 },
    focal_y: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0.5 },
    renditions_status: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'pending' },
    renditions_error: { type: DataTypes.STRING(500) },
    uploaded_by_id: { type: DataTypes.UUID, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  const q = (sql: string) => qi.sequelize.query(sql);
  await q('ALTER TABLE media ADD CONSTRAINT media_focal_range CHECK (focal_x BETWEEN 0 AND 1 AND focal_y BETWEEN 0 AND 1)');
  await q(
    "ALTER TABLE media ADD CONSTRAINT media_renditions_status_check CHECK (renditions_status IN ('pending','processing','ready','failed'))",
  );
  await q('ALTER TABLE media ADD CONSTRAINT media_size_positive CHECK (bytes > 0 AND width > 0 AND height > 0)');
  await q('CREATE INDEX media_created_at ON media (created_at DESC)');
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.dropTable('media');
};
