import { DataTypes } from 'sequelize';
import type { Migration } from './runner.ts';

export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.createTable('audit_events', {
    id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
    actor_id: { type: DataTypes.UUID, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    action: { type: DataTypes.STRING(60), allowNull: false },
    subject_type: { type: DataTypes.STRING(40) },
    subject_id: { type: DataTypes.STRING(64) },
    data: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
    ip: { type: DataTypes.STRING(64) },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('audit_events', ['subject_type', 'subject_id']);
  await qi.addIndex('audit_events', ['created_at']);
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.dropTable('audit_events');
};
