import { DataTypes } from 'sequelize';
import type { Migration } from './runner.ts';

export const up: Migration['up'] = async ({ context: qi }) => {
  // The screen is the key: a screen shows one channel at a time.
  await qi.createTable('channel_screens', {
    screen_id: { type: DataTypes.UUID, primaryKey: true, references: { model: 'kiosk_screens', key: 'id' }, onDelete: 'CASCADE' },
    channel_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'channels', key: 'id' }, onDelete: 'CASCADE' },
    assigned_by_id: { type: DataTypes.UUID, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    assigned_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('channel_screens', ['channel_id'], { name: 'channel_screens_channel' });
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.dropTable('channel_screens');
};
