import { QueryTypes } from 'sequelize';
import supertest from 'supertest';
import { beforeAll, describe, expect, it, vi } from 'vitest';
import { config } from '../../server/config.ts';
import { getSequelize } from '../../server/db.ts';
import { enqueue, registerJob, startJobQueue, stopJobQueue } from '../../server/jobs/queue.ts';
import { PgRateLimitStore, runRateLimitPurgeJob, TalliedPgRateLimitStore } from '../../server/middlewares/rate-limit-store.ts';
import { SkySnapshot, Venue } from '../../server/models/index.ts';
import { skyEvents } from '../../server/services/sky/index.ts';
import { refreshVenueSky } from '../../server/services/sky/sky-snapshots.ts';
import { getTestApp, resetDatabase } from '../support/app.ts';
import { getFeed, makeVenue, pairedScreen, publishedPage, publishingCrew } from '../support/publishing.ts';

// A long check interval for this file only (read when the publishing services load), so "still in
// memory" below does not depend on how fast this machine is.
vi.hoisted(() => {
  process.env.STARPROOF_FEED_CHECK_MS = '60000';
});

beforeAll(async () => {
  await getTestApp();
  await resetDatabase();
});

/** A store as one server would build it for a limiter (two of them stand for two servers). */
function storeFor(name: string, windowMs: number) {
  const store = new PgRateLimitStore(name);
  store.init({ windowMs } as Parameters<PgRateLimitStore['init']>[0]);
  return store;
}

describe('rate limits counted in PostgreSQL', () => {
  it('two servers count one client against one limit', async () => {
    const a = storeFor('shared-test', 60_000);
    const b = storeFor('shared-test', 60_000);
    expect((await a.increment('203.0.113.7')).totalHits).toBe(1);
    expect((await b.increment('203.0.113.7')).totalHits).toBe(2);
    expect((await a.increment('203.0.113.7')).totalHits).toBe(3);
    expect((await b.get('203.0.113.7'))?.totalHits).toBe(3);
    // another client, and another limiter with the same client, have counters of their own
    expect((await b.increment('203.0.113.8')).totalHits).toBe(1);
    expect((await storeFor('other-test', 60_000).increment('203.0.113.7')).totalHits).toBe(1);
  });

  it('hits arriving at once on several servers are each counted exactly once', async () => {
    const stores = [storeFor('burst-test', 60_000), storeFor('burst-test', 60_000), storeFor('burst-test', 60_000)];
    const totals = await Promise.all(Array.from({ length: 60 }, (_, i) => stores[i % 3]!.increment('198.51.100.9')));
    expect(totals.map((t) => t.totalHits).sort((x, y) => x - y)).toEqual(Array.from({ length: 60 }, (_, i) => i + 1));
  });

  it('a window that has ended starts again at one; decrement and reset act on the shared counter', async () => {
    const store = storeFor('window-test', 200);
    await store.increment('192.0.2.1');
    await store.increment('192.0.2.1');
    await store.decrement('192.0.2.1');
    expect((await store.get('192.0.2.1'))?.totalHits).toBe(1);
    await new Promise((r) => setTimeout(r, 300));
    expect(await store.get('192.0.2.1')).toBeUndefined();
    const again = await store.increment('192.0.2.1');
    expect(again.totalHits).toBe(1);
    expect(again.resetTime!.getTime()).toBeGreaterThan(Date.now());
    await store.resetKey('192.0.2.1');
    expect(await store.get('192.0.2.1')).toBeUndefined();
  });

  it('the hourly purge removes only counters whose window has ended', async () => {
    await storeFor('purge-test', 100).increment('192.0.2.50');
    await storeFor('purge-test', 60_000).increment('192.0.2.51');
    await new Promise((r) => setTimeout(r, 200));
    await runRateLimitPurgeJob();
    const keys = await getSequelize().query<{ key: string }>("SELECT key FROM rate_limit_hits WHERE key LIKE 'purge-test:%'", {
      type: QueryTypes.SELECT,
    });
    expect(keys.map((k) => k.key)).toEqual(['purge-test:192.0.2.51']);
  });
});

/** A tallied store as one server would build it for a public limiter. */
function talliedFor(name: string, windowMs: number) {
  const store = new TalliedPgRateLimitStore(name);
  store.init({ windowMs } as Parameters<TalliedPgRateLimitStore['init']>[0]);
  return store;
}

async function sharedHits(key: string): Promise<number | undefined> {
  const [row] = await getSequelize().query<{ hits: number }>('SELECT hits FROM rate_limit_hits WHERE key = :key', {
    replacements: { key },
    type: QueryTypes.SELECT,
  });
  return row?.hits;
}

describe('public rate limits tallied in memory and shared once a second', () => {
  it("counts a page view without a query, then adds a server's hits to the shared counter in one go", async () => {
    const store = talliedFor('tally-test', 60_000);
    for (let i = 1; i <= 50; i++) expect((await store.increment('203.0.113.20')).totalHits).toBe(i);
    expect(await sharedHits('tally-test:203.0.113.20')).toBeUndefined();
    await store.flush();
    expect(await sharedHits('tally-test:203.0.113.20')).toBe(50);
    expect((await store.get('203.0.113.20'))?.totalHits).toBe(50);
  });

  it("two servers see each other's hits after their next flush, so a client cannot double its allowance", async () => {
    const a = talliedFor('tally-two', 60_000);
    const b = talliedFor('tally-two', 60_000);
    for (let i = 0; i < 30; i++) await a.increment('198.51.100.20');
    for (let i = 0; i < 20; i++) await b.increment('198.51.100.20');
    await a.flush();
    await b.flush();
    expect((await b.get('198.51.100.20'))?.totalHits).toBe(50);
    expect((await a.increment('198.51.100.20')).totalHits).toBe(31);
    await a.flush();
    expect((await a.increment('198.51.100.20')).totalHits).toBe(52);
  });

  it('flushes by itself within about a second, and a window that has ended starts again', async () => {
    const store = talliedFor('tally-window', 400);
    await store.increment('192.0.2.20');
    await store.increment('192.0.2.20');
    await expect.poll(() => sharedHits('tally-window:192.0.2.20'), { timeout: 3000 }).toBe(2);
    await new Promise((r) => setTimeout(r, 500));
    expect(await store.get('192.0.2.20')).toBeUndefined();
    expect((await store.increment('192.0.2.20')).totalHits).toBe(1);
    await store.flush();
    expect(await sharedHits('tally-window:192.0.2.20')).toBe(1);
  });
});

describe('the nightly sky with two workers', () => {
  it('two refreshes of one venue at once compute each night once and announce tonight once', async () => {
    const venue = await Venue.create({
      name: 'Twin Worker Dome (demo)',
      latitude: 51.5,
      longitude: -0.1,
      elevationM: 20,
      timeZone: 'Europe/London',
    });
    const announced: string[] = [];
    const listener = ({ venueId, localDate }: { venueId: string; localDate: string }) => {
      if (venueId === venue.id) announced.push(localDate);
    };
    skyEvents.on('nightComputed', listener);
    try {
      const now = new Date('2026-11-20T12:00:00Z');
      const counts = await Promise.all([refreshVenueSky(venue, now), refreshVenueSky(venue, now)]);
      expect(counts.sort()).toEqual([0, 2]);
      expect(announced).toEqual(['2026-11-20']);
      expect(await SkySnapshot.count({ where: { venueId: venue.id } })).toBe(2);
    } finally {
      skyEvents.off('nightComputed', listener);
    }
  });
});

describe('a reader moving between servers never steps back', () => {
  it('a validator this server does not hold makes it check the database before answering', async () => {
    const crew = await publishingCrew();
    const page = await publishedPage(crew, 'Moving between servers (demo)');
    const visitor = supertest(await getTestApp());
    // Publishing's own follow-up events (recomputes, re-checks) settle first; then the list is held in memory.
    await new Promise((resolve) => setTimeout(resolve, 1500));
    await visitor.get('/api/public/pages');
    const first = await visitor.get('/api/public/pages');
    expect(first.body.meta.total).toBe(1);
    // Another server publishes a new title: this one hears no event.
    await getSequelize().query(
      `UPDATE pages SET published_snapshot = published_snapshot
         || jsonb_build_object('title', 'Renamed elsewhere (demo)', 'publishedAt', '2030-01-01T00:00:00.000Z')
       WHERE id = :id`,
      {
        replacements: { id: page.pageId },
        type: QueryTypes.UPDATE,
      },
    );
    // Within the check interval a reader without a validator still gets the list in memory ...
    const unchanged = await visitor.get('/api/public/pages');
    expect(unchanged.body.data[0].title).toBe('Moving between servers (demo)');
    expect(unchanged.headers.etag).toBe(first.headers.etag);
    // ... the one whose validator (served elsewhere) is not ours gets the database's present state,
    const moved = await visitor.get('/api/public/pages').set('If-None-Match', '"served-by-another-server"');
    expect(moved.status).toBe(200);
    expect(moved.body.data[0].title).toBe('Renamed elsewhere (demo)');
    // and so does everyone after, since the check refreshed what is in memory.
    const after = await visitor.get('/api/public/pages');
    expect(after.body.data[0].title).toBe('Renamed elsewhere (demo)');
    expect(after.headers.etag).toBe(moved.headers.etag);
    // Our own validator still gets a 304 without a check.
    expect((await visitor.get('/api/public/pages').set('If-None-Match', String(moved.headers.etag))).status).toBe(304);
  });

  it('a kiosk whose validator this server does not hold gets the feed as the database has it now', async () => {
    const crew = await publishingCrew();
    const venue = await makeVenue(crew.admin.agent, 'Twin Server Dome (demo)');
    const channel = await crew.editor.agent.post('/api/channels').send({ venueId: venue.id, name: 'Before (demo)' });
    const channelId = channel.body.data.id as string;
    await crew.editor.agent.post(`/api/channels/${channelId}/slides`).send({ kind: 'sky_tonight' });
    const screen = await pairedScreen(crew.admin.agent, venue.id, 'Twin screen (demo)');
    await crew.editor.agent.put(`/api/channels/${channelId}/screens`).send({ screenIds: [screen.screenId] });
    await new Promise((resolve) => setTimeout(resolve, 1500));
    await getFeed(screen.token);
    const first = await getFeed(screen.token);
    expect(JSON.parse(first.text).title).toContain('Before (demo)');
    // Another server renames the channel: this one hears no event.
    await getSequelize().query("UPDATE channels SET name = 'After (demo)', version = version + 1 WHERE id = :id", {
      replacements: { id: channelId },
      type: QueryTypes.UPDATE,
    });
    const unchanged = await getFeed(screen.token, first.headers.etag);
    expect(unchanged.status).toBe(304);
    const moved = await getFeed(screen.token, '"served-by-another-server"');
    expect(moved.status).toBe(200);
    expect(JSON.parse(moved.text).title).toContain('After (demo)');
  });
});

describe('STARPROOF_ROLE: a web server queues jobs and runs none', () => {
  it('a job queued by a queue without workers waits for a worker, which runs it once', async () => {
    const ran: string[] = [];
    registerJob<{ mark: string }>('test.role-split', async ({ mark }) => void ran.push(mark));
    const state = async () =>
      (
        await getSequelize().query<{ state: string }>(
          "SELECT state FROM pgboss.job WHERE name = 'test.role-split' AND data->>'mark' = 'queued-by-web'",
          { type: QueryTypes.SELECT },
        )
      ).map((r) => r.state);
    try {
      // as a `web` server starts it: queueing only
      await startJobQueue(config.databaseUrl!, { pollingIntervalSeconds: 0.5, workers: false });
      await enqueue('test.role-split', { mark: 'queued-by-web' });
      await new Promise((resolve) => setTimeout(resolve, 2_000));
      expect(ran).toEqual([]);
      expect(await state()).toEqual(['created']);
      await stopJobQueue();
      // as a `worker` starts it: the waiting job runs, once
      await startJobQueue(config.databaseUrl!, { pollingIntervalSeconds: 0.5 });
      await expect.poll(() => ran, { timeout: 10_000, interval: 100 }).toEqual(['queued-by-web']);
      await expect.poll(state, { timeout: 10_000, interval: 100 }).toEqual(['completed']);
    } finally {
      await stopJobQueue();
    }
  });
});
