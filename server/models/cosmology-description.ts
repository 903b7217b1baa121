import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { ResolvedModel } from '@shared/schemas/calc.ts';

/**
 * One resolved cosmology (every parameter with its source), stored once and referenced by the
 * statements computed under it. Rows never change: the id is the SHA-256 of the description.
 */
export class CosmologyDescription extends Model<
  InferAttributes<CosmologyDescription>,
  InferCreationAttributes<CosmologyDescription>
> {
  declare id: string;
  declare label: string;
  declare description: ResolvedModel;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    CosmologyDescription.init(
      {
        id: { type: DataTypes.CHAR(64), primaryKey: true },
        label: { type: DataTypes.TEXT, allowNull: false },
        description: { type: DataTypes.JSONB, allowNull: false },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'cosmology_descriptions', modelName: 'cosmologyDescription', underscored: true, updatedAt: false },
    );
  }
}
