/**
 * `npm run bench:feed`: the kiosk feed under load, on loopback, against a cluster of its own
 * (.data/bench-feed-pg, port 54598; BENCH_FEED_PGDATA / BENCH_FEED_PGPORT change them).
 *
 * A channel of 50 slides (20 published pages with images, 20 images, 10 sky-tonight slides) is
 * served by the real app in a child process; autocannon (100 connections, 10 s each) measures
 * requests per second and p99 latency for full 200 answers and for 304 revalidations
 * (If-None-Match), then the same bytes from a file through express.static in another child
 * process, the peer. Request logging is off in both servers (LOG_LEVEL=warn), as a production
 * deployment would sample it. Prints the kiosk entry's gzipped JavaScript too.
 * Targets (issue "Publishing", 2-core machine): 304 ≥ 5,000 req/s with p99 < 50 ms; full ≥ half of express.static.
 */
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import crypto from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import autocannon from 'autocannon';
import { ensureDatabase, localDatabaseUrl, startLocalPostgres } from '../../server/db/local-postgres.ts';
import { entrySize } from './bundle-budget.ts';

const dataDir = path.resolve(process.env.BENCH_FEED_PGDATA ?? '.data/bench-feed-pg');
const port = Number(process.env.BENCH_FEED_PGPORT ?? 54598);
const database = 'starproof_bench_feed';
const work = path.resolve('.data/bench-feed');
const DURATION = Number(process.env.BENCH_FEED_SECONDS ?? 10);

await startLocalPostgres({ dataDir, port, database: 'postgres', fast: true });
await ensureDatabase({ port, database }, { recreate: true });
const url = localDatabaseUrl({ port, database });
process.env.DATABASE_URL = url;
const { getSequelize, closeSequelize } = await import('../../server/db.ts');
const { migrate } = await import('../../server/migrations/runner.ts');
const models = await import('../../server/models/index.ts');
const { hashToken } = await import('../../server/services/auth-tokens.ts');
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

// ---- servers in their own processes
function startServer(args: string[]): Promise<{ child: ChildProcess; port: number }> {
  const child = spawn(process.execPath, ['--import', 'tsx', 'tests/bench/feed-server.ts', ...args], {
    env: { ...process.env, DATABASE_URL: url, NODE_ENV: 'production', LOG_LEVEL: 'warn', MALLOC_ARENA_MAX: '2' },
    stdio: ['ignore', 'pipe', 'inherit'],
  });
  return new Promise((resolve, reject) => {
    child.stdout!.once('data', (chunk: Buffer) =>
      resolve({ child, port: (JSON.parse(chunk.toString()) as { port: number }).port }),
    );
    child.once('exit', (code) => reject(new Error(`server exited ${code}`)));
  });
}
const run = (target: string, headers: Record<string, string>) =>
  autocannon({ url: target, connections: 100, duration: DURATION, headers });

const app = await startServer(['app']);
const feedUrl = `http://127.0.0.1:${app.port}/api/kiosk/feed`;
const auth = { Authorization: `Bearer ${token}` };
const first = await fetch(feedUrl, { headers: auth });
const body = Buffer.from(await first.arrayBuffer());
const etag = first.headers.get('etag')!;
const items = (JSON.parse(body.toString()) as { items: unknown[] }).items.length;
fs.mkdirSync(work, { recursive: true });
fs.writeFileSync(path.join(work, 'feed.json'), body);

await run(feedUrl, auth); // warm-up: JIT, connection pools, the built feed in memory
const full = await run(feedUrl, auth);
const revalidate = await run(feedUrl, { ...auth, 'If-None-Match': etag });
app.child.kill('SIGTERM');

const peer = await startServer(['static', path.join(work, 'feed.json')]);
const staticUrl = `http://127.0.0.1:${peer.port}/feed.json`;
await run(staticUrl, {});
const stat = await run(staticUrl, {});
const staticEtag = (await fetch(staticUrl)).headers.get('etag')!;
const stat304 = await run(staticUrl, { 'If-None-Match': staticEtag });
peer.child.kill('SIGTERM');

// ---- the kiosk entry's JavaScript
const dist = path.resolve('.data/bench-feed-dist');
spawnSync('npx', ['vite', 'build', '--logLevel', 'error'], {
  env: { ...process.env, STARPROOF_DIST_DIR: dist },
  stdio: 'ignore',
});
const size = entrySize(dist, 'kiosk.html');

const n = (x: number) => Math.round(x).toLocaleString('en-GB');
const line = (
  label: string,
  r: { requests: { average: number }; latency: { p99: number }; non2xx: number; errors: number },
  note = '',
) =>
  console.log(
    `  ${label.padEnd(40)} ${n(r.requests.average).padStart(7)} req/s   p99 ${String(r.latency.p99).padStart(4)} ms   non-2xx ${r.non2xx}, errors ${r.errors}${note}`,
  );
console.log(`Kiosk feed benchmark (Node ${process.version}, ${DURATION} s per run, 100 connections, loopback)`);
console.log(`  channel of 50 slides → feed of ${items} items, ${(body.length / 1024).toFixed(1)} KB`);
line('feed, full 200 answers', full);
line('feed, 304 revalidations (If-None-Match)', revalidate, ' (304s count as non-2xx)');
line('express.static, same bytes from a file', stat);
line('express.static, 304 revalidations', stat304, ' (304s count as non-2xx)');
console.log(`  ratio full feed / express.static: ${(full.requests.average / stat.requests.average).toFixed(2)} (target ≥ 0.5)`);
console.log(`  ratio feed 304 / express.static 304: ${(revalidate.requests.average / stat304.requests.average).toFixed(2)}`);
console.log(
  `  304 path: ${revalidate.requests.average >= 5000 && revalidate.latency.p99 < 50 ? 'meets' : 'MISSES'} the target of ≥ 5,000 req/s with p99 < 50 ms`,
);
console.log(
  `  kiosk player JavaScript: ${(size.raw / 1024).toFixed(1)} KB raw, ${(size.gzip / 1024).toFixed(1)} KB gzipped (budget 60 KB)`,
);
process.exit(0);
