import { DataTypes } from 'sequelize';
import type { Migration } from './runner.ts';

export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.createTable('sky_snapshots', {
    id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
    venue_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'venues', key: 'id' }, onDelete: 'CASCADE' },
    local_date: { type: DataTypes.DATEONLY, allowNull: false },
    computed_at: { type: DataTypes.DATE, allowNull: false },
    data: { type: DataTypes.JSONB, allowNull: false },
  });
  // One snapshot per venue and night: recomputing replaces it.
  await qi.addIndex('sky_snapshots', ['venue_id', 'local_date'], { unique: true, name: 'sky_snapshots_venue_date' });
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.dropTable('sky_snapshots');
};
