import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/**
 * Language versions of one page: each version is a page of its own (its own text, review and
 * publication) pointing at the group. The default version is what a reader gets when none of their
 * languages is there.
 */
export class PageVersionGroup extends Model<InferAttributes<PageVersionGroup>, InferCreationAttributes<PageVersionGroup>> {
  declare id: CreationOptional<string>;
  /** Null once the default version is deleted: the oldest remaining version stands in. */
  declare defaultPageId: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    PageVersionGroup.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        defaultPageId: { type: DataTypes.UUID },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'page_version_groups', modelName: 'pageVersionGroup', underscored: true },
    );
  }
}
