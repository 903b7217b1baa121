import { DataTypes } from 'sequelize';
import type { Migration } from './runner.ts';

/** A reviewer's ruling that a flagged number is not a measured quantity, per page and normalised text. */
export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.createTable('page_number_flags', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    page_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'pages', key: 'id' }, onDelete: 'CASCADE' },
    normalised_text: { type: DataTypes.STRING(200), allowNull: false },
    text: { type: DataTypes.STRING(200), allowNull: false },
    reason: { type: DataTypes.TEXT, allowNull: false },
    resolved_by_id: { type: DataTypes.UUID, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.sequelize.query('CREATE UNIQUE INDEX page_number_flags_text ON page_number_flags (page_id, normalised_text)');
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.dropTable('page_number_flags');
};
