import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** A reviewer's ruling that a flagged number on a page is not a measured quantity, with the reason. */
export class PageNumberFlag extends Model<InferAttributes<PageNumberFlag>, InferCreationAttributes<PageNumberFlag>> {
  declare id: CreationOptional<string>;
  declare pageId: string;
  declare normalisedText: string;
  declare text: string;
  declare reason: string;
  declare resolvedById: string | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    PageNumberFlag.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        pageId: { type: DataTypes.UUID, allowNull: false },
        normalisedText: { type: DataTypes.STRING(200), allowNull: false },
        text: { type: DataTypes.STRING(200), allowNull: false },
        reason: { type: DataTypes.TEXT, allowNull: false },
        resolvedById: { type: DataTypes.UUID },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'page_number_flags', modelName: 'pageNumberFlag', underscored: true, updatedAt: false },
    );
  }
}
