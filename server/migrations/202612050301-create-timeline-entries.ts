import { DataTypes } from 'sequelize';
import type { Migration } from './runner.ts';

// Earth's timeline for "when the light set out": each entry a dated event with its uncertainty, its
// published source and its wording per locale. The limits the schema checks hold in the database too.
export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.createTable('timeline_entries', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    label: { type: DataTypes.STRING(120), allowNull: false, unique: true },
    years_ago: { type: DataTypes.DOUBLE, allowNull: false },
    uncertainty_years: { type: DataTypes.DOUBLE, allowNull: false },
    relation: { type: DataTypes.STRING(10), allowNull: false },
    phrases: { type: DataTypes.JSONB, allowNull: false },
    source_citation: { type: DataTypes.TEXT, allowNull: false },
    source_url: { type: DataTypes.TEXT },
    note: { type: DataTypes.TEXT },
    updated_by_id: { type: DataTypes.UUID, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.sequelize.query(`
    ALTER TABLE timeline_entries
      ADD CONSTRAINT timeline_entries_years_ago_check CHECK (years_ago > 0 AND years_ago < 2e10),
      ADD CONSTRAINT timeline_entries_uncertainty_check CHECK (uncertainty_years > 0 AND uncertainty_years < years_ago),
      ADD CONSTRAINT timeline_entries_relation_check CHECK (relation IN ('around', 'before')),
      ADD CONSTRAINT timeline_entries_citation_check CHECK (length(btrim(source_citation)) > 0)`);
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.dropTable('timeline_entries');
};
