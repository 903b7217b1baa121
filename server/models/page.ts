import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { PageSnapshot, PageStatus } from '@shared/schemas/page.ts';
import type { StatementLocale } from '@shared/statements/locales.ts';

/**
 * An object page: the working copy (current revision), what a reviewer signed off (approved) and
 * what the public sees (published). The published snapshot stays live, unchanged, until a newer
 * version is approved and published.
 */
export class Page extends Model<InferAttributes<Page>, InferCreationAttributes<Page>> {
  declare id: CreationOptional<string>;
  declare title: string;
  declare skyObjectId: string;
  declare locale: StatementLocale;
  declare status: CreationOptional<PageStatus>;
  declare writerId: string;
  /** Incremented by every save; a save must name the version it started from. */
  declare version: CreationOptional<number>;
  declare currentRevisionId: CreationOptional<string | null>;
  declare approvedRevisionId: CreationOptional<string | null>;
  declare publishedRevisionId: CreationOptional<string | null>;
  declare approvedSnapshot: CreationOptional<PageSnapshot | null>;
  declare publishedSnapshot: CreationOptional<PageSnapshot | null>;
  declare scheduledPublishAt: CreationOptional<Date | null>;
  declare submittedAt: CreationOptional<Date | null>;
  declare lastReviewerId: CreationOptional<string | null>;
  /** The statements whose wording moved after sign-off, while the page needs a re-check. */
  declare recheckStatementIds: CreationOptional<string[]>;
  /** The language versions this page belongs to (PageVersionGroup), or null while it has none. */
  declare versionGroupId: CreationOptional<string | null>;
  /** Set while the page is archived: hidden from the desk's lists and from every public output. */
  declare archivedAt: CreationOptional<Date | null>;
  declare archivedById: CreationOptional<string | null>;
  /** When the page first went live; a page ever published may be archived but never deleted. */
  declare firstPublishedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Page.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        title: { type: DataTypes.STRING(200), allowNull: false },
        skyObjectId: { type: DataTypes.UUID, allowNull: false },
        locale: { type: DataTypes.STRING(10), allowNull: false },
        status: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'draft' },
        writerId: { type: DataTypes.UUID, allowNull: false },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        currentRevisionId: { type: DataTypes.UUID },
        approvedRevisionId: { type: DataTypes.UUID },
        publishedRevisionId: { type: DataTypes.UUID },
        approvedSnapshot: { type: DataTypes.JSONB },
        publishedSnapshot: { type: DataTypes.JSONB },
        scheduledPublishAt: { type: DataTypes.DATE },
        submittedAt: { type: DataTypes.DATE },
        lastReviewerId: { type: DataTypes.UUID },
        recheckStatementIds: { type: DataTypes.ARRAY(DataTypes.UUID), allowNull: false, defaultValue: [] },
        versionGroupId: { type: DataTypes.UUID },
        archivedAt: { type: DataTypes.DATE },
        archivedById: { type: DataTypes.UUID },
        firstPublishedAt: { type: DataTypes.DATE },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'pages', modelName: 'page', underscored: true },
    );
  }
}
