import { beforeAll, describe, expect, it } from 'vitest';
import { getTestApp, resetDatabase } from '../support/app.ts';
import { buildAccessWorld, callAs, CALLERS, fillPath, sampleInput } from '../support/access-fixtures.ts';
import { listRoutes, type RouteEntry } from '../support/routes.ts';

/**
 * The class of answer each caller must get: `ok` is anything but 401/403 (a 404, 409 or 422 from
 * an allowed caller is the route doing its job on the test rows); `401` and `403` are refusals.
 * Columns: anonymous, kiosk token, writer, reviewer, editor, admin. A route the router holds that
 * has no row here fails the suite: add the row when you add the route.
 * Ids are real rows (see tests/support/access-fixtures.ts): the page ids are another writer's
 * unsubmitted draft, or a page in review for the reviewing routes.
 */
type Answer = 'ok' | '401' | '403';
const EXPECTED: Record<string, Answer[]> = {
  'GET /api/kiosk/feed': ['401', 'ok', '401', '401', '401', '401'],
  'GET /api/health': ['ok', 'ok', 'ok', 'ok', 'ok', 'ok'],
  'GET /api/auth/me': ['401', '401', 'ok', 'ok', 'ok', 'ok'],
  'POST /api/auth/sign-in': ['ok', 'ok', 'ok', 'ok', 'ok', 'ok'],
  'POST /api/auth/sign-out': ['ok', 'ok', 'ok', 'ok', 'ok', 'ok'],
  'POST /api/auth/password': ['401', '401', 'ok', 'ok', 'ok', 'ok'],
  'POST /api/auth/password-reset': ['ok', 'ok', 'ok', 'ok', 'ok', 'ok'],
  'POST /api/auth/invitation/accept': ['ok', 'ok', 'ok', 'ok', 'ok', 'ok'],
  'POST /api/auth/invitation/check': ['ok', 'ok', 'ok', 'ok', 'ok', 'ok'],
  'POST /api/auth/password-reset/complete': ['ok', 'ok', 'ok', 'ok', 'ok', 'ok'],
  'GET /api/users': ['401', '401', '403', '403', '403', 'ok'],
  'POST /api/users': ['401', '401', '403', '403', '403', 'ok'],
  'PATCH /api/users/:id': ['401', '401', '403', '403', '403', 'ok'],
  'POST /api/users/:id/invitation': ['401', '401', '403', '403', '403', 'ok'],
  'GET /api/outbox': ['401', '401', '403', '403', '403', 'ok'],
  'POST /api/calc': ['401', '401', 'ok', 'ok', 'ok', 'ok'],
  'GET /api/pages': ['401', '401', 'ok', 'ok', 'ok', 'ok'],
  'POST /api/pages': ['401', '401', 'ok', '403', 'ok', 'ok'],
  'GET /api/pages/dashboard': ['401', '401', 'ok', 'ok', 'ok', 'ok'],
  'PUT /api/pages/digest': ['401', '401', 'ok', 'ok', 'ok', 'ok'],
  'GET /api/pages/:id': ['401', '401', '403', '403', 'ok', 'ok'],
  'PUT /api/pages/:id': ['401', '401', '403', '403', 'ok', 'ok'],
  'GET /api/pages/:id/preview': ['401', '401', '403', '403', 'ok', 'ok'],
  'GET /api/pages/:id/published': ['401', '401', '403', '403', 'ok', 'ok'],
  'POST /api/pages/:id/submit': ['401', '401', '403', '403', 'ok', 'ok'],
  'POST /api/pages/:id/withdraw': ['401', '401', '403', '403', 'ok', 'ok'],
  'GET /api/pages/:id/approval-problems': ['401', '401', '403', '403', 'ok', 'ok'],
  'POST /api/pages/:id/signoffs/statements': ['401', '401', '403', 'ok', '403', 'ok'],
  'POST /api/pages/:id/signoffs/page': ['401', '401', '403', 'ok', '403', 'ok'],
  'POST /api/pages/:id/flags': ['401', '401', '403', 'ok', '403', 'ok'],
  'POST /api/pages/:id/publish': ['401', '401', '403', '403', 'ok', 'ok'],
  'PUT /api/pages/:id/schedule': ['401', '401', '403', '403', 'ok', 'ok'],
  'GET /api/pages/:id/comments': ['401', '401', '403', '403', 'ok', 'ok'],
  'POST /api/pages/:id/comments': ['401', '401', '403', '403', 'ok', 'ok'],
  'GET /api/pages/:id/revisions': ['401', '401', '403', '403', 'ok', 'ok'],
  'GET /api/pages/:id/revisions/diff': ['401', '401', '403', '403', 'ok', 'ok'],
  'GET /api/pages/:id/revisions/:number': ['401', '401', '403', '403', 'ok', 'ok'],
  'POST /api/pages/:id/revisions/:number/restore': ['401', '401', '403', '403', 'ok', 'ok'],
  'GET /api/pages/:id/versions': ['401', '401', '403', '403', 'ok', 'ok'],
  'POST /api/pages/:id/versions': ['401', '401', '403', '403', 'ok', 'ok'],
  'GET /api/statements': ['401', '401', 'ok', 'ok', 'ok', 'ok'],
  'POST /api/statements': ['401', '401', 'ok', 'ok', 'ok', 'ok'],
  'GET /api/statements/:id': ['401', '401', 'ok', 'ok', 'ok', 'ok'],
  'POST /api/statements/:id/recompute': ['401', '401', '403', 'ok', '403', 'ok'],
  'POST /api/statements/:id/accept': ['401', '401', '403', 'ok', '403', 'ok'],
  'GET /api/statement-templates': ['401', '401', 'ok', 'ok', 'ok', 'ok'],
  'GET /api/settings': ['401', '401', 'ok', 'ok', 'ok', 'ok'],
  'PATCH /api/settings': ['401', '401', '403', '403', '403', 'ok'],
  'POST /api/settings/cosmology/preview': ['401', '401', '403', '403', '403', 'ok'],
  'PUT /api/settings/cosmology': ['401', '401', '403', '403', '403', 'ok'],
  'GET /api/media': ['401', '401', 'ok', 'ok', 'ok', 'ok'],
  'GET /api/media/object-suggestions': ['401', '401', 'ok', 'ok', 'ok', 'ok'],
  'POST /api/media': ['401', '401', 'ok', 'ok', 'ok', 'ok'],
  'GET /api/media/:id': ['401', '401', 'ok', 'ok', 'ok', 'ok'],
  'PATCH /api/media/:id': ['401', '401', 'ok', 'ok', 'ok', 'ok'],
  'GET /api/media/:id/renditions': ['401', '401', 'ok', 'ok', 'ok', 'ok'],
  'POST /api/media/:id/renditions': ['401', '401', 'ok', 'ok', 'ok', 'ok'],
  'GET /api/catalogue/objects': ['401', '401', 'ok', 'ok', 'ok', 'ok'],
  'POST /api/catalogue/objects': ['401', '401', '403', 'ok', '403', 'ok'],
  'GET /api/catalogue/objects/:id': ['401', '401', 'ok', 'ok', 'ok', 'ok'],
  'PATCH /api/catalogue/objects/:id': ['401', '401', '403', 'ok', '403', 'ok'],
  'GET /api/catalogue/objects/:id/measurements': ['401', '401', 'ok', 'ok', 'ok', 'ok'],
  'POST /api/catalogue/objects/:id/measurements': ['401', '401', 'ok', 'ok', 'ok', 'ok'],
  'GET /api/catalogue/objects/:id/history': ['401', '401', 'ok', 'ok', 'ok', 'ok'],
  'GET /api/catalogue/measurements/:id': ['401', '401', 'ok', 'ok', 'ok', 'ok'],
  'PATCH /api/catalogue/measurements/:id': ['401', '401', '403', 'ok', '403', 'ok'],
  'PUT /api/catalogue/measurements/:id/preferred': ['401', '401', '403', 'ok', '403', 'ok'],
  'POST /api/catalogue/measurements/:id/review': ['401', '401', '403', 'ok', '403', 'ok'],
  'GET /api/catalogue/sources': ['401', '401', 'ok', 'ok', 'ok', 'ok'],
  'POST /api/catalogue/sources': ['401', '401', '403', 'ok', '403', 'ok'],
  'GET /api/catalogue/sources/:id': ['401', '401', 'ok', 'ok', 'ok', 'ok'],
  'PATCH /api/catalogue/sources/:id': ['401', '401', '403', 'ok', '403', 'ok'],
  'GET /api/catalogue/proposals': ['401', '401', 'ok', 'ok', 'ok', 'ok'],
  'POST /api/catalogue/proposals/objects': ['401', '401', 'ok', '403', 'ok', '403'],
  'POST /api/catalogue/proposals/sources': ['401', '401', 'ok', '403', 'ok', '403'],
  'POST /api/catalogue/proposals/:id/review': ['401', '401', '403', 'ok', '403', 'ok'],
  'POST /api/catalogue/imports': ['401', '401', '403', 'ok', '403', 'ok'],
  'GET /api/catalogue/imports/:id': ['401', '401', '403', 'ok', '403', 'ok'],
  'POST /api/catalogue/imports/:id/commit': ['401', '401', '403', 'ok', '403', 'ok'],
  'GET /api/catalogue/exports/objects.csv': ['401', '401', 'ok', 'ok', 'ok', 'ok'],
  'GET /api/catalogue/exports/measurements.csv': ['401', '401', 'ok', 'ok', 'ok', 'ok'],
  'GET /api/timeline': ['401', '401', 'ok', 'ok', 'ok', 'ok'],
  'POST /api/timeline': ['401', '401', '403', '403', '403', 'ok'],
  'PATCH /api/timeline/:id': ['401', '401', '403', '403', '403', 'ok'],
  'DELETE /api/timeline/:id': ['401', '401', '403', '403', '403', 'ok'],
  'GET /api/venues': ['401', '401', '403', '403', 'ok', 'ok'],
  'GET /api/venues/choices': ['401', '401', 'ok', 'ok', 'ok', 'ok'],
  'POST /api/venues': ['401', '401', '403', '403', '403', 'ok'],
  'GET /api/venues/:id': ['401', '401', '403', '403', 'ok', 'ok'],
  'PATCH /api/venues/:id': ['401', '401', '403', '403', '403', 'ok'],
  'GET /api/venues/:id/sky': ['401', '401', 'ok', 'ok', 'ok', 'ok'],
  'GET /api/venues/:venueId/screens': ['401', '401', '403', '403', 'ok', 'ok'],
  'POST /api/venues/:venueId/screens': ['401', '401', '403', '403', '403', 'ok'],
  'POST /api/venues/:venueId/screens/:screenId/pairing': ['401', '401', '403', '403', '403', 'ok'],
  'PATCH /api/venues/:venueId/screens/:screenId': ['401', '401', '403', '403', '403', 'ok'],
  'POST /api/kiosk/pair': ['ok', 'ok', 'ok', 'ok', 'ok', 'ok'],
  'POST /api/kiosk/heartbeat': ['401', 'ok', '401', '401', '401', '401'],
  'GET /api/kiosk/screen': ['401', 'ok', '401', '401', '401', '401'],
  'GET /api/kiosk/venues/:venueId/sky': ['401', 'ok', '401', '401', '401', '401'],
  'GET /api/channels': ['401', '401', '403', '403', 'ok', 'ok'],
  'POST /api/channels': ['401', '401', '403', '403', 'ok', 'ok'],
  'GET /api/channels/slide-sources': ['401', '401', '403', '403', 'ok', 'ok'],
  'GET /api/channels/:id': ['401', '401', '403', '403', 'ok', 'ok'],
  'PATCH /api/channels/:id': ['401', '401', '403', '403', 'ok', 'ok'],
  'POST /api/channels/:id/slides': ['401', '401', '403', '403', 'ok', 'ok'],
  'PATCH /api/channels/:id/slides/:slideId': ['401', '401', '403', '403', 'ok', 'ok'],
  'PUT /api/channels/:id/slide-order': ['401', '401', '403', '403', 'ok', 'ok'],
  'PUT /api/channels/:id/screens': ['401', '401', '403', '403', 'ok', 'ok'],
  'GET /api/channels/:id/preview-feed': ['401', '401', '403', '403', 'ok', 'ok'],
  'GET /api/public/pages': ['ok', 'ok', 'ok', 'ok', 'ok', 'ok'],
  'GET /api/public/pages.atom': ['ok', 'ok', 'ok', 'ok', 'ok', 'ok'],
  'GET /api/public/pages/:slugOrId': ['ok', 'ok', 'ok', 'ok', 'ok', 'ok'],
  'GET /media/files/:name': ['ok', 'ok', 'ok', 'ok', 'ok', 'ok'],
  // The public site (issue 17): published pages, the sitemap and the embeddable fragments are for everyone.
  'GET /explore': ['ok', 'ok', 'ok', 'ok', 'ok', 'ok'],
  'GET /explore/:slug': ['ok', 'ok', 'ok', 'ok', 'ok', 'ok'],
  'GET /explore/{*rest}': ['ok', 'ok', 'ok', 'ok', 'ok', 'ok'],
  'GET /explore/venues/:venue/sky-tonight': ['ok', 'ok', 'ok', 'ok', 'ok', 'ok'],
  'GET /explore/_assets/explore.css': ['ok', 'ok', 'ok', 'ok', 'ok', 'ok'],
  'GET /explore/_assets/:font': ['ok', 'ok', 'ok', 'ok', 'ok', 'ok'],
  'GET /sitemap.xml': ['ok', 'ok', 'ok', 'ok', 'ok', 'ok'],
  'GET /embed/pages/:slug': ['ok', 'ok', 'ok', 'ok', 'ok', 'ok'],
  'GET /embed/venues/:venue/sky-tonight': ['ok', 'ok', 'ok', 'ok', 'ok', 'ok'],
  'POST /api/pages/:id/send-back': ['401', '401', '403', 'ok', '403', 'ok'],
  'POST /api/pages/:id/unpublish': ['401', '401', '403', '403', 'ok', 'ok'],
  'POST /api/pages/:id/archive': ['401', '401', '403', '403', 'ok', 'ok'],
  'POST /api/pages/:id/restore': ['401', '401', '403', '403', 'ok', 'ok'],
  'DELETE /api/pages/:id': ['401', '401', '403', '403', 'ok', 'ok'],
  'DELETE /api/channels/:id/slides/:slideId': ['401', '401', '403', '403', 'ok', 'ok'],
  'DELETE /api/channels/:id': ['401', '401', '403', '403', 'ok', 'ok'],
  'DELETE /api/media/:id': ['401', '401', '403', '403', 'ok', 'ok'],
  'DELETE /api/catalogue/measurements/:id': ['401', '401', '403', 'ok', '403', 'ok'],
  'DELETE /api/catalogue/objects/:id': ['401', '401', '403', 'ok', '403', 'ok'],
  'POST /api/venues/:venueId/screens/:screenId/revoke': ['401', '401', '403', '403', '403', 'ok'],
  'DELETE /api/venues/:venueId/screens/:screenId': ['401', '401', '403', '403', '403', 'ok'],
  'DELETE /api/venues/:id': ['401', '401', '403', '403', '403', 'ok'],
};

/** Routes that end the caller's session run with a throwaway session of the same role. */
const SESSION_ENDING = new Set(['POST /api/auth/sign-out']);

/**
 * Routes that change state for good run last, in this order, so the rows the other routes need
 * still exist while those run. Once an allowed caller has succeeded the row is gone or moved on,
 * so the callers after it are not asked (their cells are still the policy and read by people).
 */
const LAST = [
  'POST /api/pages/:id/send-back',
  'POST /api/pages/:id/withdraw',
  'POST /api/pages/:id/unpublish',
  'POST /api/pages/:id/archive',
  'POST /api/pages/:id/restore',
  'DELETE /api/pages/:id',
  'DELETE /api/channels/:id/slides/:slideId',
  'DELETE /api/channels/:id',
  'DELETE /api/media/:id',
  'DELETE /api/catalogue/measurements/:id',
  'DELETE /api/catalogue/objects/:id',
  'POST /api/venues/:venueId/screens/:screenId/revoke',
  'DELETE /api/venues/:venueId/screens/:screenId',
  'DELETE /api/venues/:id',
  'DELETE /api/timeline/:id',
];

let world: Awaited<ReturnType<typeof buildAccessWorld>>;
let routes: RouteEntry[];

beforeAll(async () => {
  const app = await getTestApp();
  await resetDatabase();
  routes = listRoutes(app);
  world = await buildAccessWorld();
});

const keyOf = (r: RouteEntry) => `${r.method} ${r.path}`;

/** The class an answer falls in; 500s and forbidden 2xx are what the matrix exists to catch. */
function classify(status: number): Answer {
  if (status === 401) return '401';
  if (status === 403) return '403';
  return 'ok';
}

describe('changing an id does not widen access', () => {
  it('a writer cannot read another writer’s unsubmitted draft, its revisions or its comments', async () => {
    const writer = world.signed.writer.agent;
    for (const suffix of ['', '/preview', '/revisions', '/comments']) {
      const res = await writer.get(`/api/pages/${world.page.id}${suffix}`);
      expect([403, 404], `GET /api/pages/:id${suffix}`).toContain(res.status);
    }
    const list = await writer.get('/api/pages');
    expect(JSON.stringify(list.body)).not.toContain(world.page.id);
    const save = await writer
      .put(`/api/pages/${world.page.id}`)
      .send({ version: world.page.version, title: 'Taken over', doc: { type: 'doc', content: [] } });
    expect([403, 404]).toContain(save.status);
  });

  it('a kiosk token cannot read another venue’s sky, screen or heartbeat as another screen', async () => {
    const sky = await callAs('kiosk', world, 'GET', `/api/kiosk/venues/${world.otherVenue.id}/sky`, undefined);
    expect(sky.status).toBe(403);
    const beat = await callAs('kiosk', world, 'POST', '/api/kiosk/heartbeat', { screenId: world.otherScreen.screenId });
    expect(beat.status).toBe(403);
    // The feed and the screen are always the token's own: no parameter names another venue.
    const screen = await callAs('kiosk', world, 'GET', `/api/kiosk/screen?venueId=${world.otherVenue.id}`, undefined);
    expect(screen.body.data.venueId).toBe(world.ids.venue);
    const feed = await callAs('kiosk', world, 'GET', `/api/kiosk/feed?venueId=${world.otherVenue.id}`, undefined);
    expect(feed.status).toBe(200);
    expect(JSON.stringify(feed.body)).not.toContain(world.otherVenue.id);
    // A kiosk token is no staff session: it opens nothing behind sign-in.
    expect((await callAs('kiosk', world, 'GET', `/api/venues/${world.otherVenue.id}/screens`, undefined)).status).toBe(401);
  });

  it('a non-admin cannot read or change a user record by id', async () => {
    for (const role of ['writer', 'reviewer', 'editor'] as const) {
      const agent = world.signed[role].agent;
      expect((await agent.get('/api/users')).status, role).toBe(403);
      const change = await agent.patch(`/api/users/${world.ids.user}`).send({ role: 'admin' });
      expect(change.status, role).toBe(403);
      const self = await agent.patch(`/api/users/${world.signed[role].user.id}`).send({ role: 'admin' });
      expect(self.status, role).toBe(403);
      expect((await agent.post(`/api/users/${world.ids.user}/invitation`)).status, role).toBe(403);
    }
    const me = await world.signed.writer.agent.get('/api/auth/me');
    expect(me.body.data.role).toBe('writer');
    const target = await world.signed.admin.agent.get('/api/users');
    expect(target.body.data.find((u: { id: string }) => u.id === world.ids.user).role).toBe('writer');
  });
});

// Last: its destructive routes revoke the screen and delete the venue the tests above use.
describe('access matrix', () => {
  it('every route the router holds has a row in the expected table', () => {
    const missing = routes.map((r) => `${r.method} ${r.path}`).filter((key) => !(key in EXPECTED));
    expect(missing, `routes with no row in tests/api/access-matrix.table.ts: ${missing.join(', ')}`).toEqual([]);
    const stale = Object.keys(EXPECTED).filter((key) => !routes.some((r) => `${r.method} ${r.path}` === key));
    expect(stale, `rows for routes the router no longer has: ${stale.join(', ')}`).toEqual([]);
  });

  it('each caller gets the expected class of answer on every route, and nobody gets a 500', async () => {
    const rank = (r: RouteEntry) => LAST.indexOf(keyOf(r));
    const ordered = [...routes].sort((a, b) => rank(a) - rank(b));
    const wrong: string[] = [];
    let asked = 0;
    for (const route of ordered) {
      const key = keyOf(route);
      const row = EXPECTED[key];
      if (!row) continue;
      const input = sampleInput(key, world.ids, world.page.version);
      const path = fillPath(route.path, world.ids) + (input.query ? `?${input.query}` : '');
      // Least privileged first: an admin's delete must not remove the row before the others are asked.
      for (const caller of CALLERS) {
        const res = await callAs(caller, world, route.method, path, input.body, SESSION_ENDING.has(key));
        asked += 1;
        const got = classify(res.status);
        const want = row[CALLERS.indexOf(caller)];
        if (res.status >= 500 || got !== want)
          wrong.push(`${key} as ${caller}: expected ${want}, got ${res.status} ${JSON.stringify(res.body?.error?.code ?? '')}`);
        if (rank(route) >= 0 && res.status < 300) break;
      }
    }
    expect(asked).toBeGreaterThan(routes.length * 5);
    expect(wrong, wrong.join('\n')).toEqual([]);
    // About 600 requests in one test: on a loaded 2-core machine it runs past the 30 s default.
  }, 180_000);
});
