import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { ImportReport } from '@shared/schemas/catalogue-import.ts';

/** A row that passed the dry run, resolved to ids and canonical units. */
export interface AcceptedImportRow {
  row: number;
  objectId: string;
  quantity: string;
  band: string | null;
  value: number;
  uncertainty: number | null;
  uncertaintyMinus: number | null;
  uncertaintyPlus: number | null;
  enteredValue: number;
  enteredUnit: string;
  sourceId: string;
  note: string;
}

/** A checked CSV file waiting to be committed (or already committed). */
export class CatalogueImport extends Model<InferAttributes<CatalogueImport>, InferCreationAttributes<CatalogueImport>> {
  declare id: CreationOptional<string>;
  declare createdById: string | null;
  declare fileName: string;
  declare status: CreationOptional<'checked' | 'committed'>;
  declare report: ImportReport;
  declare acceptedRows: AcceptedImportRow[] | null;
  declare committedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    CatalogueImport.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        createdById: { type: DataTypes.UUID },
        fileName: { type: DataTypes.STRING(255), allowNull: false },
        status: { type: DataTypes.STRING(12), allowNull: false, defaultValue: 'checked' },
        report: { type: DataTypes.JSONB, allowNull: false },
        acceptedRows: { type: DataTypes.JSONB },
        committedAt: { type: DataTypes.DATE },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'catalogue_imports', modelName: 'catalogueImport', underscored: true },
    );
  }
}
