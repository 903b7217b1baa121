import { Router } from 'express';
import { ScreenCreateSchema, ScreenUpdateSchema, type PairingCodeDto } from '@shared/schemas/kiosk.ts';
import { currentUser } from '../middlewares/authenticate.ts';
import { validate } from '../middlewares/validate.ts';
import { authorize } from '../policies/index.ts';
import { presentKioskScreen } from '../presenters/kiosk-screen.ts';
import {
  issuePairingCode,
  revokeScreen,
  addScreen,
  listScreens,
  playerAddress,
  removeScreen,
  setScreenLanguage,
  setScreenOrientation,
} from '../services/publishing/index.ts';
import { loadScreen, loadVenue, parentParam } from './load.ts';

/** The one-time code with the player's address and its QR code, for the admin to set the screen up. */
function pairingBody(screen: Parameters<typeof presentKioskScreen>[0], code: string, expiresAt: Date): PairingCodeDto {
  const { url, qr } = playerAddress();
  return {
    screen: presentKioskScreen(screen),
    pairingCode: code,
    expiresAt: expiresAt.toISOString(),
    playerUrl: url,
    playerQr: qr,
  };
}

/** Screens of the venue in the URL; requireUser runs in the parent router. */
export const venueScreensRouter = Router({ mergeParams: true });

venueScreensRouter.get('/', async (req, res) => {
  const viewer = currentUser(req);
  const venue = await loadVenue(parentParam(req, 'venueId'));
  authorize(viewer, 'venue', 'read', venue);
  const screens = await listScreens(venue);
  res.json({ data: screens.map((s) => presentKioskScreen(s)) });
});

venueScreensRouter.post('/', validate(ScreenCreateSchema), async (req, res) => {
  const viewer = currentUser(req);
  const venue = await loadVenue(parentParam(req, 'venueId'));
  authorize(viewer, 'venue', 'manageScreens', venue);
  const screen = await addScreen(venue, req.body.name, viewer, req.ip);
  const { code, expiresAt } = await issuePairingCode(screen, viewer, req.ip);
  const body = pairingBody(screen, code, expiresAt);
  res.status(201).json({ data: body });
});

/** Re-pair: a new one-time code; the screen's current token keeps working until the code is used. */
venueScreensRouter.post('/:screenId/pairing', async (req, res) => {
  const viewer = currentUser(req);
  const venue = await loadVenue(parentParam(req, 'venueId'));
  authorize(viewer, 'venue', 'manageScreens', venue);
  const screen = await loadScreen(venue, req.params.screenId);
  const { code, expiresAt } = await issuePairingCode(screen, viewer, req.ip);
  const body = pairingBody(screen, code, expiresAt);
  res.status(201).json({ data: body });
});

venueScreensRouter.post('/:screenId/revoke', async (req, res) => {
  const viewer = currentUser(req);
  const venue = await loadVenue(parentParam(req, 'venueId'));
  authorize(viewer, 'venue', 'manageScreens', venue);
  const screen = await revokeScreen(await loadScreen(venue, req.params.screenId), viewer, req.ip);
  res.json({ data: presentKioskScreen(screen) });
});

/**
 * How the screen hangs (auto, landscape, portrait) and/or the one language it plays (null: alternate
 * between its channel's); its player follows at its next heartbeat.
 */
venueScreensRouter.patch('/:screenId', validate(ScreenUpdateSchema), async (req, res) => {
  const viewer = currentUser(req);
  const venue = await loadVenue(parentParam(req, 'venueId'));
  authorize(viewer, 'venue', 'manageScreens', venue);
  let screen = await loadScreen(venue, req.params.screenId);
  if (req.body.language !== undefined) screen = await setScreenLanguage(screen, req.body.language, viewer, req.ip);
  if (req.body.orientation !== undefined) screen = await setScreenOrientation(screen, req.body.orientation, viewer, req.ip);
  res.json({ data: presentKioskScreen(screen) });
});

venueScreensRouter.delete('/:screenId', async (req, res) => {
  const viewer = currentUser(req);
  const venue = await loadVenue(parentParam(req, 'venueId'));
  authorize(viewer, 'venue', 'manageScreens', venue);
  const screen = await loadScreen(venue, req.params.screenId);
  await removeScreen(screen, viewer, req.ip);
  res.status(204).end();
});
