import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { CalcModel } from '@shared/schemas/calc.ts';
import type { H0Range } from '@shared/schemas/settings.ts';

/** The organisation's defaults: the adopted cosmology, band, locale and eye-safety wording. */
export class OrganisationSettings extends Model<
  InferAttributes<OrganisationSettings>,
  InferCreationAttributes<OrganisationSettings>
> {
  declare id: number;
  declare cosmologyModel: CalcModel;
  declare defaultBand: string;
  declare defaultLocale: string;
  declare eyeSafetyNotice: string;
  /** Null: the default range (shared/statements/model-uncertainty.ts). */
  declare h0Range: CreationOptional<H0Range | null>;
  declare version: CreationOptional<number>;
  declare updatedById: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    OrganisationSettings.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true },
        cosmologyModel: { type: DataTypes.JSONB, allowNull: false },
        defaultBand: { type: DataTypes.STRING(20), allowNull: false },
        defaultLocale: { type: DataTypes.STRING(10), allowNull: false },
        eyeSafetyNotice: { type: DataTypes.TEXT, allowNull: false },
        h0Range: { type: DataTypes.JSONB, allowNull: true },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        updatedById: { type: DataTypes.UUID },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'organisation_settings', modelName: 'organisationSettings', underscored: true },
    );
  }
}
