/**
 * `npm run bench:feed`: the kiosk feed under load, on loopback, against a cluster of its own
 * (.data/bench-feed-pg, port 54598; BENCH_FEED_PGDATA / BENCH_FEED_PGPORT change them).
 *
 * A channel of 50 slides (20 published pages with images, 20 images, 10 sky-tonight slides) is
 * served by the real app in a child process, and the same bytes from a file by express.static in
 * another, the peer. autocannon (100 connections, BENCH_FEED_SECONDS each, default 10) measures
 * requests per second and p99 latency for full 200 answers and for 304 revalidations
 * (If-None-Match), feed and peer taking turns for BENCH_FEED_ROUNDS rounds (default 2) so a loaded
 * machine weighs on both alike; each server reports its event-loop delay and GC pauses per run.
 * Request logging is off in both servers (LOG_LEVEL=warn), as a production deployment would sample
 * it. Prints the kiosk entry's gzipped JavaScript too (BENCH_FEED_BUNDLE=0 skips the build);
 * BENCH_FEED_PROFILE=1 writes a CPU profile of the app server.
 * Targets (issue 19, same run): 304 at least express.static's rate with a p99 no worse than its
 * own; full 200 answers ≥ 1.0× express.static.
 */
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import crypto from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import autocannon from 'autocannon';
import { ensureDatabase, localDatabaseUrl, startLocalPostgres } from '../../server/db/local-postgres.ts';
import { entrySize } from '../../server/build/bundle-budget.ts';
import { productionNodeOptions } from './node-options.ts';

const dataDir = path.resolve(process.env.BENCH_FEED_PGDATA ?? '.data/bench-feed-pg');
const port = Number(process.env.BENCH_FEED_PGPORT ?? 54598);
const database = 'starproof_bench_feed';
const work = path.resolve('.data/bench-feed');
const DURATION = Number(process.env.BENCH_FEED_SECONDS ?? 10);
const ROUNDS = Number(process.env.BENCH_FEED_ROUNDS ?? 2);

await startLocalPostgres({ dataDir, port, database: 'postgres', fast: true });
await ensureDatabase({ port, database }, { recreate: true });
const url = localDatabaseUrl({ port, database });
process.env.DATABASE_URL = url;
const { getSequelize, closeSequelize } = await import('../../server/db.ts');
const { migrate } = await import('../../server/migrations/runner.ts');
const models = await import('../../server/models/index.ts');
const { hashToken } = await import('../../server/services/users/auth-tokens.ts');
const sql = getSequelize();
await migrate(sql);
models.initModels(sql);

// ---- a channel of 50 slides
const venue = await models.Venue.create({
  name: 'Bench Dome',
  latitude: 54.62,
  longitude: -2.95,
  elevationM: 160,
  timeZone: 'Europe/London',
});
const user = await models.User.create({ email: 'bench-editor@example.test', name: 'Bench Editor', role: 'editor' });
const [[object]] = (await sql.query(
  `INSERT INTO sky_objects (id, name, designations, kind, notes, created_at, updated_at) VALUES (gen_random_uuid(), 'Bench Galaxy', '{}', 'galaxy', '', now(), now()) RETURNING id`,
)) as unknown as [[{ id: string }]];
const hex = () => crypto.randomBytes(32).toString('hex');
async function image(i: number) {
  const media = await models.Media.create({
    sha256: hex(),
    originalKey: `originals/${hex()}.jpg`,
    fileName: `bench-${i}.jpg`,
    format: 'jpeg',
    bytes: 1,
    width: 4000,
    height: 2250,
    altText: `Bench picture ${i}: a spiral galaxy seen face on`,
    credit: `Bench Observatory ${i}`,
    licenceId: 'cc-by-4.0',
    sourceUrl: 'https://example.org/bench',
    renditionsStatus: 'ready',
    uploadedById: user.id,
  });
  for (const [name, w, h] of [
    ['thumbnail', 400, 225],
    ['page', 1600, 900],
    ['kiosk-hd', 1920, 1080],
    ['kiosk-4k', 3840, 2160],
  ] as const) {
    await models.MediaRendition.create({
      mediaId: media.id,
      name,
      format: 'jpeg',
      width: w,
      height: h,
      bytes: 1,
      storageKey: `renditions/${hex()}.jpg`,
    });
  }
  return media;
}
const channel = await models.Channel.create({ venueId: venue.id, name: 'Bench channel', createdById: user.id });
for (let i = 0; i < 50; i += 1) {
  if (i % 5 === 4) {
    await models.ChannelSlide.create({ channelId: channel.id, position: i, kind: 'sky_tonight', durationS: 20 });
    continue;
  }
  const media = await image(i);
  if (i % 2 === 0) {
    await models.ChannelSlide.create({
      channelId: channel.id,
      position: i,
      kind: 'image',
      mediaId: media.id,
      caption: `Bench caption ${i}: dust lanes and young blue stars in the arms`,
      durationS: 12,
    });
    continue;
  }
  const html = `<figure data-media-id="${media.id}"><img src="/x.jpg" alt=""></figure><p>Bench page ${i}. ${'Its light set out long before there were people to see it. '.repeat(6)}</p><p>${'More text for the page. '.repeat(20)}</p>`;
  const page = await models.Page.create({
    title: `Bench page ${i}`,
    skyObjectId: object.id,
    locale: 'en-GB',
    writerId: user.id,
    status: 'published',
    publishedSnapshot: {
      revisionId: crypto.randomUUID(),
      revisionNumber: 1,
      title: `Bench page ${i}`,
      html,
      statementTexts: {},
      signedOffAt: new Date().toISOString(),
      signedOffBy: null,
      publishedAt: new Date().toISOString(),
      publishedBy: null,
    },
  });
  await models.ChannelSlide.create({ channelId: channel.id, position: i, kind: 'page', pageId: page.id, durationS: 15 });
}
const token = `spk_${crypto.randomBytes(32).toString('base64url')}`;
const screen = await models.KioskScreen.create({
  venueId: venue.id,
  name: 'Bench screen',
  tokenHash: hashToken(token),
  tokenIssuedAt: new Date(),
});
await models.ChannelScreen.create({ screenId: screen.id, channelId: channel.id, assignedAt: new Date() });
await closeSequelize();

// ---- servers in their own processes, both up for the whole run so their runs can take turns
interface Server {
  child: ChildProcess;
  port: number;
  ask: (message: 'reset' | 'report') => Promise<unknown>;
}
function startServer(args: string[]): Promise<Server> {
  // BENCH_FEED_PROFILE=1: a CPU profile of the app server in .data/bench-feed/profile, for finding where its time goes.
  const profile =
    process.env.BENCH_FEED_PROFILE === '1' && args[0] === 'app' ? ['--cpu-prof', `--cpu-prof-dir=${work}/profile`] : [];
  // Both servers, ours and the peer, run with the Node options `npm start` gives production.
  const child = spawn(
    process.execPath,
    [...productionNodeOptions(), ...profile, '--import', 'tsx', 'tests/bench/feed-server.ts', ...args],
    {
      env: { ...process.env, DATABASE_URL: url, NODE_ENV: 'production', LOG_LEVEL: 'warn', MALLOC_ARENA_MAX: '2' },
      stdio: ['ignore', 'pipe', 'inherit', 'ipc'],
    },
  );
  const ask = (message: 'reset' | 'report') =>
    new Promise<unknown>((resolve) => {
      child.once('message', resolve);
      child.send(message);
    });
  return new Promise((resolve, reject) => {
    child.stdout!.once('data', (chunk: Buffer) =>
      resolve({ child, ask, port: (JSON.parse(chunk.toString()) as { port: number }).port }),
    );
    child.once('exit', (code) => reject(new Error(`server exited ${code}`)));
  });
}

interface ServerStats {
  loop: { p50: number; p99: number; max: number };
  gc: { count: number; totalMs: number; maxMs: number };
  /** CPU time of the server process over the run (every thread). */
  cpuMs: number;
}
interface Figures {
  rate: number;
  p99: number;
  statuses: string;
  errors: number;
  server: ServerStats;
  /** Server CPU per answer, in microseconds: steadier than rates on a machine shared with other work. */
  cpuUs: number;
}
/** One autocannon run against a server, with that server's event-loop delay and GC over the run. */
async function run(server: Server, target: string, headers: Record<string, string>, expect: number): Promise<Figures> {
  await server.ask('reset');
  const r = await autocannon({ url: target, connections: 100, duration: DURATION, headers });
  const stats = (await server.ask('report')) as ServerStats;
  const other = r.non2xx - (expect === 304 ? r['3xx' as 'non2xx'] : 0);
  return {
    rate: r.requests.average,
    p99: r.latency.p99,
    statuses: other ? `${other} not ${expect}` : `all ${expect}`,
    errors: r.errors + r.timeouts,
    server: stats,
    cpuUs: (stats.cpuMs * 1000) / Math.max(1, r.requests.total),
  };
}

const app = await startServer(['app']);
const feedUrl = `http://127.0.0.1:${app.port}/api/kiosk/feed`;
const auth = { Authorization: `Bearer ${token}` };
const first = await fetch(feedUrl, { headers: auth });
const body = Buffer.from(await first.arrayBuffer());
const etag = first.headers.get('etag')!;
const items = (JSON.parse(body.toString()) as { items: unknown[] }).items.length;
fs.mkdirSync(work, { recursive: true });
fs.writeFileSync(path.join(work, 'feed.json'), body);
const peer = await startServer(['static', path.join(work, 'feed.json')]);
const staticUrl = `http://127.0.0.1:${peer.port}/feed.json`;
const staticEtag = (await fetch(staticUrl)).headers.get('etag')!;

// Warm-up: JIT, connection pools, the built feed in memory.
await run(app, feedUrl, auth, 200);
await run(peer, staticUrl, {}, 200);

// The machine may be shared: each figure is paired with the peer's, measured right before or
// after it, and the order alternates from round to round so neither side always goes first.
const cases = {
  full: { app: [] as Figures[], peer: [] as Figures[] },
  revalidate: { app: [] as Figures[], peer: [] as Figures[] },
};
for (let round = 0; round < ROUNDS; round += 1) {
  const turns = [
    async () => cases.full.app.push(await run(app, feedUrl, auth, 200)),
    async () => cases.full.peer.push(await run(peer, staticUrl, {}, 200)),
    async () => cases.revalidate.app.push(await run(app, feedUrl, { ...auth, 'If-None-Match': etag }, 304)),
    async () => cases.revalidate.peer.push(await run(peer, staticUrl, { 'If-None-Match': staticEtag }, 304)),
  ];
  const order = round % 2 === 0 ? [0, 1, 3, 2] : [1, 0, 2, 3];
  for (const i of order) await turns[i]();
}
app.child.kill('SIGTERM');
peer.child.kill('SIGTERM');

// ---- the kiosk entry's JavaScript
const bundle = process.env.BENCH_FEED_BUNDLE !== '0';
const dist = path.resolve('.data/bench-feed-dist');
if (bundle)
  spawnSync('npx', ['vite', 'build', '--logLevel', 'error'], {
    env: { ...process.env, STARPROOF_DIST_DIR: dist },
    stdio: 'ignore',
  });
const size = bundle ? entrySize(dist, 'kiosk.html') : null;

const n = (x: number) => Math.round(x).toLocaleString('en-GB');
/** Rounds merged: mean rate, the worst p99 and the worst event-loop and GC figures (the tail is what is compared). */
function merge(runs: Figures[]): Figures {
  const worst = (f: (r: Figures) => number) => Math.max(...runs.map(f));
  return {
    rate: runs.reduce((sum, r) => sum + r.rate, 0) / runs.length,
    p99: worst((r) => r.p99),
    statuses: runs.map((r) => r.statuses).find((s) => !s.startsWith('all')) ?? runs[0].statuses,
    errors: runs.reduce((sum, r) => sum + r.errors, 0),
    cpuUs: runs.reduce((sum, r) => sum + r.cpuUs, 0) / runs.length,
    server: {
      loop: { p50: worst((r) => r.server.loop.p50), p99: worst((r) => r.server.loop.p99), max: worst((r) => r.server.loop.max) },
      gc: {
        count: runs.reduce((sum, r) => sum + r.server.gc.count, 0),
        totalMs: runs.reduce((sum, r) => sum + r.server.gc.totalMs, 0),
        maxMs: worst((r) => r.server.gc.maxMs),
      },
      cpuMs: runs.reduce((sum, r) => sum + r.server.cpuMs, 0),
    },
  };
}
const line = (label: string, r: Figures) =>
  console.log(
    `  ${label.padEnd(34)} ${n(r.rate).padStart(7)} req/s   p99 ${String(r.p99).padStart(4)} ms   ` +
      `loop delay p99 ${String(r.server.loop.p99).padStart(5)} ms (max ${r.server.loop.max})   ` +
      `GC ${r.server.gc.totalMs} ms in ${r.server.gc.count} (max ${r.server.gc.maxMs})   CPU ${r.cpuUs.toFixed(0)} µs per answer   ${r.statuses}, errors ${r.errors}`,
  );
console.log(
  `Kiosk feed benchmark (Node ${process.version} ${productionNodeOptions().join(' ') || '(no options)'} for both servers, ${ROUNDS} rounds × ${DURATION} s per case, 100 connections, loopback)`,
);
console.log(`  channel of 50 slides → feed of ${items} items, ${(body.length / 1024).toFixed(1)} KB`);
console.log('  (loop delay and GC: measured inside the answering server over its runs)');
for (const [name, label, target] of [
  ['full', 'full 200 answers', 'rate ≥ 1.0× express.static'],
  ['revalidate', '304 revalidations (If-None-Match)', 'rate ≥ 1.0× and p99 ≤ express.static'],
] as const) {
  const ours = merge(cases[name].app);
  const theirs = merge(cases[name].peer);
  console.log(`  ${label}`);
  line('feed', ours);
  line('express.static, same bytes', theirs);
  const ratio = ours.rate / theirs.rate;
  const meets = ratio >= 1 && (name === 'full' || ours.p99 <= theirs.p99);
  console.log(
    `    ratio feed / express.static: ${ratio.toFixed(2)}×, p99 ${ours.p99} vs ${theirs.p99} ms → ${meets ? 'meets' : 'MISSES'} (${target}); CPU per answer ${(ours.cpuUs / theirs.cpuUs).toFixed(2)}× the peer's`,
  );
}
if (size)
  console.log(
    `  kiosk player JavaScript: ${(size.raw / 1024).toFixed(1)} KB raw, ${(size.gzip / 1024).toFixed(1)} KB gzipped (budget 60 KB)`,
  );
process.exit(0);
