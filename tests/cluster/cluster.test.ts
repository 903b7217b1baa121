import type { ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import pg from 'pg';
import S3rver from 's3rver';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_ACCOUNTS, DEMO_VENUE } from '../../server/demo/accounts.ts';
import { restoreBackup, writeBackup } from '../../server/backup/archive.ts';
import {
  ensureDatabase,
  localDatabaseUrl,
  startLocalPostgres,
  startLocalReplica,
  stopLocalPostgres,
} from '../../server/db/local-postgres.ts';
import { type ServerProcess, startServerProcess, stopServerProcess } from '../support/server-process.ts';
import { haproxyInstalled, serverStates, startHaproxy } from './haproxy.ts';

// Several machines, on loopback: a PostgreSQL primary and its streaming replica, the S3 fake, two web
// servers and a worker behind HAProxy. Ports 54440–54459 belong to this test (CLUSTER_PORT moves them).
const BASE = Number(process.env.STARPROOF_CLUSTER_PORT ?? 54440);
const PORTS = {
  primary: BASE,
  replica: BASE + 1,
  s3: BASE + 2,
  web1: BASE + 3,
  web2: BASE + 4,
  worker: BASE + 5,
  balancer: BASE + 6,
  stats: BASE + 7,
};
/** STARPROOF_FEED_CHECK_MS + STARPROOF_REPLICA_MAX_LAG_MS (their defaults): the documented bound for a change to show elsewhere. */
const BOUND_MS = 1_000 + 500;
/** The bound plus room for polling on a busy shared machine. */
const WAIT_MS = BOUND_MS + 6_500;
const BUCKET = 'starproof-cluster';
const PAIRING_LIMIT = 6;

const folder = fs.mkdtempSync(path.join(os.tmpdir(), 'starproof-cluster-'));
const database = 'starproof';
const primaryUrl = localDatabaseUrl({ port: PORTS.primary, database });
const replicaUrl = localDatabaseUrl({ port: PORTS.replica, database });
const lb = `http://127.0.0.1:${PORTS.balancer}`;
const direct = (port: number) => `http://127.0.0.1:${port}`;

let s3: S3rver | undefined;
let haproxy: { child: ChildProcess; output: () => string } | undefined;
const servers: Partial<Record<'web1' | 'web2' | 'worker', ServerProcess>> = {};
/** Every server process as soon as it is spawned, so a start that fails is cleaned up too. */
const spawned: ChildProcess[] = [];
const clusters: string[] = [];
let primary: pg.Pool;

/** Kills what is still running, even when Vitest itself goes down. */
function killEverything() {
  for (const child of spawned) if (child.exitCode === null && child.signalCode === null) child.kill('SIGKILL');
  if (haproxy && haproxy.child.exitCode === null) haproxy.child.kill('SIGKILL');
}
process.once('exit', () => {
  killEverything();
  // afterAll stops the clusters; this is for a run that never got there (pg_ctl runs synchronously)
  for (const dir of clusters) {
    try {
      stopLocalPostgres(dir);
    } catch {
      // already stopped, or never started
    }
  }
});

const account = (role: string) => DEMO_ACCOUNTS.find((a) => a.role === role)!;

async function signIn(base: string, role: string): Promise<string> {
  const res = await fetch(`${base}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email: account(role).email, password: account(role).password }),
  });
  if (res.status !== 200) throw new Error(`sign-in as ${role}: ${res.status} ${await res.text()}`);
  return /starproof\.sid=[^;]+/.exec(res.headers.get('set-cookie') ?? '')![0];
}

async function call<T = unknown>(base: string, cookie: string, method: string, url: string, body?: unknown): Promise<T> {
  const res = await fetch(`${base}/api${url}`, {
    method,
    headers: { Cookie: cookie, ...(body === undefined ? {} : { 'Content-Type': 'application/json' }) },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  const text = await res.text();
  if (res.status >= 300) throw new Error(`${method} ${url}: ${res.status} ${text}`);
  return (text ? (JSON.parse(text) as { data: T }).data : undefined) as T;
}

/** Polls until `check` holds, returning how long it took (ms); throws after `ms`. */
async function within(ms: number, what: string, check: () => Promise<boolean>): Promise<number> {
  const started = Date.now();
  for (;;) {
    if (await check().catch(() => false)) return Date.now() - started;
    if (Date.now() - started > ms) throw new Error(`${what}: not seen within ${ms} ms`);
    await new Promise((r) => setTimeout(r, 50));
  }
}

async function replicaTransactions(): Promise<number> {
  const client = new pg.Client({ connectionString: replicaUrl });
  await client.connect();
  try {
    const { rows } = await client.query('SELECT xact_commit::int AS n FROM pg_stat_database WHERE datname = $1', [database]);
    return rows[0].n as number;
  } finally {
    await client.end();
  }
}

const runs = haproxyInstalled();

describe.skipIf(!runs)('several app servers behind HAProxy, with a read replica and S3 storage', () => {
  beforeAll(async () => {
    const primaryDir = path.join(folder, 'primary');
    const replicaDir = path.join(folder, 'replica');
    const withLog = (dir: string) => (error: Error) => {
      const log = path.join(dir, 'server.log');
      throw new Error(`${error.message}\n${fs.existsSync(log) ? fs.readFileSync(log, 'utf8').slice(-3_000) : ''}`);
    };
    clusters.push(primaryDir);
    await startLocalPostgres({ dataDir: primaryDir, port: PORTS.primary, database, fast: true }).catch(withLog(primaryDir));
    clusters.push(replicaDir);
    await startLocalReplica(PORTS.primary, { dataDir: replicaDir, port: PORTS.replica, database, fast: true }).catch(
      withLog(replicaDir),
    );
    primary = new pg.Pool({ connectionString: primaryUrl, max: 2 });

    s3 = new S3rver({
      address: '127.0.0.1',
      port: PORTS.s3,
      silent: true,
      directory: path.join(folder, 's3'),
      configureBuckets: [{ name: BUCKET }],
    });
    await s3.run();

    const env = (name: string, role: string): Record<string, string> => ({
      DATABASE_URL: primaryUrl,
      DATABASE_READ_URL: replicaUrl,
      STARPROOF_ROLE: role,
      UPLOADS_DIR: path.join(folder, `uploads-${name}`),
      STARPROOF_STORAGE: 's3',
      STARPROOF_S3_BUCKET: BUCKET,
      STARPROOF_S3_ENDPOINT: direct(PORTS.s3),
      STARPROOF_S3_FORCE_PATH_STYLE: 'true',
      // s3rver's built-in account (its documented defaults)
      AWS_ACCESS_KEY_ID: 'S3RVER',
      AWS_SECRET_ACCESS_KEY: 'S3RVER',
      STARPROOF_STATEMENT_WORKERS: '0',
      // low, so the shared count is reached in a few requests
      STARPROOF_PAIRING_LIMIT: String(PAIRING_LIMIT),
      // the traffic below is a load balancer's test, not the public API's allowance per address
      STARPROOF_PUBLIC_LIMIT: '100000',
      PASSWORD_HASH_THREADS: '1',
      // the staff client is not what this test looks at: a stand-in page instead of a build
      STARPROOF_DIST_DIR: path.join(folder, 'dist'),
    });
    fs.mkdirSync(path.join(folder, 'dist'));
    fs.writeFileSync(path.join(folder, 'dist', 'index.html'), '<!doctype html><title>Starproof</title>');
    // A shared 2-core machine compiles three servers at once: give them time.
    const starting = { timeoutMs: 150_000, onSpawn: (child: ChildProcess) => void spawned.push(child) };
    // All three at once: they take turns at the migrations and the demo seed.
    const [web1, web2, worker] = await Promise.all([
      startServerProcess(env('web1', 'web'), { port: PORTS.web1, ...starting }),
      startServerProcess(env('web2', 'web'), { port: PORTS.web2, ...starting }),
      startServerProcess(env('worker', 'worker'), { port: PORTS.worker, ...starting }),
    ]);
    Object.assign(servers, { web1, web2, worker });
    haproxy = await startHaproxy(
      {
        port: PORTS.balancer,
        statsPort: PORTS.stats,
        web: [
          { name: 'web1', port: PORTS.web1 },
          { name: 'web2', port: PORTS.web2 },
        ],
        worker: { name: 'worker', port: PORTS.worker },
      },
      folder,
    );
    let states: Record<string, string> = {};
    await within(30_000, 'every server UP in HAProxy', async () => {
      states = await serverStates(PORTS.stats);
      return states.web1 === 'UP' && states.web2 === 'UP' && states.worker === 'UP';
    }).catch((error: Error) => {
      throw new Error(`${error.message}: ${JSON.stringify(states)}\n${haproxy?.output()}`);
    });
  }, 240_000);

  afterAll(async () => {
    await primary?.end().catch(() => undefined);
    for (const server of Object.values(servers)) if (server) await stopServerProcess(server, 'SIGKILL').catch(() => undefined);
    killEverything();
    await s3?.close().catch(() => undefined);
    for (const dir of clusters.splice(0).reverse()) {
      try {
        stopLocalPostgres(dir);
      } catch {
        // a cluster that never started
      }
    }
    fs.rmSync(folder, { recursive: true, force: true });
  }, 60_000);

  it('a worker serves only its health; web servers queue no schedules of their own', async () => {
    expect((await fetch(`${direct(PORTS.worker)}/api/health`)).status).toBe(200);
    expect((await fetch(`${direct(PORTS.worker)}/api/public/pages`)).status).toBe(404);
    // only the worker queued the start-up sky refresh (three servers started; one job)
    const { rows } = await primary.query(
      `SELECT count(*)::int AS n FROM (SELECT id FROM pgboss.job WHERE name = 'sky.snapshots.daily' AND singleton_key = 'start-up'
         UNION ALL SELECT id FROM pgboss.archive WHERE name = 'sky.snapshots.daily' AND singleton_key = 'start-up') j`,
    );
    expect(rows[0].n).toBe(1);
  });

  it('a session started through the balancer is known to every web server', async () => {
    const cookie = await signIn(lb, 'editor');
    for (const base of [lb, lb, lb, lb, direct(PORTS.web1), direct(PORTS.web2)]) {
      const me = await call<{ email: string }>(base, cookie, 'GET', '/auth/me');
      expect(me.email).toBe(account('editor').email);
    }
  });

  it('a rate limit counts one address across every server, not once per server', async () => {
    const attempt = (port: number) =>
      fetch(`${direct(port)}/api/kiosk/pair`, {
        method: 'POST',
        // the servers trust loopback proxies, so this names the caller as HAProxy would
        headers: { 'Content-Type': 'application/json', 'X-Forwarded-For': '203.0.113.50' },
        body: JSON.stringify({ code: 'ZZZ-999' }),
      });
    const statuses: number[] = [];
    for (let i = 0; i < PAIRING_LIMIT + 2; i += 1) statuses.push((await attempt(i % 2 ? PORTS.web2 : PORTS.web1)).status);
    // in process memory each server would allow the limit on its own (twice as many in all)
    expect(statuses.slice(0, PAIRING_LIMIT)).not.toContain(429);
    expect(statuses.slice(PAIRING_LIMIT)).toEqual([429, 429]);
  });

  let admin = '';
  let mediaId = '';
  let token = '';
  let channelId = '';
  let slideId = '';

  it('an upload through one server is served by all (S3), and its renditions job runs once, on the worker', async () => {
    admin = await signIn(lb, 'admin');
    const png = await sharp({ create: { width: 900, height: 600, channels: 3, background: '#0b1026' } })
      .png()
      .toBuffer();
    const form = new FormData();
    form.append('file', new Blob([new Uint8Array(png)]), 'dark-sky.png');
    const res = await fetch(`${lb}/api/media`, { method: 'POST', headers: { Cookie: admin }, body: form });
    expect(res.status).toBe(201);
    mediaId = ((await res.json()) as { data: { id: string } }).data.id;
    await within(60_000, 'renditions ready', async () => {
      const media = await call<{ renditionsStatus: string }>(lb, admin, 'GET', `/media/${mediaId}`);
      return media.renditionsStatus === 'ready';
    });
    const media = await call<{ renditions: { url: string }[] }>(lb, admin, 'GET', `/media/${mediaId}`);
    const file = media.renditions[0]!.url;
    const bodies = await Promise.all(
      [direct(PORTS.web1), direct(PORTS.web2)].map(async (base) => {
        const r = await fetch(`${base}${file}`);
        expect(r.status).toBe(200);
        return Buffer.from(await r.arrayBuffer());
      }),
    );
    expect(bodies[0]!.equals(bodies[1]!)).toBe(true);
    const { rows } = await primary.query(
      `SELECT state FROM pgboss.job WHERE name = 'media-renditions' AND data->>'mediaId' = $1
       UNION ALL SELECT state FROM pgboss.archive WHERE name = 'media-renditions' AND data->>'mediaId' = $1`,
      [mediaId],
    );
    expect(rows).toEqual([{ state: 'completed' }]);
    await call(lb, admin, 'PATCH', `/media/${mediaId}`, {
      altText: 'A dark night sky (demo picture)',
      credit: 'Corrie Vale Planetarium (demo)',
      licenceId: 'cc-by-4.0',
      sourceUrl: 'https://example.org/demo-picture',
    });
  });

  it('a slide edit on one server shows in the kiosk feed of every server within the bound', async () => {
    const venue = (await call<{ id: string; name: string }[]>(lb, admin, 'GET', '/venues')).find(
      (v) => v.name === DEMO_VENUE.name,
    )!;
    channelId = (await call<{ id: string }>(lb, admin, 'POST', '/channels', { venueId: venue.id, name: 'Cluster loop (demo)' }))
      .id;
    const channel = await call<{ slides: { id: string }[] }>(lb, admin, 'POST', `/channels/${channelId}/slides`, {
      kind: 'image',
      mediaId,
      caption: 'First caption (demo)',
      durationS: 10,
    });
    slideId = channel.slides[0]!.id;
    const added = await call<{ pairingCode: string; screen: { id: string } }>(lb, admin, 'POST', `/venues/${venue.id}/screens`, {
      name: 'Cluster screen (demo)',
    });
    await call(lb, admin, 'PUT', `/channels/${channelId}/screens`, { screenIds: [added.screen.id] });
    const paired = await fetch(`${lb}/api/kiosk/pair`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ code: added.pairingCode }),
    });
    expect(paired.status).toBe(201);
    token = ((await paired.json()) as { data: { token: string } }).data.token;
    const feedOn = async (base: string) =>
      (await fetch(`${base}/api/kiosk/feed`, { headers: { Authorization: `Bearer ${token}` } })).text();
    for (const base of [direct(PORTS.web1), direct(PORTS.web2)]) expect(await feedOn(base)).toContain('First caption (demo)');

    await call(direct(PORTS.web1), admin, 'PATCH', `/channels/${channelId}/slides/${slideId}`, {
      caption: 'Edited on web1 (demo)',
    });
    const took = await within(WAIT_MS, 'the edit on web2', async () =>
      (await feedOn(direct(PORTS.web2))).includes('Edited on web1'),
    );
    expect((await feedOn(direct(PORTS.web1))).includes('Edited on web1')).toBe(true);
    console.log(`slide edit on web1 seen in web2's kiosk feed after ${took} ms (bound ${BOUND_MS} ms)`);
  });

  it('a publish on one server shows in the public API of every server within the bound', async () => {
    const editor = await signIn(lb, 'editor');
    const pages = await call<{ id: string; status: string }[]>(lb, editor, 'GET', '/pages');
    const live = pages.find((p) => p.status === 'published')!;
    const total = async (base: string) =>
      ((await (await fetch(`${base}/api/public/pages`)).json()) as { meta: { total: number } }).meta.total;
    const before = await total(direct(PORTS.web2));
    expect(await total(direct(PORTS.web1))).toBe(before);

    await call(direct(PORTS.web1), editor, 'POST', `/pages/${live.id}/unpublish`);
    const down = await within(WAIT_MS, 'the unpublish on web2', async () => (await total(direct(PORTS.web2))) === before - 1);
    await call(direct(PORTS.web2), editor, 'POST', `/pages/${live.id}/publish`);
    const up = await within(WAIT_MS, 'the publish on web1', async () => (await total(direct(PORTS.web1))) === before);
    console.log(`unpublish on web1 seen on web2 after ${down} ms; publish on web2 seen on web1 after ${up} ms`);
  });

  it('a cosmology change on one server is recomputed once, by the worker, and seen on the other', async () => {
    const since = new Date();
    const settings = await call<{ version: number }>(direct(PORTS.web1), admin, 'GET', '/settings');
    await call(direct(PORTS.web1), admin, 'PUT', '/settings/cosmology', {
      model: { H0: 50, Om0: 0.3 },
      expectedVersion: settings.version,
    });
    const jobs = async () =>
      (
        await primary.query(
          `SELECT state FROM pgboss.job WHERE name = 'statements.recompute' AND created_on >= $1 AND data->'scope'->>'all' = 'true'
           UNION ALL SELECT state FROM pgboss.archive WHERE name = 'statements.recompute' AND created_on >= $1 AND data->'scope'->>'all' = 'true'`,
          [since],
        )
      ).rows.map((r: { state: string }) => r.state);
    const took = await within(60_000, 'the recompute, seen on web2', async () => {
      if ((await jobs()).join() !== 'completed') return false;
      const statements = await call<{ computedAt: string }[]>(direct(PORTS.web2), admin, 'GET', '/statements?pageSize=100');
      return statements.some((s) => Date.parse(s.computedAt) >= since.getTime());
    });
    expect(await jobs()).toEqual(['completed']);
    console.log(`cosmology change on web1: recomputed by the worker and seen on web2 after ${took} ms`);
  });

  it('a reader moving between servers never gets an older feed than one it was served', async () => {
    const feed = (base: string, etag?: string) =>
      fetch(`${base}/api/kiosk/feed`, {
        headers: { Authorization: `Bearer ${token}`, ...(etag ? { 'If-None-Match': etag } : {}) },
      });
    // warm both servers' memory, then change the slide through web1 and read it there at once
    await feed(direct(PORTS.web2));
    await call(direct(PORTS.web1), admin, 'PATCH', `/channels/${channelId}/slides/${slideId}`, {
      caption: 'Newest caption (demo)',
    });
    // web1 shows it within the documented bound (at once without a replica; with one, once it has replayed)
    let fromWeb1 = await feed(direct(PORTS.web1));
    await within(WAIT_MS, 'the edit on web1', async () => {
      fromWeb1 = await feed(direct(PORTS.web1));
      return (await fromWeb1.clone().text()).includes('Newest caption (demo)');
    });
    // web2 has not heard of it yet, but the player's validator is not one it holds: it checks first
    const fromWeb2 = await feed(direct(PORTS.web2), fromWeb1.headers.get('etag')!);
    expect([200, 304]).toContain(fromWeb2.status);
    if (fromWeb2.status === 200) expect(await fromWeb2.text()).toContain('Newest caption (demo)');
    else expect(fromWeb2.headers.get('etag')).toBe(fromWeb1.headers.get('etag'));
  });

  it('a backup taken from the replica restores with the latest change', async () => {
    const archive = path.join(folder, 'from-replica.tar.gz');
    // the replica has replayed the last edit (milliseconds on loopback)
    await within(5_000, 'the last edit on the replica', async () => {
      const client = new pg.Client({ connectionString: replicaUrl });
      await client.connect();
      try {
        const { rows } = await client.query('SELECT caption FROM channel_slides WHERE id = $1', [slideId]);
        return rows[0]?.caption === 'Newest caption (demo)';
      } finally {
        await client.end();
      }
    });
    // what `npm run backup` does with DATABASE_READ_URL set
    const manifest = writeBackup(replicaUrl, path.join(folder, 'uploads-worker'), archive);
    expect(manifest.database).toBe(database);
    const restored = { port: PORTS.primary, database: 'starproof_restored' };
    await ensureDatabase(restored);
    await restoreBackup(archive, localDatabaseUrl(restored), path.join(folder, 'restored-uploads'));
    const client = new pg.Client({ connectionString: localDatabaseUrl(restored) });
    await client.connect();
    try {
      const { rows } = await client.query('SELECT caption FROM channel_slides WHERE id = $1', [slideId]);
      expect(rows).toEqual([{ caption: 'Newest caption (demo)' }]);
    } finally {
      await client.end();
    }
  });

  it('public reads use the replica while it keeps up', async () => {
    const before = await replicaTransactions();
    // a validator nobody holds makes each request check, so each reads the database
    for (let i = 0; i < 5; i += 1)
      expect((await fetch(`${lb}/api/public/pages`, { headers: { 'If-None-Match': `"nobody-${i}"` } })).status).toBe(200);
    // PostgreSQL publishes its statistics about once a second
    await within(5_000, 'reads counted on the replica', async () => (await replicaTransactions()) > before + 5);
  });

  it('killing a web server mid-traffic loses no request: the balancer retries on the other', async () => {
    const feedHeaders = { Authorization: `Bearer ${token}` };
    let stop = false;
    const failures: string[] = [];
    let answered = 0;
    const client = async () => {
      while (!stop) {
        const res = await fetch(`${lb}/api/kiosk/feed`, { headers: feedHeaders }).catch((e: Error) => ({ status: e.message }));
        const pub = await fetch(`${lb}/api/public/pages`).catch((e: Error) => ({ status: e.message }));
        for (const r of [res, pub]) {
          if (r.status === 200) answered += 1;
          else failures.push(String(r.status));
        }
      }
    };
    const clients = Array.from({ length: 6 }, client);
    await new Promise((r) => setTimeout(r, 1_000));
    servers.web1!.child.kill('SIGKILL');
    await within(10_000, 'web1 DOWN in HAProxy', async () => (await serverStates(PORTS.stats)).web1 === 'DOWN');
    await new Promise((r) => setTimeout(r, 1_000));
    stop = true;
    await Promise.all(clients);
    console.log(`${answered} requests answered across the kill, ${failures.length} failed`);
    expect(failures).toEqual([]);
    expect(answered).toBeGreaterThan(20);
  });

  it('with the replica stopped, public reads fall back to the primary and stay current', async () => {
    stopLocalPostgres(path.join(folder, 'replica'));
    await call(direct(PORTS.web2), admin, 'PATCH', `/channels/${channelId}/slides/${slideId}`, {
      caption: 'After the replica (demo)',
    });
    const list = await fetch(`${lb}/api/public/pages`, { headers: { 'If-None-Match': '"after-replica"' } });
    expect(list.status).toBe(200);
    await within(WAIT_MS, 'the edit with the replica down', async () => {
      const r = await fetch(`${lb}/api/kiosk/feed`, { headers: { Authorization: `Bearer ${token}` } });
      return r.status === 200 && (await r.text()).includes('After the replica (demo)');
    });
    // staff reads were never on the replica
    expect((await call<{ email: string }>(lb, admin, 'GET', '/auth/me')).email).toBe(account('admin').email);
  });
});
