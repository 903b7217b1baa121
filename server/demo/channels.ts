import { Op } from 'sequelize';
import { Channel, ChannelScreen, ChannelSlide, KioskScreen, Page, User, Venue } from '../models/index.ts';
import { WEEKDAYS } from '@shared/schemas/slide-schedule.ts';
import { DEMO_ACCOUNTS, DEMO_VENUE } from './accounts.ts';

const DEMO_CHANNEL = 'Foyer loop (demo)';

/**
 * A demo kiosk channel at the demo venue: every published demo page (with its statements and a QR
 * code to its public page) and the sky tonight, scheduled from an hour before the venue's sunset
 * until 23:00, shown by the venue's demo screens; a screen silent for 30 minutes is e-mailed to
 * admins. Idempotent: does nothing once the channel exists.
 */
export async function seedDemoChannels(): Promise<void> {
  const venue = await Venue.findOne({ where: { name: DEMO_VENUE.name } });
  if (!venue || (await Channel.findOne({ where: { venueId: venue.id, name: DEMO_CHANNEL } }))) return;
  const editor = await User.findOne({ where: { email: DEMO_ACCOUNTS.find((a) => a.role === 'editor')!.email } });
  const pages = await Page.findAll({
    where: { publishedSnapshot: { [Op.ne]: null }, title: { [Op.like]: '%(demo)' } },
    order: [['title', 'ASC']],
  });
  const channel = await Channel.create({
    venueId: venue.id,
    name: DEMO_CHANNEL,
    createdById: editor?.id ?? null,
    showQr: true,
    silenceAlertMinutes: 30,
  });
  let position = 0;
  for (const page of pages) {
    const statementIds = Object.keys(page.publishedSnapshot!.statementTexts).slice(0, 2);
    await ChannelSlide.create({
      channelId: channel.id,
      position: position++,
      kind: 'page',
      pageId: page.id,
      statementIds,
      durationS: 20,
    });
  }
  await ChannelSlide.create({
    channelId: channel.id,
    position: position++,
    kind: 'sky_tonight',
    durationS: 25,
    schedule: {
      days: [...WEEKDAYS],
      from: { at: 'sunset', offsetMin: -60 },
      until: { at: 'clock', time: '23:00' },
      firstDate: null,
      lastDate: null,
    },
  });
  const screens = await KioskScreen.findAll({ where: { venueId: venue.id } });
  for (const screen of screens) {
    await ChannelScreen.findOrCreate({
      where: { screenId: screen.id },
      defaults: { screenId: screen.id, channelId: channel.id, assignedById: editor?.id ?? null, assignedAt: new Date() },
    });
  }
}
