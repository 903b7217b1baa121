import { beforeAll, describe, expect, it } from 'vitest';
import { nightDateAt } from '../../shared/sky/time-zone.ts';
import { SKY_VERSION } from '../../shared/sky/types.ts';
import { SkySnapshot, Venue } from '../../server/models/index.ts';
import { getSkySnapshot, refreshAllVenueSkies } from '../../server/services/sky/sky-snapshots.ts';
import { getTestApp, resetDatabase, signedInAgent } from '../support/app.ts';

beforeAll(async () => {
  await getTestApp();
  await resetDatabase();
});

async function makeVenue(name: string, latitude: number, longitude: number, timeZone: string) {
  return Venue.create({ name, latitude, longitude, elevationM: 0, timeZone });
}

describe('sky snapshots', () => {
  it('GET /sky computes a missing snapshot once, stores it, and serves it again', async () => {
    const venue = await makeVenue('Snapshot Dome', 55.95, -3.19, 'Europe/London');
    const { agent } = await signedInAgent('editor');
    const first = await agent.get(`/api/venues/${venue.id}/sky?date=2026-10-10`);
    expect(first.status).toBe(200);
    expect(first.body.data).toMatchObject({ localDate: '2026-10-10', stored: true });
    expect(first.body.data.sky.planets.map((p: { name: string }) => p.name)).toEqual([
      'Mercury',
      'Venus',
      'Mars',
      'Jupiter',
      'Saturn',
      'Uranus',
      'Neptune',
    ]);
    const second = await agent.get(`/api/venues/${venue.id}/sky?date=2026-10-10`);
    expect(second.body.data.computedAt).toBe(first.body.data.computedAt);
    expect(await SkySnapshot.count({ where: { venueId: venue.id, localDate: '2026-10-10' } })).toBe(1);
  });

  it('a chosen clock time is computed on the spot and not stored', async () => {
    const venue = await makeVenue('Chosen Time Dome', 55.95, -3.19, 'Europe/London');
    const { agent } = await signedInAgent('writer');
    const res = await agent.get(`/api/venues/${venue.id}/sky?date=2026-10-10&at=23:30`);
    expect(res.status).toBe(200);
    expect(res.body.data.stored).toBe(false);
    expect(res.body.data.sky.observation).toMatchObject({ basis: 'chosen', localTime: '23:30' });
    expect(await SkySnapshot.count({ where: { venueId: venue.id } })).toBe(0);
  });

  it('refuses an impossible date or a badly written time with the field named', async () => {
    const venue = await makeVenue('Bad Query Dome', 10, 10, 'Africa/Lagos');
    const { agent } = await signedInAgent('admin');
    const badDate = await agent.get(`/api/venues/${venue.id}/sky?date=2026-02-30`);
    expect(badDate.status).toBe(400);
    expect(badDate.body.error.fields.date).toMatch(/real calendar date/);
    const badTime = await agent.get(`/api/venues/${venue.id}/sky?at=25:00`);
    expect(badTime.status).toBe(400);
    expect(badTime.body.error.fields.at).toMatch(/HH:MM/);
  });

  it('moving a venue replaces its stored skies at once (never served stale)', async () => {
    const { agent } = await signedInAgent('admin');
    const created = (
      await agent
        .post('/api/venues')
        .send({ name: 'Moving Dome', latitude: 40, longitude: -3.7, elevationM: 600, timeZone: 'Europe/Madrid' })
    ).body.data;
    const tonight = nightDateAt(Date.now(), 'Europe/Madrid');
    const before = await SkySnapshot.findOne({ where: { venueId: created.id, localDate: tonight } });
    expect(before!.data.observer.latitude).toBe(40);
    expect(
      (await agent.patch(`/api/venues/${created.id}`).send({ latitude: -33.9, longitude: 18.4, timeZone: 'Africa/Johannesburg' }))
        .status,
    ).toBe(200);
    const tonightThere = nightDateAt(Date.now(), 'Africa/Johannesburg');
    const after = await SkySnapshot.findOne({ where: { venueId: created.id, localDate: tonightThere } });
    expect(after!.data.observer).toMatchObject({ latitude: -33.9, longitude: 18.4 });
    expect(after!.data.timeZone).toBe('Africa/Johannesburg');
    const res = await agent.get(`/api/venues/${created.id}/sky?date=${tonightThere}`);
    expect(res.body.data.sky.observer.latitude).toBe(-33.9);
  });

  it('a snapshot stored by older rules is recomputed before it is served', async () => {
    const venue = await makeVenue('Old Rules Dome', 54.62, -2.95, 'Europe/London');
    const first = await getSkySnapshot(venue.id, '2026-11-20');
    expect(first!.data.version).toBe(SKY_VERSION);
    await SkySnapshot.sequelize!.query(`UPDATE sky_snapshots SET data = jsonb_set(data, '{version}', '1') WHERE id = :id`, {
      replacements: { id: first!.id },
    });
    const again = await getSkySnapshot(venue.id, '2026-11-20');
    expect(again!.data.version).toBe(SKY_VERSION);
    expect(again!.data.planets.every((p) => p.times.earlierSet !== undefined)).toBe(true);
    expect(await SkySnapshot.count({ where: { venueId: venue.id } })).toBe(1);
  });

  it('a venue at the north pole says in words that planets do not rise or set', async () => {
    const venue = await makeVenue('North Pole Dome', 90, 0, 'UTC');
    const snapshot = await getSkySnapshot(venue.id, '2026-06-21');
    const sky = snapshot!.data;
    for (const planet of sky.planets) {
      expect(planet.times.state).not.toBe('rises-and-sets');
      expect(planet.times.rise.utc).toBeNull();
      expect(planet.times.rise.text).toMatch(/^Does not (rise|set)/);
      expect(planet.times.set.text).toMatch(/^Does not (rise|set)/);
    }
    expect(sky.sun.sunset.text).toMatch(/does not set/);
    expect(sky.sun.darkness.kind).toBe('no-night');
  });

  it('the daily refresh computes tonight and tomorrow for every venue, and only once', async () => {
    await resetDatabase();
    const venue = await makeVenue('Daily Dome', -36.85, 174.76, 'Pacific/Auckland');
    expect(await refreshAllVenueSkies()).toBe(2);
    expect(await SkySnapshot.count({ where: { venueId: venue.id } })).toBe(2);
    expect(await refreshAllVenueSkies()).toBe(0);
  });

  it('getSkySnapshot returns null for an unknown venue', async () => {
    expect(await getSkySnapshot('00000000-0000-4000-8000-000000000000', '2026-01-01')).toBeNull();
  });
});
