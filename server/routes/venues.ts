import { Router } from 'express';
import { SkyQuerySchema, VenueCreateSchema, VenueUpdateSchema } from '@shared/schemas/venue.ts';
import { SkyInputError } from '@shared/sky/errors.ts';
import { nightDateAt } from '@shared/sky/time-zone.ts';
import { computeSkyTonight } from '@shared/sky/tonight.ts';
import { ValidationError } from '../errors.ts';
import { currentUser, requireUser } from '../middlewares/authenticate.ts';
import { validate, validateQuery } from '../middlewares/validate.ts';
import { Venue } from '../models/index.ts';
import { authorize } from '../policies/index.ts';
import { presentSkySnapshot } from '../presenters/kiosk-screen.ts';
import { presentVenue, presentVenueChoice } from '../presenters/venue.ts';
import { countScreens, countScreensByVenue } from '../services/publishing/index.ts';
import { getSkySnapshot, createVenue, deleteVenue, updateVenue } from '../services/sky/index.ts';
import { loadVenue } from './load.ts';
import { venueScreensRouter } from './venue-screens.ts';

export const venuesRouter = Router();
venuesRouter.use(requireUser);

venuesRouter.get('/', async (req, res) => {
  const viewer = currentUser(req);
  authorize(viewer, 'venue', 'list');
  const [venues, counts] = await Promise.all([Venue.findAll({ order: [['name', 'ASC']] }), countScreensByVenue()]);
  res.json({ data: venues.map((v) => presentVenue(v, viewer, counts.get(v.id) ?? 0)) });
});

/** The venues to choose from (e.g. the venue a statement is for): names only, for every member of staff. */
venuesRouter.get('/choices', async (req, res) => {
  authorize(currentUser(req), 'venue', 'choose');
  res.json({
    data: (await Venue.findAll({ attributes: ['id', 'name', 'timeZone'], order: [['name', 'ASC']] })).map(presentVenueChoice),
  });
});

venuesRouter.post('/', validate(VenueCreateSchema), async (req, res) => {
  const viewer = currentUser(req);
  authorize(viewer, 'venue', 'create');
  const venue = await createVenue(req.body, viewer, req.ip);
  res.status(201).json({ data: presentVenue(venue, viewer, 0) });
});

venuesRouter.get('/:id', async (req, res) => {
  const viewer = currentUser(req);
  const venue = await loadVenue(req.params.id);
  authorize(viewer, 'venue', 'read', venue);
  res.json({ data: presentVenue(venue, viewer, await countScreens(venue)) });
});

venuesRouter.patch('/:id', validate(VenueUpdateSchema), async (req, res) => {
  const viewer = currentUser(req);
  const venue = await loadVenue(req.params.id);
  authorize(viewer, 'venue', 'update', venue);
  const updated = await updateVenue(venue, req.body, viewer, req.ip);
  res.json({ data: presentVenue(updated, viewer, await countScreens(venue)) });
});

venuesRouter.delete('/:id', async (req, res) => {
  const viewer = currentUser(req);
  const venue = await loadVenue(req.params.id);
  authorize(viewer, 'venue', 'delete', venue);
  await deleteVenue(venue, viewer, req.ip);
  res.status(204).end();
});

/** The sky for a night: the stored snapshot, or for a chosen clock time a fresh one that is not kept. */
venuesRouter.get('/:id/sky', validateQuery(SkyQuerySchema), async (req, res) => {
  const viewer = currentUser(req);
  const venue = await loadVenue(req.params.id);
  authorize(viewer, 'venue', 'readSky', venue);
  const query = req.query;
  const localDate = query.date ?? nightDateAt(Date.now(), venue.timeZone);
  if (query.at) {
    try {
      const now = new Date();
      const sky = computeSkyTonight({
        latitude: venue.latitude,
        longitude: venue.longitude,
        elevationM: venue.elevationM,
        timeZone: venue.timeZone,
        localDate,
        observeAt: query.at,
        now,
      });
      return res.json({ data: presentSkySnapshot({ venueId: venue.id, localDate, computedAt: now, data: sky }, false) });
    } catch (err) {
      if (err instanceof SkyInputError)
        throw ValidationError(err.message, { [err.field === 'localDate' ? 'date' : err.field]: err.message });
      throw err;
    }
  }
  try {
    const snapshot = await getSkySnapshot(venue.id, localDate);
    res.json({ data: presentSkySnapshot(snapshot!) });
  } catch (err) {
    if (err instanceof SkyInputError)
      throw ValidationError(err.message, { [err.field === 'localDate' ? 'date' : err.field]: err.message });
    throw err;
  }
});

venuesRouter.use('/:venueId/screens', venueScreensRouter);
