import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { RenditionFormat, RenditionName } from '@shared/media/renditions.ts';

/** One resized, metadata-free copy of an image in one format, stored under a content-addressed key. */
export class MediaRendition extends Model<InferAttributes<MediaRendition>, InferCreationAttributes<MediaRendition>> {
  declare id: CreationOptional<string>;
  declare mediaId: string;
  declare name: RenditionName;
  declare format: RenditionFormat;
  declare width: number;
  declare height: number;
  declare bytes: number;
  declare storageKey: string;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    MediaRendition.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        mediaId: { type: DataTypes.UUID, allowNull: false },
        name: { type: DataTypes.STRING(20), allowNull: false },
        format: { type: DataTypes.STRING(8), allowNull: false },
        width: { type: DataTypes.INTEGER, allowNull: false },
        height: { type: DataTypes.INTEGER, allowNull: false },
        bytes: { type: DataTypes.INTEGER, allowNull: false },
        storageKey: { type: DataTypes.STRING(200), allowNull: false },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'media_renditions', modelName: 'mediaRendition', underscored: true, updatedAt: false },
    );
  }
}
