import supertest from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent, KioskScreen, SkySnapshot, Venue } from '../../server/models/index.ts';
import { getTestApp, resetDatabase, signedInAgent } from '../support/app.ts';

beforeAll(async () => {
  await getTestApp();
  await resetDatabase();
});

// An invented venue; the coordinates are those of a small Welsh town (common practice: any real place will do).
const VALID = { name: 'Harrowgate Science Dome', latitude: 52.4, longitude: -4.08, elevationM: 20, timeZone: 'Europe/London' };

describe('venues (admin manages, editor reads)', () => {
  it('an admin creates a venue; its time zone is stored under the canonical name and its sky is computed', async () => {
    const { agent } = await signedInAgent('admin');
    const res = await agent.post('/api/venues').send({ ...VALID, name: 'Tidewell Observatory', timeZone: 'europe/lisbon' });
    expect(res.status).toBe(201);
    expect(res.body.data).toMatchObject({
      name: 'Tidewell Observatory',
      timeZone: 'Europe/Lisbon',
      screenCount: 0,
      can: { update: true },
    });
    expect(await SkySnapshot.count({ where: { venueId: res.body.data.id } })).toBe(2);
    expect(await AuditEvent.count({ where: { action: 'venue.created', subjectId: res.body.data.id } })).toBe(1);
  });

  it('refuses a time zone that does not exist, naming the field, and writes nothing', async () => {
    const { agent } = await signedInAgent('admin');
    const res = await agent.post('/api/venues').send({ ...VALID, name: 'Nowhere Dome', timeZone: 'Mars/Olympus_Mons' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.timeZone).toMatch(/not a time zone/);
    expect(await Venue.count({ where: { name: 'Nowhere Dome' } })).toBe(0);
  });

  it.each([
    ['latitude', { latitude: 91 }, /−90 .* 90/],
    ['latitude', { latitude: -90.5 }, /−90 .* 90/],
    ['longitude', { longitude: 181 }, /−180 to 180/],
    ['latitude', { latitude: 'north' }, /as a number/],
  ])('refuses %s out of range or not a number (%j)', async (field, change, message) => {
    const { agent } = await signedInAgent('admin');
    const res = await agent.post('/api/venues').send({ ...VALID, name: 'Out Of Range Dome', ...change });
    expect(res.status).toBe(400);
    expect(res.body.error.fields[field]).toMatch(message);
    expect(await Venue.count({ where: { name: 'Out Of Range Dome' } })).toBe(0);
  });

  it('accepts a venue at the north pole', async () => {
    const { agent } = await signedInAgent('admin');
    const res = await agent
      .post('/api/venues')
      .send({ ...VALID, name: 'Pole Station Dome', latitude: 90, longitude: 0, timeZone: 'UTC' });
    expect(res.status).toBe(201);
  });

  it('refuses a duplicate name whatever its letter case', async () => {
    const { agent } = await signedInAgent('admin');
    expect((await agent.post('/api/venues').send(VALID)).status).toBe(201);
    const res = await agent.post('/api/venues').send({ ...VALID, name: VALID.name.toUpperCase() });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('venue_name_taken');
  });

  it('an admin updates and deletes a venue; deleting removes its screens', async () => {
    const { agent } = await signedInAgent('admin');
    const created = (await agent.post('/api/venues').send({ ...VALID, name: 'Short-lived Dome' })).body.data;
    const renamed = await agent.patch(`/api/venues/${created.id}`).send({ name: 'Renamed Dome', elevationM: '35' });
    expect(renamed.status).toBe(200);
    expect(renamed.body.data).toMatchObject({ name: 'Renamed Dome', elevationM: 35 });
    expect((await agent.post(`/api/venues/${created.id}/screens`).send({ name: 'Foyer' })).status).toBe(201);
    expect((await agent.delete(`/api/venues/${created.id}`)).status).toBe(204);
    expect(await KioskScreen.count({ where: { venueId: created.id } })).toBe(0);
    expect((await agent.get(`/api/venues/${created.id}`)).status).toBe(404);
  });

  it('an editor lists and reads venues but cannot change them', async () => {
    const { agent: admin } = await signedInAgent('admin');
    const venue = (await admin.post('/api/venues').send({ ...VALID, name: 'Editor Visible Dome' })).body.data;
    const { agent } = await signedInAgent('editor');
    const list = await agent.get('/api/venues');
    expect(list.status).toBe(200);
    expect(list.body.data.find((v: { id: string }) => v.id === venue.id).can).toEqual({
      update: false,
      delete: false,
      manageScreens: false,
    });
    expect((await agent.get(`/api/venues/${venue.id}/screens`)).status).toBe(200);
    for (const res of [
      await agent.post('/api/venues').send({ ...VALID, name: 'Editor Made Dome' }),
      await agent.patch(`/api/venues/${venue.id}`).send({ name: 'Editor Renamed' }),
      await agent.delete(`/api/venues/${venue.id}`),
      await agent.post(`/api/venues/${venue.id}/screens`).send({ name: 'Sneaky screen' }),
    ]) {
      expect(res.status).toBe(403);
      expect(res.body.error.code).toBe('forbidden');
    }
  });

  it.each(['writer', 'reviewer'] as const)('a %s cannot list venues (403)', async (role) => {
    const { agent } = await signedInAgent(role);
    expect((await agent.get('/api/venues')).status).toBe(403);
  });

  it('anonymous visitors get 401', async () => {
    expect((await supertest(await getTestApp()).get('/api/venues')).status).toBe(401);
  });

  it('a malformed venue id is not found, like a missing one (404, not 500)', async () => {
    const { agent } = await signedInAgent('admin');
    expect((await agent.get('/api/venues/not-a-uuid')).status).toBe(404);
  });
});
