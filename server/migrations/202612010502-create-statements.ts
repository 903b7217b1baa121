import { DataTypes } from 'sequelize';
import type { Migration } from './runner.ts';

export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.createTable('statements', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    sky_object_id: {
      type: DataTypes.UUID,
      allowNull: false,
      references: { model: 'sky_objects', key: 'id' },
      onDelete: 'RESTRICT',
    },
    template_id: { type: DataTypes.STRING(40), allowNull: false },
    status: { type: DataTypes.STRING(10), allowNull: false },
    status_reason: { type: DataTypes.TEXT },
    value: { type: DataTypes.DOUBLE },
    unit: { type: DataTypes.STRING(20) },
    interval_low: { type: DataTypes.DOUBLE },
    interval_high: { type: DataTypes.DOUBLE },
    significant_figures: { type: DataTypes.SMALLINT },
    texts: { type: DataTypes.JSONB },
    footnotes: { type: DataTypes.JSONB },
    acknowledged_texts: { type: DataTypes.JSONB },
    acknowledged_by_id: { type: DataTypes.UUID, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    acknowledged_at: { type: DataTypes.DATE },
    inputs: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
    working: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
    warnings: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
    model: { type: DataTypes.JSONB },
    settings_version: { type: DataTypes.INTEGER, allowNull: false },
    computed_at: { type: DataTypes.DATE, allowNull: false },
    created_by_id: { type: DataTypes.UUID, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  const q = (sql: string) => qi.sequelize.query(sql);
  await q("ALTER TABLE statements ADD CONSTRAINT statements_status_check CHECK (status IN ('current','changed','broken'))");
  // A broken statement has no number to show; a current or changed one always has its text.
  await q(
    "ALTER TABLE statements ADD CONSTRAINT statements_text_when_ok CHECK (status = 'broken' OR (texts IS NOT NULL AND value IS NOT NULL))",
  );
  // One statement per object and template: pages share it, so every page shows the same number.
  await q('CREATE UNIQUE INDEX statements_object_template ON statements (sky_object_id, template_id)');
  await q('CREATE INDEX statements_status ON statements (status)');
  // Find the statements that used a measurement or a source when it changes.
  await q('CREATE INDEX statements_inputs ON statements USING gin (inputs jsonb_path_ops)');
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.dropTable('statements');
};
