import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { LicenceId } from '@shared/media/licences.ts';
import type { RenditionStatus } from '@shared/media/renditions.ts';
import type { MediaRendition } from './media-rendition.ts';
import type { User } from './user.ts';

/** An image in the library. Its original file is private; the public sees only its renditions. */
export class Media extends Model<InferAttributes<Media>, InferCreationAttributes<Media>> {
  declare id: CreationOptional<string>;
  declare sha256: string;
  declare originalKey: string;
  declare fileName: string;
  declare format: string;
  declare bytes: number;
  /** Upright width and height (after the EXIF orientation is applied). */
  declare width: number;
  declare height: number;
  declare altText: CreationOptional<string>;
  declare credit: CreationOptional<string>;
  declare licenceId: CreationOptional<LicenceId | null>;
  declare sourceUrl: CreationOptional<string>;
  declare focalX: CreationOptional<number>;
  declare focalY: CreationOptional<number>;
  declare renditionsStatus: CreationOptional<RenditionStatus>;
  declare renditionsError: CreationOptional<string | null>;
  declare uploadedById: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  // associations
  declare renditions?: NonAttribute<MediaRendition[]>;
  declare uploadedBy?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize): void {
    Media.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        sha256: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
        originalKey: { type: DataTypes.STRING(200), allowNull: false },
        fileName: { type: DataTypes.STRING(255), allowNull: false },
        format: { type: DataTypes.STRING(16), allowNull: false },
        // BIGINT comes back from pg as a string; files are far below 2^53 bytes.
        bytes: {
          type: DataTypes.BIGINT,
          allowNull: false,
          get() {
            return Number(this.getDataValue('bytes'));
          },
        },
        width: { type: DataTypes.INTEGER, allowNull: false },
        height: { type: DataTypes.INTEGER, allowNull: false },
        altText: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        credit: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
        licenceId: { type: DataTypes.STRING(40) },
        sourceUrl: { type: DataTypes.STRING(2000), allowNull: false, defaultValue: '' },
        focalX: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0.5 },
        focalY: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0.5 },
        renditionsStatus: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'pending' },
        renditionsError: { type: DataTypes.STRING(500) },
        uploadedById: { type: DataTypes.UUID },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'media', modelName: 'media', underscored: true },
    );
  }
}
