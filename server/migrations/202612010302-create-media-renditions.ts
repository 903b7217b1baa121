import { DataTypes } from 'sequelize';
import type { Migration } from './runner.ts';

export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.createTable('media_renditions', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    media_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'media', key: 'id' }, onDelete: 'CASCADE' },
    name: { type: DataTypes.STRING(20), allowNull: false },
    format: { type: DataTypes.STRING(8), allowNull: false },
    width: { type: DataTypes.INTEGER, allowNull: false },
    height: { type: DataTypes.INTEGER, allowNull: false },
    bytes: { type: DataTypes.INTEGER, allowNull: false },
    // Content-addressed: the SHA-256 of the file's bytes, so a name never points at other bytes.
    storage_key: { type: DataTypes.STRING(200), allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addConstraint('media_renditions', {
    type: 'unique',
    fields: ['media_id', 'name', 'format'],
    name: 'media_renditions_one_per_kind',
  });
  await qi.addIndex('media_renditions', ['storage_key'], { name: 'media_renditions_storage_key' });
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.dropTable('media_renditions');
};
