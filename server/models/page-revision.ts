import type { JSONContent } from '@tiptap/core';
import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** One saved version of a page: never changed once written. */
export class PageRevision extends Model<InferAttributes<PageRevision>, InferCreationAttributes<PageRevision>> {
  declare id: CreationOptional<string>;
  declare pageId: string;
  declare number: number;
  declare title: string;
  declare doc: JSONContent;
  declare statementIds: string[];
  declare mediaIds: string[];
  /** The revision number this one was restored from, if it was. */
  declare restoredFrom: CreationOptional<number | null>;
  declare authorId: string | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    PageRevision.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        pageId: { type: DataTypes.UUID, allowNull: false },
        number: { type: DataTypes.INTEGER, allowNull: false },
        title: { type: DataTypes.STRING(200), allowNull: false },
        doc: { type: DataTypes.JSONB, allowNull: false },
        statementIds: { type: DataTypes.ARRAY(DataTypes.UUID), allowNull: false, defaultValue: [] },
        mediaIds: { type: DataTypes.ARRAY(DataTypes.UUID), allowNull: false, defaultValue: [] },
        restoredFrom: { type: DataTypes.INTEGER },
        authorId: { type: DataTypes.UUID },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'page_revisions', modelName: 'pageRevision', underscored: true, updatedAt: false },
    );
  }
}
