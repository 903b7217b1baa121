import { DataTypes } from 'sequelize';
import type { Migration } from './runner.ts';

export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.createTable('media_object_links', {
    media_id: {
      type: DataTypes.UUID,
      allowNull: false,
      primaryKey: true,
      references: { model: 'media', key: 'id' },
      onDelete: 'CASCADE',
    },
    sky_object_id: {
      type: DataTypes.UUID,
      allowNull: false,
      primaryKey: true,
      references: { model: 'sky_objects', key: 'id' },
      onDelete: 'CASCADE',
    },
  });
  await qi.addIndex('media_object_links', ['sky_object_id'], { name: 'media_object_links_object' });
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.dropTable('media_object_links');
};
