import type { Sequelize } from 'sequelize';
import { Channel } from './channel.ts';
import { ChannelScreen } from './channel-screen.ts';
import { ChannelSlide } from './channel-slide.ts';

export { Channel, ChannelScreen, ChannelSlide };

/** Binds the kiosk channel models and their associations; called once from initModels. */
export function initChannelModels(sequelize: Sequelize): void {
  for (const model of [Channel, ChannelSlide, ChannelScreen]) model.initModel(sequelize);

  // associations
  Channel.hasMany(ChannelSlide, { foreignKey: 'channelId', as: 'slides' });
}
