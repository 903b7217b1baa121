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

/** A comment on a page, noting the revision it was written against. */
export class PageComment extends Model<InferAttributes<PageComment>, InferCreationAttributes<PageComment>> {
  declare id: CreationOptional<string>;
  declare pageId: string;
  declare revisionNumber: number | null;
  declare authorId: string | null;
  declare body: string;
  declare createdAt: CreationOptional<Date>;

  // associations
  declare author?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize): void {
    PageComment.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        pageId: { type: DataTypes.UUID, allowNull: false },
        revisionNumber: { type: DataTypes.INTEGER },
        authorId: { type: DataTypes.UUID },
        body: { type: DataTypes.TEXT, allowNull: false },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'page_comments', modelName: 'pageComment', underscored: true, updatedAt: false },
    );
  }
}
