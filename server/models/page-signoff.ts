import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** A reviewer's sign-off of one statement on a page (with the wording seen), or of the whole page. */
export class PageSignoff extends Model<InferAttributes<PageSignoff>, InferCreationAttributes<PageSignoff>> {
  declare id: CreationOptional<string>;
  declare pageId: string;
  declare revisionId: string;
  declare kind: 'statement' | 'page';
  declare statementId: string | null;
  declare statementText: string | null;
  declare reviewerId: string;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    PageSignoff.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        pageId: { type: DataTypes.UUID, allowNull: false },
        revisionId: { type: DataTypes.UUID, allowNull: false },
        kind: { type: DataTypes.STRING(10), allowNull: false },
        statementId: { type: DataTypes.UUID },
        statementText: { type: DataTypes.TEXT },
        reviewerId: { type: DataTypes.UUID, allowNull: false },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'page_signoffs', modelName: 'pageSignoff', underscored: true, updatedAt: false },
    );
  }
}
