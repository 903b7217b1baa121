import { DataTypes } from 'sequelize';
import type { Migration } from './runner.ts';

export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.createTable('venues', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    name: { type: DataTypes.STRING(120), allowNull: false, unique: true },
    latitude: { type: DataTypes.DOUBLE, allowNull: false },
    longitude: { type: DataTypes.DOUBLE, allowNull: false },
    elevation_m: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
    time_zone: { type: DataTypes.STRING(64), allowNull: false },
    is_demo: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.sequelize.query(
    'ALTER TABLE venues ADD CONSTRAINT venues_position_check CHECK (latitude BETWEEN -90 AND 90 AND longitude BETWEEN -180 AND 180)',
  );
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.dropTable('venues');
};
