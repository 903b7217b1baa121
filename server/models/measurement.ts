import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { Source } from './source.ts';
import type { User } from './user.ts';

export type MeasurementStatus = 'proposed' | 'accepted' | 'declined';

/**
 * One measured value of one quantity of an object, in the quantity's canonical unit, with what
 * was typed (entered value and unit) kept beside it. Never deleted: retired instead.
 */
export class Measurement extends Model<InferAttributes<Measurement>, InferCreationAttributes<Measurement>> {
  declare id: CreationOptional<string>;
  /** The sky object measured (column `object_id`). */
  declare skyObjectId: string;
  declare quantity: string;
  declare band: string | null;
  declare value: number;
  declare uncertainty: number | null;
  declare uncertaintyMinus: number | null;
  declare uncertaintyPlus: number | null;
  declare enteredValue: number;
  declare enteredUnit: string;
  declare sourceId: string | null;
  declare preferred: CreationOptional<boolean>;
  declare status: CreationOptional<MeasurementStatus>;
  declare note: CreationOptional<string>;
  declare createdById: string | null;
  declare reviewedById: CreationOptional<string | null>;
  declare reviewedAt: CreationOptional<Date | null>;
  declare reviewReason: CreationOptional<string | null>;
  declare retiredById: CreationOptional<string | null>;
  declare retiredAt: CreationOptional<Date | null>;
  declare retireReason: CreationOptional<string | null>;
  declare importId: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  // associations
  declare source?: NonAttribute<Source | null>;
  declare createdBy?: NonAttribute<User | null>;
  declare reviewedBy?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize): void {
    Measurement.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        skyObjectId: { type: DataTypes.UUID, allowNull: false, field: 'object_id' },
        quantity: { type: DataTypes.STRING(32), allowNull: false },
        band: { type: DataTypes.STRING(16) },
        value: { type: DataTypes.DOUBLE, allowNull: false },
        uncertainty: { type: DataTypes.DOUBLE },
        uncertaintyMinus: { type: DataTypes.DOUBLE },
        uncertaintyPlus: { type: DataTypes.DOUBLE },
        enteredValue: { type: DataTypes.DOUBLE, allowNull: false },
        enteredUnit: { type: DataTypes.STRING(16), allowNull: false, defaultValue: '' },
        sourceId: { type: DataTypes.UUID },
        preferred: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        status: { type: DataTypes.STRING(12), allowNull: false, defaultValue: 'accepted' },
        note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        createdById: { type: DataTypes.UUID },
        reviewedById: { type: DataTypes.UUID },
        reviewedAt: { type: DataTypes.DATE },
        reviewReason: { type: DataTypes.TEXT },
        retiredById: { type: DataTypes.UUID },
        retiredAt: { type: DataTypes.DATE },
        retireReason: { type: DataTypes.TEXT },
        importId: { type: DataTypes.UUID },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'measurements', modelName: 'measurement', underscored: true },
    );
  }
}
