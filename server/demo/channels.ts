import { Op } from 'sequelize';
import { Channel, ChannelScreen, ChannelSlide, KioskScreen, Page, User, Venue } from '../models/index.ts';
import { WEEKDAYS } from '@shared/schemas/slide-schedule.ts';
import { DEMO_ACCOUNTS, DEMO_VENUE } from './accounts.ts';

const DEMO_CHANNEL = 'Foyer loop (demo)';
const DEMO_BILINGUAL_CHANNEL = 'Foyer loop in English and French (demo)';

/**
 * A channel that plays in English and French, round by round: the published demo pages that have a
 * French version. No screen shows it at first; an admin assigns one (or gives a screen one language).
 */
async function seedBilingualChannel(venue: Venue, editor: User | null): Promise<void> {
  if (await Channel.findOne({ where: { venueId: venue.id, name: DEMO_BILINGUAL_CHANNEL } })) return;
  const pages = await Page.findAll({
    where: {
      publishedSnapshot: { [Op.ne]: null },
      versionGroupId: { [Op.ne]: null },
      locale: 'en-GB',
      title: { [Op.like]: '%(demo)' },
    },
    order: [['title', 'ASC']],
  });
  if (!pages.length) return;
  const channel = await Channel.create({
    venueId: venue.id,
    name: DEMO_BILINGUAL_CHANNEL,
    languages: ['en-GB', 'fr-FR'],
    createdById: editor?.id ?? null,
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
}

/**
 * Demo kiosk channels at the demo venue. The foyer loop: every published demo page (with its
 * statements and a QR code to its public page) and the sky tonight, scheduled from an hour before
 * the venue's sunset until 23:00, shown by the venue's demo screens; a screen silent for 30 minutes
 * is e-mailed to admins. Idempotent: does nothing once the channel exists.
 */
export async function seedDemoChannels(): Promise<void> {
  const venue = await Venue.findOne({ where: { name: DEMO_VENUE.name } });
  if (!venue) return;
  const editor = await User.findOne({ where: { email: DEMO_ACCOUNTS.find((a) => a.role === 'editor')!.email } });
  await seedBilingualChannel(venue, editor);
  if (await Channel.findOne({ where: { venueId: venue.id, name: DEMO_CHANNEL } })) return;
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
