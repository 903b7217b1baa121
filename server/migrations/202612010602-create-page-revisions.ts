import { DataTypes } from 'sequelize';
import type { Migration } from './runner.ts';

export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.createTable('page_revisions', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    page_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'pages', key: 'id' }, onDelete: 'CASCADE' },
    number: { type: DataTypes.INTEGER, allowNull: false },
    title: { type: DataTypes.STRING(200), allowNull: false },
    doc: { type: DataTypes.JSONB, allowNull: false },
    // Kept beside the document so "which pages use this statement / image" is an index lookup.
    statement_ids: { type: DataTypes.ARRAY(DataTypes.UUID), allowNull: false, defaultValue: [] },
    media_ids: { type: DataTypes.ARRAY(DataTypes.UUID), allowNull: false, defaultValue: [] },
    restored_from: { type: DataTypes.INTEGER },
    author_id: { type: DataTypes.UUID, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  const q = (sql: string) => qi.sequelize.query(sql);
  await q('CREATE UNIQUE INDEX page_revisions_number ON page_revisions (page_id, number)');
  await q('CREATE INDEX page_revisions_statements ON page_revisions USING gin (statement_ids)');
  await q('CREATE INDEX page_revisions_media ON page_revisions USING gin (media_ids)');
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.dropTable('page_revisions');
};
