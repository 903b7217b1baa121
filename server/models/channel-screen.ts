import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** Which channel a kiosk screen shows; one row per screen. */
export class ChannelScreen extends Model<InferAttributes<ChannelScreen>, InferCreationAttributes<ChannelScreen>> {
  declare screenId: string;
  declare channelId: string;
  declare assignedById: CreationOptional<string | null>;
  declare assignedAt: Date;

  static initModel(sequelize: Sequelize): void {
    ChannelScreen.init(
      {
        screenId: { type: DataTypes.UUID, primaryKey: true },
        channelId: { type: DataTypes.UUID, allowNull: false },
        assignedById: { type: DataTypes.UUID },
        assignedAt: { type: DataTypes.DATE, allowNull: false },
      },
      { sequelize, tableName: 'channel_screens', modelName: 'channelScreen', underscored: true, timestamps: false },
    );
  }
}
