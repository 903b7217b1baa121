import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { ResolvedModel } from '@shared/schemas/calc.ts';
import type { Step } from '@shared/engine/working.ts';
import type { LocalisedText, UsedInput } from '@shared/statements/index.ts';

export type StatementStatus = 'current' | 'changed' | 'broken';

/**
 * A checked statement: one template applied to one object, with the inputs it used, its result,
 * its public text per locale and its working. `acknowledgedTexts` is the wording last accepted
 * by a reviewer; when a recompute moves the wording away from it the statement is "changed".
 */
export class Statement extends Model<InferAttributes<Statement>, InferCreationAttributes<Statement>> {
  declare id: CreationOptional<string>;
  declare skyObjectId: string;
  declare templateId: string;
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
  declare working: CreationOptional<Step[]>;
  declare warnings: CreationOptional<string[]>;
  declare model: CreationOptional<ResolvedModel | null>;
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
        working: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        warnings: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        model: { type: DataTypes.JSONB },
        settingsVersion: { type: DataTypes.INTEGER, allowNull: false },
        computedAt: { type: DataTypes.DATE, allowNull: false },
        createdById: { type: DataTypes.UUID },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'statements', modelName: 'statement', underscored: true },
    );
  }
}
