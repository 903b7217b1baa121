import { Router } from 'express';
import { ScreenCreateSchema, type PairingCodeDto } from '@shared/schemas/kiosk.ts';
import { getSequelize } from '../db.ts';
import { ConflictError } from '../errors.ts';
import { currentUser } from '../middlewares/authenticate.ts';
import { validate } from '../middlewares/validate.ts';
import { KioskScreen } from '../models/index.ts';
import { authorize } from '../policies/index.ts';
import { presentKioskScreen } from '../presenters/kiosk-screen.ts';
import { recordAudit } from '../services/audit.ts';
import { issuePairingCode, revokeScreen } from '../services/kiosk-pairing.ts';
import { loadScreen, loadVenue } from './load.ts';

/** Screens of the venue in the URL; requireUser runs in the parent router. */
export const venueScreensRouter = Router({ mergeParams: true });

const params = (p: unknown) => p as { venueId: string; screenId: string };

venueScreensRouter.get('/', async (req, res) => {
  const viewer = currentUser(req);
  const venue = await loadVenue(params(req.params).venueId);
  authorize(viewer, 'venue', 'read', venue);
  const screens = await KioskScreen.findAll({ where: { venueId: venue.id }, order: [['name', 'ASC']] });
  res.json({ data: screens.map((s) => presentKioskScreen(s)) });
});

venueScreensRouter.post('/', validate(ScreenCreateSchema), async (req, res) => {
  const viewer = currentUser(req);
  const venue = await loadVenue(params(req.params).venueId);
  authorize(viewer, 'venue', 'manageScreens', venue);
  const { name } = req.body;
  const sequelize = getSequelize();
  const clash = await KioskScreen.findOne({
    where: sequelize.and(
      { venueId: venue.id },
      sequelize.where(sequelize.fn('lower', sequelize.col('name')), name.toLowerCase()),
    ),
  });
  if (clash) throw ConflictError(`This venue already has a screen called "${clash.name}".`, 'screen_name_taken');
  const screen = await getSequelize().transaction(async (transaction) => {
    const created = await KioskScreen.create({ venueId: venue.id, name }, { transaction });
    await recordAudit(
      {
        actorId: viewer.id,
        action: 'kiosk.screen_added',
        subjectType: 'kiosk_screen',
        subjectId: created.id,
        data: { venueId: venue.id, name },
        ip: req.ip,
      },
      transaction,
    );
    return created;
  });
  const { code, expiresAt } = await issuePairingCode(screen, viewer, req.ip);
  const body: PairingCodeDto = { screen: presentKioskScreen(screen), pairingCode: code, expiresAt: expiresAt.toISOString() };
  res.status(201).json({ data: body });
});

/** Re-pair: a new one-time code; the screen's current token keeps working until the code is used. */
venueScreensRouter.post('/:screenId/pairing', async (req, res) => {
  const viewer = currentUser(req);
  const venue = await loadVenue(params(req.params).venueId);
  authorize(viewer, 'venue', 'manageScreens', venue);
  const screen = await loadScreen(venue, params(req.params).screenId);
  const { code, expiresAt } = await issuePairingCode(screen, viewer, req.ip);
  const body: PairingCodeDto = { screen: presentKioskScreen(screen), pairingCode: code, expiresAt: expiresAt.toISOString() };
  res.status(201).json({ data: body });
});

venueScreensRouter.post('/:screenId/revoke', async (req, res) => {
  const viewer = currentUser(req);
  const venue = await loadVenue(params(req.params).venueId);
  authorize(viewer, 'venue', 'manageScreens', venue);
  const screen = await revokeScreen(await loadScreen(venue, params(req.params).screenId), viewer, req.ip);
  res.json({ data: presentKioskScreen(screen) });
});

venueScreensRouter.delete('/:screenId', async (req, res) => {
  const viewer = currentUser(req);
  const venue = await loadVenue(params(req.params).venueId);
  authorize(viewer, 'venue', 'manageScreens', venue);
  const screen = await loadScreen(venue, params(req.params).screenId);
  await getSequelize().transaction(async (transaction) => {
    await recordAudit(
      {
        actorId: viewer.id,
        action: 'kiosk.screen_removed',
        subjectType: 'kiosk_screen',
        subjectId: screen.id,
        data: { venueId: venue.id, name: screen.name },
        ip: req.ip,
      },
      transaction,
    );
    await screen.destroy({ transaction });
  });
  res.status(204).end();
});
