import { DataTypes } from 'sequelize';
import type { Migration } from './runner.ts';

export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.createTable('sources', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    citation: { type: DataTypes.STRING(500), allowNull: false },
    bibcode: { type: DataTypes.STRING(19) },
    doi: { type: DataTypes.STRING(200) },
    url: { type: DataTypes.STRING(2000) },
    catalogue_name: { type: DataTypes.STRING(200) },
    retrieved_on: { type: DataTypes.DATEONLY },
    notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    created_by_id: { type: DataTypes.UUID, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  // CSV rows name their source by citation, bibcode or DOI: each must identify one source.
  await qi.sequelize.query('CREATE UNIQUE INDEX sources_lower_citation ON sources (lower(citation))');
  await qi.sequelize.query('CREATE UNIQUE INDEX sources_bibcode ON sources (bibcode) WHERE bibcode IS NOT NULL');
  await qi.sequelize.query('CREATE UNIQUE INDEX sources_lower_doi ON sources (lower(doi)) WHERE doi IS NOT NULL');
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.dropTable('sources');
};
