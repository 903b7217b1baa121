import { DataTypes } from 'sequelize';
import type { Migration } from './runner.ts';

export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.createTable('page_signoffs', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    page_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'pages', key: 'id' }, onDelete: 'CASCADE' },
    revision_id: {
      type: DataTypes.UUID,
      allowNull: false,
      references: { model: 'page_revisions', key: 'id' },
      onDelete: 'CASCADE',
    },
    kind: { type: DataTypes.STRING(10), allowNull: false },
    statement_id: { type: DataTypes.UUID, references: { model: 'statements', key: 'id' }, onDelete: 'CASCADE' },
    // The wording the reviewer saw, in the page's locale: a later change of wording voids the sign-off.
    statement_text: { type: DataTypes.TEXT },
    reviewer_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'RESTRICT' },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  const q = (sql: string) => qi.sequelize.query(sql);
  await q(
    "ALTER TABLE page_signoffs ADD CONSTRAINT page_signoffs_kind_check CHECK ((kind = 'page' AND statement_id IS NULL) OR (kind = 'statement' AND statement_id IS NOT NULL AND statement_text IS NOT NULL))",
  );
  await q('CREATE INDEX page_signoffs_page ON page_signoffs (page_id, revision_id)');
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.dropTable('page_signoffs');
};
