import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** A building with screens, and the place the sky is computed for. */
export class Venue extends Model<InferAttributes<Venue>, InferCreationAttributes<Venue>> {
  declare id: CreationOptional<string>;
  declare name: string;
  declare latitude: number;
  declare longitude: number;
  declare elevationM: CreationOptional<number>;
  declare timeZone: string;
  declare isDemo: CreationOptional<boolean>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Venue.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        name: { type: DataTypes.STRING(120), allowNull: false, unique: true },
        latitude: { type: DataTypes.DOUBLE, allowNull: false },
        longitude: { type: DataTypes.DOUBLE, allowNull: false },
        elevationM: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
        timeZone: { type: DataTypes.STRING(64), allowNull: false },
        isDemo: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'venues', modelName: 'venue', underscored: true },
    );
  }
}
