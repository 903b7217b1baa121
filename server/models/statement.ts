import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { ResolvedModel } from '@shared/schemas/calc.ts';
import type { StoredWorking } from '@shared/statements/working-codec.ts';
import type { CosmologyDescription } from './cosmology-description.ts';
import type { Venue } from './venue.ts';
import type { Step } from '@shared/engine/working.ts';
import type { LocalisedText, StoredNight, UsedInput } from '@shared/statements/index.ts';

export type StatementStatus = 'current' | 'changed' | 'broken';

/**
 * A checked statement: one template applied to one object (and, for a statement about a venue's
 * sky, one venue), with the inputs it used, its result,
 * its public text per locale and its working. `acknowledgedTexts` is the wording last accepted
 * by a reviewer; when a recompute moves the wording away from it the statement is "changed".
 * The cosmology it assumed is a shared CosmologyDescription row (`modelId`); the working is
 * stored packed, its step skeletons shared (services/statements/working-store.ts).
 */
export class Statement extends Model<InferAttributes<Statement>, InferCreationAttributes<Statement>> {
  declare id: CreationOptional<string>;
  declare skyObjectId: string;
  declare templateId: string;
  /** The venue whose night the statement describes; null for statements about the object alone. */
  declare venueId: CreationOptional<string | null>;
  /** Loaded with `include: 'venue'`. */
  declare venue?: NonAttribute<Venue | null>;
  declare status: StatementStatus;
  declare statusReason: CreationOptional<string | null>;
  declare value: CreationOptional<number | null>;
  declare unit: CreationOptional<string | null>;
  declare intervalLow: CreationOptional<number | null>;
  declare intervalHigh: CreationOptional<number | null>;
  declare significantFigures: CreationOptional<number | null>;
  declare texts: CreationOptional<LocalisedText | null>;
  declare footnotes: CreationOptional<LocalisedText | null>;
  declare acknowledgedTexts: CreationOptional<LocalisedText | null>;
  declare acknowledgedById: CreationOptional<string | null>;
  declare acknowledgedAt: CreationOptional<Date | null>;
  declare inputs: CreationOptional<UsedInput[]>;
  /** Packed (read it with readWorking); statements computed before packing hold plain steps. */
  declare working: CreationOptional<StoredWorking | Step[]>;
  declare warnings: CreationOptional<string[]>;
  declare modelId: CreationOptional<string | null>;
  /** For a statement that follows tonight: the venue, night and method it was last computed for, and the method last accepted. */
  declare night: CreationOptional<StoredNight | null>;
  /** Loaded with `include: 'modelDescription'`. */
  declare modelDescription?: NonAttribute<CosmologyDescription | null>;
  declare settingsVersion: number;
  declare computedAt: Date;
  declare createdById: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Statement.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        skyObjectId: { type: DataTypes.UUID, allowNull: false },
        templateId: { type: DataTypes.STRING(40), allowNull: false },
        venueId: { type: DataTypes.UUID },
        status: { type: DataTypes.STRING(10), allowNull: false },
        statusReason: { type: DataTypes.TEXT },
        value: { type: DataTypes.DOUBLE },
        unit: { type: DataTypes.STRING(20) },
        intervalLow: { type: DataTypes.DOUBLE },
        intervalHigh: { type: DataTypes.DOUBLE },
        significantFigures: { type: DataTypes.SMALLINT },
        texts: { type: DataTypes.JSONB },
        footnotes: { type: DataTypes.JSONB },
        acknowledgedTexts: { type: DataTypes.JSONB },
        acknowledgedById: { type: DataTypes.UUID },
        acknowledgedAt: { type: DataTypes.DATE },
        inputs: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        working: { type: DataTypes.JSON, allowNull: false, defaultValue: [] },
        warnings: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        modelId: { type: DataTypes.CHAR(64) },
        night: { type: DataTypes.JSONB },
        settingsVersion: { type: DataTypes.INTEGER, allowNull: false },
        computedAt: { type: DataTypes.DATE, allowNull: false },
        createdById: { type: DataTypes.UUID },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'statements', modelName: 'statement', underscored: true },
    );
  }

  // methods

  /** The cosmology this statement assumed (needs `modelDescription` loaded), or null. */
  get model(): NonAttribute<ResolvedModel | null> {
    return this.modelDescription?.description ?? null;
  }
}
