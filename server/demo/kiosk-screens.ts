import crypto from 'node:crypto';
import { KioskScreen, Venue } from '../models/index.ts';
import { hashToken } from '../services/users/index.ts';
import { DEMO_VENUE } from './accounts.ts';

/**
 * Three demo screens at the demo venue, unless present: one waiting to be paired, one that was
 * paired (with a token nobody holds) and last reported in two hours before the first start, and a
 * portrait screen by the stairs, so the screens list shows each state. Idempotent.
 */
export async function seedDemoKioskScreens(): Promise<void> {
  const venue = await Venue.findOne({ where: { name: DEMO_VENUE.name } });
  if (!venue) return;
  const lobby = 'Lobby screen (demo)';
  if (!(await KioskScreen.findOne({ where: { venueId: venue.id, name: lobby } }))) {
    await KioskScreen.create({ venueId: venue.id, name: lobby });
  }
  const dome = 'Dome entrance screen (demo)';
  if (!(await KioskScreen.findOne({ where: { venueId: venue.id, name: dome } }))) {
    const twoHoursAgo = new Date(Date.now() - 2 * 3_600_000);
    await KioskScreen.create({
      venueId: venue.id,
      name: dome,
      tokenHash: hashToken(crypto.randomBytes(32).toString('base64url')),
      tokenIssuedAt: new Date(Date.now() - 30 * 86_400_000),
      lastSeenAt: twoHoursAgo,
      playerVersion: 'demo',
      showing: { slide: 'Sky tonight (demo)' },
      showingSlideTitle: 'The sky tonight',
      reportedOrientation: 'landscape',
    });
  }
  const stairs = 'Stairwell portrait screen (demo)';
  if (!(await KioskScreen.findOne({ where: { venueId: venue.id, name: stairs } }))) {
    await KioskScreen.create({
      venueId: venue.id,
      name: stairs,
      orientation: 'portrait',
      tokenHash: hashToken(crypto.randomBytes(32).toString('base64url')),
      tokenIssuedAt: new Date(Date.now() - 3 * 86_400_000),
      lastSeenAt: new Date(Date.now() - 10 * 60_000),
      playerVersion: 'starproof-player 1.1',
      showingSlideTitle: 'How far away is the Andromeda Galaxy? (demo)',
      reportedOrientation: 'portrait',
    });
  }
}
