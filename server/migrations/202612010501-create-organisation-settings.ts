import { DataTypes } from 'sequelize';
import type { Migration } from './runner.ts';

// One row: the organisation's defaults. `version` moves on every change so background work can tell
// whether what it computed still matches what is adopted.
export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.createTable('organisation_settings', {
    id: { type: DataTypes.INTEGER, primaryKey: true },
    cosmology_model: { type: DataTypes.JSONB, allowNull: false },
    default_band: { type: DataTypes.STRING(20), allowNull: false },
    default_locale: { type: DataTypes.STRING(10), allowNull: false },
    eye_safety_notice: { type: DataTypes.TEXT, allowNull: false },
    version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    updated_by_id: { type: DataTypes.UUID, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.sequelize.query('ALTER TABLE organisation_settings ADD CONSTRAINT organisation_settings_single CHECK (id = 1)');
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.dropTable('organisation_settings');
};
