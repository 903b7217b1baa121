import { QueryTypes } from 'sequelize';
import { beforeAll, describe, expect, it } from 'vitest';
import { getSequelize } from '../../server/db.ts';
import { Measurement } from '../../server/models/index.ts';
import { EXACT_COUNT_CAP } from '../../server/services/catalogue/sky-object-list.ts';
import { getTestApp, resetDatabase, signedInAgent } from '../support/app.ts';
import { buildMeasurement, buildSkyObject, buildSource } from '../support/catalogue.ts';

beforeAll(async () => {
  await getTestApp();
  await resetDatabase();
});

const names = (res: { body: { data: { rows: Array<{ name: string }> } } }) => res.body.data.rows.map((r) => r.name);

describe('the catalogue table at scale', () => {
  it('pages by keyset cursor exactly as by page number, in both directions and by kind', async () => {
    const { agent } = await signedInAgent('writer');
    for (let i = 0; i < 9; i += 1)
      await buildSkyObject({ name: `Keyset Nebula ${String(i).padStart(2, '0')}`, kind: i % 2 ? 'nebula' : 'cluster' });
    for (const sort of ['name', 'kind'] as const)
      for (const dir of ['asc', 'desc'] as const) {
        const query = { q: 'keyset', sort, dir, pageSize: 4 };
        const first = await agent.get('/api/catalogue/objects').query({ ...query, page: 1 });
        const byOffset = await agent.get('/api/catalogue/objects').query({ ...query, page: 2 });
        expect(first.body.data.nextAfter).toEqual(expect.any(String));
        const byCursor = await agent.get('/api/catalogue/objects').query({ ...query, page: 2, after: first.body.data.nextAfter });
        expect(byCursor.status).toBe(200);
        expect(names(byCursor)).toEqual(names(byOffset));
        expect(names(byCursor)).toHaveLength(4);
        // The last page hands out no cursor.
        const last = await agent.get('/api/catalogue/objects').query({ ...query, page: 3, after: byCursor.body.data.nextAfter });
        expect(names(last)).toHaveLength(1);
        expect(last.body.data.nextAfter).toBeNull();
      }
  });

  it('refuses a cursor that is not one, or belongs to another sort, in words', async () => {
    const { agent } = await signedInAgent('writer');
    const forged = Buffer.from(JSON.stringify(['x'])).toString('base64url');
    for (const after of [forged, 'not-base64-json', "'; DROP TABLE sky_objects; --"]) {
      const res = await agent.get('/api/catalogue/objects').query({ sort: 'name', after });
      expect(res.status, after).toBe(400);
      expect(res.body.error.message).toMatch(/after/);
    }
    // Sorts without a keyset (constellation) refuse a cursor rather than ignore it.
    const first = await agent.get('/api/catalogue/objects').query({ sort: 'name', pageSize: 1 });
    const other = await agent.get('/api/catalogue/objects').query({ sort: 'constellation', after: first.body.data.nextAfter });
    expect(other.status).toBe(400);
  });

  it('"missing …" follows preferred values as they are set, unset, moved and removed', async () => {
    const { agent } = await signedInAgent('reviewer');
    const object = await buildSkyObject({ name: 'Trigger Galaxy', kind: 'galaxy' });
    const missing = async (quantity: string) =>
      names(await agent.get('/api/catalogue/objects').query({ q: 'trigger', missing: quantity })).length === 1;
    expect(await missing('redshift')).toBe(true);
    expect(await missing('any_preferred')).toBe(true);
    const source = await buildSource({ citation: 'Trigger Survey (demo, 2026)' });
    const redshift = await buildMeasurement(object.id, { quantity: 'redshift', preferred: true, sourceId: source.id });
    expect(await missing('redshift')).toBe(false);
    expect(await missing('any_preferred')).toBe(false);
    expect(await missing('distance')).toBe(true);
    await redshift.update({ preferred: false });
    expect(await missing('redshift')).toBe(true);
    await redshift.update({ preferred: true });
    // Several rows in one statement (as a CSV import writes them).
    await Measurement.update({ preferred: false }, { where: { skyObjectId: object.id } });
    expect(await missing('redshift')).toBe(true);
    await redshift.update({ preferred: true });
    await redshift.destroy();
    expect(await missing('redshift')).toBe(true);
    expect(await missing('any_preferred')).toBe(true);
  });

  it('asks PostgreSQL to cost random reads as solid-state storage does, so the partial indexes are chosen', async () => {
    const [row] = await getSequelize().query<{ random_page_cost: string }>('SHOW random_page_cost', { type: QueryTypes.SELECT });
    expect(row.random_page_cost).toBe('1.1');
  });

  it(`counts exactly up to ${EXACT_COUNT_CAP.toLocaleString('en-GB')} and says "about" beyond`, async () => {
    const { agent } = await signedInAgent('writer');
    const small = await agent.get('/api/catalogue/objects').query({ q: 'keyset' });
    expect(small.body.data).toMatchObject({ total: 9, totalExact: true });
    await getSequelize().query(
      `INSERT INTO sky_objects (id, name, designations, kind, notes, created_at, updated_at)
       SELECT gen_random_uuid(), 'Many Star ' || lpad(i::text, 6, '0'), '{}', 'star', '', now(), now()
       FROM generate_series(1, ${EXACT_COUNT_CAP + 500}) AS i`,
    );
    await getSequelize().query('ANALYZE sky_objects', { type: QueryTypes.RAW });
    const big = await agent.get('/api/catalogue/objects').query({ kind: 'star' });
    expect(big.status).toBe(200);
    expect(big.body.data.totalExact).toBe(false);
    // The planner's estimate, rounded to two figures, and never below what was counted.
    expect(big.body.data.total).toBeGreaterThan(EXACT_COUNT_CAP);
    expect(big.body.data.total).toBeLessThan(2 * (EXACT_COUNT_CAP + 500));
    expect(big.body.data.rows).toHaveLength(50);
  });
});
