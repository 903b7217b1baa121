import { beforeAll, describe, expect, it } from 'vitest';
import { getTestApp, resetDatabase } from '../support/app.ts';
import { buildAccessWorld, callAs, fillPath, sampleInput } from '../support/access-fixtures.ts';
import { listRoutes, type RouteEntry } from '../support/routes.ts';

/**
 * One rule for a record named in the URL (server/routes/load.ts): an id with no record, and a
 * malformed id, answer 404 `not_found` to every member of staff, on every route of every router.
 * A 403 is kept for "this record exists and your role may not do this".
 */
const STAFF = ['writer', 'reviewer', 'editor', 'admin'] as const;
const UNKNOWN = '00000000-0000-4000-8000-000000000000';
const MALFORMED = 'not-an-id';

// Public pages take a slug or an id, media files a file name, and a kiosk asking about a venue
// other than its own is refused by design: none of them names a staff record by id.
const RECORD_PARAM = /:(id|venueId|screenId)\b/;
const hasRecordParam = (r: RouteEntry) =>
  RECORD_PARAM.test(r.path) && !/^\/api\/(public|kiosk)\//.test(r.path) && !r.path.startsWith('/media/');

let world: Awaited<ReturnType<typeof buildAccessWorld>>;
let routes: RouteEntry[];

beforeAll(async () => {
  const app = await getTestApp();
  await resetDatabase();
  routes = listRoutes(app).filter(hasRecordParam);
  world = await buildAccessWorld();
});

describe('a missing record is 404 in every router', () => {
  it('covers the routers that load a record by id', () => {
    const prefixes = new Set(routes.map((r) => r.path.split('/').slice(0, 3).join('/')));
    for (const prefix of [
      '/api/users',
      '/api/pages',
      '/api/statements',
      '/api/media',
      '/api/catalogue',
      '/api/venues',
      '/api/channels',
    ])
      expect(prefixes, prefix).toContain(prefix);
  });

  for (const [label, badId] of [
    ['an unknown id', UNKNOWN],
    ['a malformed id', MALFORMED],
  ] as const) {
    it(`${label} answers 404 not_found to every staff role`, async () => {
      const wrong: string[] = [];
      for (const route of routes) {
        const key = `${route.method} ${route.path}`;
        const input = sampleInput(key, world.ids, world.page.version);
        // The outermost record in the path is the missing one; the rest are real rows.
        const path = fillPath(route.path.replace(RECORD_PARAM, badId), world.ids) + (input.query ? `?${input.query}` : '');
        for (const role of STAFF) {
          const res = await callAs(role, world, route.method, path, input.body);
          if (res.status !== 404 || res.body?.error?.code !== 'not_found')
            wrong.push(`${key} as ${role}: ${res.status} ${JSON.stringify(res.body?.error ?? null)}`);
        }
      }
      expect(wrong).toEqual([]);
    });
  }

  it('an editor asking for a page that does not exist is told it is not found, not refused', async () => {
    const res = await world.signed.editor.agent.get(`/api/pages/${UNKNOWN}`);
    expect(res.status).toBe(404);
    expect(res.body.error).toEqual({ code: 'not_found', message: 'There is no page with that id.' });
  });

  it('a screen id of no screen at a real venue is not found', async () => {
    const res = await world.signed.admin.agent.post(`/api/venues/${world.ids.venue}/screens/${UNKNOWN}/pairing`);
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not_found');
  });

  it('a record that exists but the role may not touch is still 403', async () => {
    const res = await world.signed.writer.agent.get(`/api/pages/${world.page.id}`);
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('forbidden');
  });
});
