import { DataTypes } from 'sequelize';
import type { Migration } from './runner.ts';

export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.createTable('channels', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    venue_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'venues', key: 'id' }, onDelete: 'CASCADE' },
    name: { type: DataTypes.STRING(80), allowNull: false },
    // Bumped by every edit (name, slides, order, screens): the feed cache compares it across instances.
    version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    created_by_id: { type: DataTypes.UUID, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.sequelize.query('CREATE UNIQUE INDEX channels_venue_lower_name ON channels (venue_id, lower(name))');
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.dropTable('channels');
};
