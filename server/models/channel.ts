import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { ChannelSlide } from './channel-slide.ts';

/** A kiosk channel: an ordered list of slides at one venue, shown by the screens assigned to it. */
export class Channel extends Model<InferAttributes<Channel>, InferCreationAttributes<Channel>> {
  declare id: CreationOptional<string>;
  declare venueId: string;
  declare name: string;
  /** Bumped by every edit; feed caches on other server instances compare it. */
  declare version: CreationOptional<number>;
  /** The languages (locale tags) the channel plays, in order; screens without their own alternate between them. */
  declare languages: CreationOptional<string[]>;
  /** Object slides carry a QR code to the page's public address. */
  declare showQr: CreationOptional<boolean>;
  /** Minutes without a heartbeat before admins are e-mailed about one of the channel's screens; null = never. */
  declare silenceAlertMinutes: CreationOptional<number | null>;
  declare createdById: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  // associations
  declare slides?: NonAttribute<ChannelSlide[]>;

  static initModel(sequelize: Sequelize): void {
    Channel.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        venueId: { type: DataTypes.UUID, allowNull: false },
        name: { type: DataTypes.STRING(80), allowNull: false },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        languages: { type: DataTypes.ARRAY(DataTypes.STRING(10)), allowNull: false, defaultValue: [] },
        showQr: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        silenceAlertMinutes: { type: DataTypes.INTEGER },
        createdById: { type: DataTypes.UUID },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'channels', modelName: 'channel', underscored: true },
    );
  }
}
