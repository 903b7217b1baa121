import { DataTypes } from 'sequelize';
import type { Migration } from './runner.ts';

export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.createTable('measurement_history', {
    id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
    measurement_id: {
      type: DataTypes.UUID,
      allowNull: false,
      references: { model: 'measurements', key: 'id' },
      onDelete: 'RESTRICT',
    },
    object_id: { type: DataTypes.UUID, allowNull: false },
    action: { type: DataTypes.STRING(24), allowNull: false },
    changed_by_id: { type: DataTypes.UUID, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    reason: { type: DataTypes.TEXT },
    old_values: { type: DataTypes.JSONB },
    new_values: { type: DataTypes.JSONB },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('measurement_history', ['object_id', 'created_at']);
  await qi.addIndex('measurement_history', ['measurement_id']);
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.dropTable('measurement_history');
};
