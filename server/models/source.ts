import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** Where a measurement comes from: a paper, a catalogue or a web page, reusable across measurements. */
export class Source extends Model<InferAttributes<Source>, InferCreationAttributes<Source>> {
  declare id: CreationOptional<string>;
  declare citation: string;
  declare bibcode: string | null;
  declare doi: string | null;
  declare url: string | null;
  declare catalogueName: string | null;
  /** A date without time (YYYY-MM-DD): when a web page or catalogue was read. */
  declare retrievedOn: string | null;
  declare notes: CreationOptional<string>;
  declare createdById: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Source.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        citation: { type: DataTypes.STRING(500), allowNull: false },
        bibcode: { type: DataTypes.STRING(19) },
        doi: { type: DataTypes.STRING(200) },
        url: { type: DataTypes.STRING(2000) },
        catalogueName: { type: DataTypes.STRING(200) },
        retrievedOn: { type: DataTypes.DATEONLY },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        createdById: { type: DataTypes.UUID },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'sources', modelName: 'source', underscored: true },
    );
  }
}
