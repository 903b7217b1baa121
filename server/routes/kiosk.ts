import { Router } from 'express';
import { rateLimit } from 'express-rate-limit';
import { PgRateLimitStore } from '../middlewares/rate-limit-store.ts';
import { KioskHeartbeatSchema, KioskPairSchema, type KioskPairedDto } from '@shared/schemas/kiosk.ts';
import { nightDateAt } from '@shared/sky/time-zone.ts';
import { NotFoundError, TooManyRequestsError } from '../errors.ts';
import { assertOwnScreen, currentKiosk, requireKiosk } from '../middlewares/kiosk-auth.ts';
import { validate } from '../middlewares/validate.ts';
import { Venue } from '../models/index.ts';
import { presentSkySnapshot } from '../presenters/kiosk-screen.ts';
import { pairScreen, recordHeartbeat } from '../services/publishing/index.ts';
import { config } from '../config.ts';
import { getSkySnapshot } from '../services/sky/index.ts';

/** Guessing codes is slow: a few tries per address per quarter hour. */
const pairingLimiter = rateLimit({
  windowMs: 15 * 60_000,
  limit: config.limits.pairing,
  store: new PgRateLimitStore('pairing'),
  standardHeaders: 'draft-8',
  legacyHeaders: false,
  handler: (_req, _res, next) =>
    next(
      TooManyRequestsError('Too many pairing attempts from this address. Wait a few minutes and try again.', 'too_many_requests'),
    ),
});

/** Routes the kiosk player calls: pairing (no token yet), then everything with its Bearer token. */
export const kioskRouter = Router();

kioskRouter.post('/pair', pairingLimiter, validate(KioskPairSchema), async (req, res) => {
  const { token, screen, venue } = await pairScreen(req.body.code, req.ip);
  const body: KioskPairedDto = { token, screen: { id: screen.id, name: screen.name, venueId: venue.id, venueName: venue.name } };
  res.status(201).json({ data: body });
});

kioskRouter.post('/heartbeat', requireKiosk, validate(KioskHeartbeatSchema), async (req, res) => {
  const screen = currentKiosk(req);
  const input = req.body;
  assertOwnScreen(screen, { screenId: input.screenId });
  await recordHeartbeat(screen, input);
  // The player trusts the server's clock over its own, and lays slides out as the admin set the screen.
  res.json({
    data: { screenId: screen.id, venueId: screen.venueId, serverTime: new Date().toISOString(), orientation: screen.orientation },
  });
});

kioskRouter.get('/screen', requireKiosk, async (req, res) => {
  const screen = currentKiosk(req);
  const venue = await Venue.findByPk(screen.venueId);
  res.json({
    data: {
      id: screen.id,
      name: screen.name,
      venueId: screen.venueId,
      venueName: venue?.name ?? '',
      serverTime: new Date().toISOString(),
    },
  });
});

/** The sky for the screen's own venue (a sky-tonight slide); another venue's is refused. */
kioskRouter.get('/venues/:venueId/sky', requireKiosk, async (req, res) => {
  const screen = currentKiosk(req);
  assertOwnScreen(screen, { venueId: String(req.params.venueId) });
  const venue = await Venue.findByPk(screen.venueId);
  if (!venue) throw NotFoundError('This screen’s venue no longer exists.');
  const snapshot = await getSkySnapshot(venue.id, nightDateAt(Date.now(), venue.timeZone));
  res.json({ data: presentSkySnapshot(snapshot!) });
});
