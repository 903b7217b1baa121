import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { User } from './user.ts';

/** What a history row records. */
export type MeasurementHistoryAction =
  | 'created'
  | 'proposed'
  | 'updated'
  | 'preferred'
  | 'unpreferred'
  | 'accepted'
  | 'declined'
  | 'retired'
  | 'imported';

/** The fields of a measurement a history row keeps, before and after. */
export type MeasurementSnapshot = Record<string, string | number | boolean | null>;

/** One change to a measurement: who, when, old and new. Append-only. */
export class MeasurementHistory extends Model<InferAttributes<MeasurementHistory>, InferCreationAttributes<MeasurementHistory>> {
  declare id: CreationOptional<string>;
  declare measurementId: string;
  /** The sky object measured (column `object_id`). */
  declare skyObjectId: string;
  declare action: MeasurementHistoryAction;
  declare changedById: string | null;
  declare reason: string | null;
  declare oldValues: MeasurementSnapshot | null;
  declare newValues: MeasurementSnapshot | null;
  declare createdAt: CreationOptional<Date>;

  // associations
  declare changedBy?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize): void {
    MeasurementHistory.init(
      {
        id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
        measurementId: { type: DataTypes.UUID, allowNull: false },
        skyObjectId: { type: DataTypes.UUID, allowNull: false, field: 'object_id' },
        action: { type: DataTypes.STRING(24), allowNull: false },
        changedById: { type: DataTypes.UUID },
        reason: { type: DataTypes.TEXT },
        oldValues: { type: DataTypes.JSONB },
        newValues: { type: DataTypes.JSONB },
        createdAt: DataTypes.DATE,
      },
      {
        sequelize,
        tableName: 'measurement_history',
        modelName: 'measurementHistory',
        underscored: true,
        updatedAt: false,
        freezeTableName: true,
      },
    );
  }
}
