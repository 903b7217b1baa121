import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { CalcModel } from '@shared/schemas/calc.ts';
import type { H0Range, SpectralIndexDefaults } from '@shared/schemas/settings.ts';

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
  /** Default spectral index per object kind, each with its source: a stated assumption for the K-correction. */
  declare spectralIndexDefaults: CreationOptional<SpectralIndexDefaults>;
  /** Null: the default range (shared/statements/model-uncertainty.ts). */
  declare h0Range: CreationOptional<H0Range | null>;
  declare version: CreationOptional<number>;
  /** The release of the statement rules the stored statements were last computed by (STATEMENT_RULES_VERSION). */
  declare statementRulesVersion: CreationOptional<number>;
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
        spectralIndexDefaults: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
        h0Range: { type: DataTypes.JSONB, allowNull: true },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        statementRulesVersion: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        updatedById: { type: DataTypes.UUID },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'organisation_settings', modelName: 'organisationSettings', underscored: true },
    );
  }
}
