import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { SlideKind } from '@shared/schemas/channel.ts';
import type { SlideSchedule } from '@shared/schemas/slide-schedule.ts';

/** One slide of a channel: a published page, an image with a caption, or the sky tonight. */
export class ChannelSlide extends Model<InferAttributes<ChannelSlide>, InferCreationAttributes<ChannelSlide>> {
  declare id: CreationOptional<string>;
  declare channelId: string;
  /** 0-based order in the channel. */
  declare position: number;
  declare kind: SlideKind;
  declare pageId: CreationOptional<string | null>;
  /** Statements of the page chosen for the screen, in order. */
  declare statementIds: CreationOptional<string[]>;
  /** The image (image slides), or a page slide's chosen image instead of the page's first. */
  declare mediaId: CreationOptional<string | null>;
  declare caption: CreationOptional<string>;
  declare durationS: CreationOptional<number>;
  declare startsAt: CreationOptional<Date | null>;
  declare endsAt: CreationOptional<Date | null>;
  /** When the slide shows by the venue's clock (weekdays, dates, times tied to the clock or the Sun); null = always. */
  declare schedule: CreationOptional<SlideSchedule | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    ChannelSlide.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        channelId: { type: DataTypes.UUID, allowNull: false },
        position: { type: DataTypes.INTEGER, allowNull: false },
        kind: { type: DataTypes.STRING(16), allowNull: false },
        pageId: { type: DataTypes.UUID },
        statementIds: { type: DataTypes.ARRAY(DataTypes.UUID), allowNull: false, defaultValue: [] },
        mediaId: { type: DataTypes.UUID },
        caption: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
        durationS: { type: DataTypes.SMALLINT, allowNull: false, defaultValue: 12 },
        startsAt: { type: DataTypes.DATE },
        endsAt: { type: DataTypes.DATE },
        schedule: { type: DataTypes.JSONB },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'channel_slides', modelName: 'channelSlide', underscored: true },
    );
  }
}
