import { DataTypes } from 'sequelize';
import type { Migration } from './runner.ts';

export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.createTable('page_comments', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    page_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'pages', key: 'id' }, onDelete: 'CASCADE' },
    revision_number: { type: DataTypes.INTEGER },
    author_id: { type: DataTypes.UUID, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    body: { type: DataTypes.TEXT, allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.sequelize.query('CREATE INDEX page_comments_page ON page_comments (page_id, created_at)');
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.dropTable('page_comments');
};
