import { DataTypes } from 'sequelize';
import type { Migration } from './runner.ts';

// Language versions of one page: pages that say the same thing in several locales point at one group.
// The default version is what a reader gets when none of their languages is there; a deleted default
// leaves the group without one (the oldest remaining version then stands in).
export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.createTable('page_version_groups', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    default_page_id: { type: DataTypes.UUID, references: { model: 'pages', key: 'id' }, onDelete: 'SET NULL' },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.dropTable('page_version_groups');
};
