import type { Sequelize } from 'sequelize';
import { CatalogueImport } from './catalogue-import.ts';
import { CatalogueProposal } from './catalogue-proposal.ts';
import { Measurement } from './measurement.ts';
import { MeasurementHistory } from './measurement-history.ts';
import { SkyObject } from './sky-object.ts';
import { Source } from './source.ts';
import { User } from './user.ts';

export { CatalogueImport, CatalogueProposal, Measurement, MeasurementHistory, SkyObject, Source };

/** Binds the catalogue's models and their associations; called once from initModels. */
export function initCatalogueModels(sequelize: Sequelize): void {
  for (const model of [SkyObject, Source, Measurement, MeasurementHistory, CatalogueImport, CatalogueProposal])
    model.initModel(sequelize);

  // associations
  SkyObject.hasMany(Measurement, { foreignKey: 'skyObjectId', as: 'measurements' });
  Measurement.belongsTo(SkyObject, { foreignKey: 'skyObjectId', as: 'object' });
  Measurement.belongsTo(Source, { foreignKey: 'sourceId', as: 'source' });
  Measurement.belongsTo(User, { foreignKey: 'createdById', as: 'createdBy' });
  Measurement.belongsTo(User, { foreignKey: 'reviewedById', as: 'reviewedBy' });
  MeasurementHistory.belongsTo(User, { foreignKey: 'changedById', as: 'changedBy' });
  CatalogueProposal.belongsTo(Source, { foreignKey: 'sourceId', as: 'source' });
  CatalogueProposal.belongsTo(User, { foreignKey: 'createdById', as: 'createdBy' });
  CatalogueProposal.belongsTo(User, { foreignKey: 'reviewedById', as: 'reviewedBy' });
}
