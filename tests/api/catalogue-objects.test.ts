import supertest from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent, SkyObject } from '../../server/models/index.ts';
import { getTestApp, resetDatabase, signedInAgent } from '../support/app.ts';
import { buildMeasurement, buildSkyObject, buildSource } from '../support/catalogue.ts';

beforeAll(async () => {
  await getTestApp();
  await resetDatabase();
});

describe('catalogue objects', () => {
  it('a reviewer adds an object in sexagesimal and gets degrees and the constellation back', async () => {
    const { agent } = await signedInAgent('reviewer');
    // Betelgeuse, J2000 position recalled from memory (SIMBAD-style rounding); it lies in Orion.
    const res = await agent
      .post('/api/catalogue/objects')
      .send({ name: 'Betelgeuse', designations: 'α Ori, HD 39801', kind: 'star', ra: '05h 55m 10.3s', dec: '+07° 24′ 25″' });
    expect(res.status).toBe(201);
    expect(res.body.data).toMatchObject({
      name: 'Betelgeuse',
      kind: 'star',
      constellation: 'Ori',
      designations: ['α Ori', 'HD 39801'],
    });
    expect(res.body.data.raDeg).toBeCloseTo(88.7929, 3);
    expect(res.body.data.decDeg).toBeCloseTo(7.4069, 3);
    expect(await AuditEvent.count({ where: { action: 'catalogue.object_created' } })).toBe(1);
  });

  it('the object’s history ends with its creation: who created it and when, after every measurement event', async () => {
    const { agent, user } = await signedInAgent('reviewer');
    const created = await agent
      .post('/api/catalogue/objects')
      .send({ name: 'Corrie Vale test nebula (demo)', kind: 'nebula', ra: '05 35 17.3', dec: '-05 23 28' });
    expect(created.status).toBe(201);
    const id = created.body.data.id as string;
    const empty = await agent.get(`/api/catalogue/objects/${id}/history`);
    expect(empty.status).toBe(200);
    expect(empty.body.data).toEqual([
      expect.objectContaining({
        action: 'object_created',
        measurementId: null,
        changedBy: user.name,
        newValues: { name: 'Corrie Vale test nebula (demo)', kind: 'nebula' },
        createdAt: expect.any(String),
      }),
    ]);
    const source = await buildSource();
    const added = await agent
      .post(`/api/catalogue/objects/${id}/measurements`)
      .send({ quantity: 'redshift', value: 0.001, sourceId: source.id });
    expect(added.status).toBe(201);
    const { agent: writer } = await signedInAgent('writer');
    const after = (await writer.get(`/api/catalogue/objects/${id}/history`)).body.data as Array<{ action: string }>;
    expect(after.map((h) => h.action)).toEqual(['created', 'object_created']);
  });

  it('accepts decimal degrees, and recomputes the constellation when the position changes', async () => {
    const { agent } = await signedInAgent('admin');
    const created = await agent
      .post('/api/catalogue/objects')
      .send({ name: 'Moving Test', kind: 'galaxy', ra: 10.6847, dec: 41.269 });
    expect(created.body.data.constellation).toBe('And');
    // The quasar 3C 279's position (recalled from memory) is in Virgo.
    const moved = await agent
      .patch(`/api/catalogue/objects/${created.body.data.id}`)
      .send({ name: 'Moving Test', kind: 'galaxy', ra: '12 56 11.2', dec: '-05 47 22' });
    expect(moved.status).toBe(200);
    expect(moved.body.data.constellation).toBe('Vir');
  });

  it('a planet has no position; a star without one is refused on the field', async () => {
    const { agent } = await signedInAgent('reviewer');
    const planet = await agent.post('/api/catalogue/objects').send({ name: 'Neptune', kind: 'planet' });
    expect(planet.status).toBe(201);
    expect(planet.body.data).toMatchObject({ raDeg: null, decDeg: null, constellation: null });
    const star = await agent.post('/api/catalogue/objects').send({ name: 'Nameless Star', kind: 'star', ra: '', dec: '' });
    expect(star.status).toBe(400);
    expect(star.body.error.fields).toMatchObject({
      ra: expect.stringMatching(/right ascension/i),
      dec: expect.stringMatching(/declination/i),
    });
    const withPosition = await agent
      .post('/api/catalogue/objects')
      .send({ name: 'Uranus', kind: 'planet', ra: '1 2 3', dec: '4' });
    expect(withPosition.status).toBe(400);
    expect(withPosition.body.error.fields.ra).toMatch(/move across the sky/);
  });

  it('refuses impossible coordinates with messages on the fields', async () => {
    const { agent } = await signedInAgent('reviewer');
    const res = await agent
      .post('/api/catalogue/objects')
      .send({ name: 'Bad Place', kind: 'star', ra: '25h 00m 00s', dec: '+95' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.ra).toMatch(/360° or 24h/);
    expect(res.body.error.fields.dec).toMatch(/−90° and \+90°/);
    const minutes = await agent
      .post('/api/catalogue/objects')
      .send({ name: 'Bad Place', kind: 'star', ra: '05 61 00', dec: 'north' });
    expect(minutes.body.error.fields.ra).toMatch(/less than 60/);
    expect(minutes.body.error.fields.dec).toMatch(/Write declination/);
    expect(await SkyObject.count({ where: { name: 'Bad Place' } })).toBe(0);
  });

  it('names are unique ignoring case', async () => {
    const { agent } = await signedInAgent('reviewer');
    await agent.post('/api/catalogue/objects').send({ name: 'Vega', kind: 'star', ra: 279.2347, dec: 38.7837 });
    const again = await agent.post('/api/catalogue/objects').send({ name: 'VEGA', kind: 'star', ra: 279.2347, dec: 38.7837 });
    expect(again.status).toBe(409);
    expect(again.body.error.message).toMatch(/already an object named "Vega"/);
  });

  it('writers and editors read the catalogue but cannot add objects; visitors are asked to sign in', async () => {
    for (const role of ['writer', 'editor'] as const) {
      const { agent } = await signedInAgent(role);
      expect((await agent.get('/api/catalogue/objects')).status).toBe(200);
      expect((await agent.post('/api/catalogue/objects').send({ name: 'Nope', kind: 'star', ra: 1, dec: 1 })).status).toBe(403);
    }
    const anonymous = supertest(await getTestApp());
    expect((await anonymous.get('/api/catalogue/objects')).status).toBe(401);
  });

  it('lists with filters, sort and server-side pages', async () => {
    const { agent } = await signedInAgent('reviewer');
    for (let i = 0; i < 7; i += 1) await buildSkyObject({ name: `Pager Quasar ${String(i).padStart(2, '0')}`, kind: 'quasar' });
    const withRedshift = await buildSkyObject({ name: 'Pager Quasar 99', kind: 'quasar' });
    await buildMeasurement(withRedshift.id, { quantity: 'redshift', preferred: false });
    const page2 = await agent
      .get('/api/catalogue/objects')
      .query({ kind: 'quasar', q: 'pager', sort: 'name', dir: 'desc', page: 2, pageSize: 3 });
    expect(page2.status).toBe(200);
    expect(page2.body.data.total).toBe(8);
    expect(page2.body.data.rows.map((r: { name: string }) => r.name)).toEqual([
      'Pager Quasar 04',
      'Pager Quasar 03',
      'Pager Quasar 02',
    ]);
    // "missing redshift" means no preferred redshift: an unpreferred one does not count.
    const missing = await agent.get('/api/catalogue/objects').query({ q: 'pager', missing: 'redshift', pageSize: 50 });
    expect(missing.body.data.total).toBe(8);
  });

  it('refuses a bad list query with a clear message', async () => {
    const { agent } = await signedInAgent('writer');
    const res = await agent.get('/api/catalogue/objects').query({ sort: 'brightness', pageSize: 5000 });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.sort).toMatch(/Sort by one of name/);
    expect(res.body.error.fields.pageSize).toMatch(/At most 200/);
  });

  it('deletes only an object without measurements', async () => {
    const { agent } = await signedInAgent('reviewer');
    const kept = await buildSkyObject();
    await buildMeasurement(kept.id);
    const refused = await agent.delete(`/api/catalogue/objects/${kept.id}`);
    expect(refused.status).toBe(409);
    expect(refused.body.error.message).toMatch(/1 measurement with history/);
    const empty = await buildSkyObject();
    expect((await agent.delete(`/api/catalogue/objects/${empty.id}`)).status).toBe(204);
    expect((await agent.get(`/api/catalogue/objects/${empty.id}`)).status).toBe(404);
    expect((await agent.get('/api/catalogue/objects/not-a-uuid')).status).toBe(404);
  });
});
