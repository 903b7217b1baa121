/**
 * `npm run bench:load`: mixed traffic against the real server on loopback, then a soak.
 *
 * Starts its own cluster (.data/bench-load-pg, port 54597) and the app exactly as `npm start` runs it
 * (demo data, job queue), pairs a demo kiosk screen, signs in an editor, then runs autocannon with a
 * mix per connection: kiosk feed (fresh and revalidated with If-None-Match), the public pages API,
 * signed-in reads of pages, statements and the catalogue, and page saves as the editor's autosave
 * sends them: each connection edits a page of its own (a writer's draft), sending the version its
 * last save returned, so optimistic locking never refuses one (a 409 here would be a real error).
 * Phase 1: 100 connections for LOAD_SECONDS (60). Phase 2 (soak): 10 connections for SOAK_SECONDS (300).
 * Prints throughput, p50/p99 latency, errors (non-2xx/304 answers and socket errors; target 0) and
 * the server's resident memory at start and end (target: under 15 % growth).
 */
import { spawn } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import autocannon from 'autocannon';
import { ensureDatabase, localDatabaseUrl, startLocalPostgres, stopLocalPostgres } from '../../server/db/local-postgres.ts';
import { DEMO_ACCOUNTS } from '../../server/demo/accounts.ts';

const LOAD_SECONDS = Number(process.env.LOAD_SECONDS ?? 60);
const SOAK_SECONDS = Number(process.env.SOAK_SECONDS ?? 300);
const dataDir = path.resolve('.data/bench-load-pg');
const pgPort = 54597;
const database = 'starproof_bench_load';
const appPort = 4797;
const base = `http://127.0.0.1:${appPort}`;

await startLocalPostgres({ dataDir, port: pgPort, database: 'postgres', fast: true });
await ensureDatabase({ port: pgPort, database }, { recreate: true });
const databaseUrl = localDatabaseUrl({ port: pgPort, database });

const server = spawn(process.execPath, ['--import', 'tsx', 'server/cli/start.ts'], {
  env: {
    ...process.env,
    DATABASE_URL: databaseUrl,
    PORT: String(appPort),
    STARPROOF_SMTP_PORT: '0',
    LOG_LEVEL: 'warn',
    UPLOADS_DIR: path.resolve('.data/bench-load-uploads'),
    STARPROOF_PUBLIC_LIMIT: '1000000000',
  },
  stdio: ['ignore', 'pipe', 'inherit'],
});
await new Promise<void>((resolve, reject) => {
  let out = '';
  server.stdout!.on('data', (c: Buffer) => {
    out += c.toString();
    if (out.includes('Starproof is ready')) resolve();
  });
  server.once('exit', (code) => reject(new Error(`server exited ${code}`)));
});

const rssMb = () => {
  const status = fs.readFileSync(`/proc/${server.pid}/status`, 'utf8');
  return Number(/VmRSS:\s+(\d+)/.exec(status)![1]) / 1024;
};

// A paired kiosk screen, through the same services the admin screens use.
process.env.DATABASE_URL = databaseUrl;
const { initModels, KioskScreen, User } = await import('../../server/models/index.ts');
const { getSequelize, closeSequelize } = await import('../../server/db.ts');
initModels(getSequelize());
const { issuePairingCode, pairScreen } = await import('../../server/services/publishing/kiosk-pairing.ts');
const admin = (await User.findOne({ where: { email: DEMO_ACCOUNTS[0].email } }))!;
const screen = (await KioskScreen.findOne({ order: [['name', 'ASC']] }))!;
const { code } = await issuePairingCode(screen, admin);
const { token } = await pairScreen(code.replace('-', ''));

const editor = DEMO_ACCOUNTS.find((a) => a.role === 'editor')!;
const signIn = await fetch(`${base}/api/auth/sign-in`, {
  method: 'POST',
  headers: { 'Content-Type': 'application/json' },
  body: JSON.stringify({ email: editor.email, password: editor.password }),
});
const cookie = signIn.headers.get('set-cookie')!.split(';')[0];
const pages = (await (await fetch(`${base}/api/pages`, { headers: { cookie } })).json()) as { data: Array<{ id: string }> };
const pageId = pages.data[0]?.id;

// One draft per connection for the saves, written by the demo writer.
const writer = DEMO_ACCOUNTS.find((a) => a.role === 'writer')!;
const writerSignIn = await fetch(`${base}/api/auth/sign-in`, {
  method: 'POST',
  headers: { 'Content-Type': 'application/json', 'X-Forwarded-For': '10.9.9.9' },
  body: JSON.stringify({ email: writer.email, password: writer.password }),
});
const writerCookie = writerSignIn.headers.get('set-cookie')!.split(';')[0];
const objects = (await (await fetch(`${base}/api/catalogue/objects?pageSize=1`, { headers: { cookie } })).json()) as {
  data: { rows: Array<{ id: string }> };
};
const drafts: Array<{ id: string; version: number }> = [];
for (let i = 0; i < 100; i++) {
  const made = await fetch(`${base}/api/pages`, {
    method: 'POST',
    headers: { cookie: writerCookie, origin: base, 'content-type': 'application/json' },
    body: JSON.stringify({ title: `Load draft ${i + 1} (benchmark)`, objectId: objects.data.rows[0].id, locale: 'en-GB' }),
  });
  const body = (await made.json()) as { data: { id: string; version: number } };
  drafts.push({ id: body.data.id, version: body.data.version });
}
let nextDraft = 0;
type SaveContext = { draft?: { id: string; version: number }; edits?: number };
const draftDoc = (n: number) => ({
  type: 'doc',
  content: [{ type: 'paragraph', content: [{ type: 'text', text: `Autosaved text, edit ${n}.` }] }],
});
const feed = await fetch(`${base}/api/kiosk/feed`, { headers: { authorization: `Bearer ${token}` } });
const etag = feed.headers.get('etag') ?? '';

const kiosk = { authorization: `Bearer ${token}` };
const requests = [
  { method: 'GET', path: '/api/kiosk/feed', headers: kiosk },
  { method: 'GET', path: '/api/kiosk/feed', headers: { ...kiosk, 'if-none-match': etag } },
  { method: 'GET', path: '/api/kiosk/feed', headers: { ...kiosk, 'if-none-match': etag } },
  { method: 'GET', path: '/api/public/pages' },
  { method: 'GET', path: '/api/public/pages.atom' },
  { method: 'GET', path: `/api/pages/${pageId}`, headers: { cookie } },
  { method: 'GET', path: '/api/statements?pageSize=20', headers: { cookie } },
  { method: 'GET', path: '/api/catalogue/objects?pageSize=50&sort=name', headers: { cookie } },
  {
    method: 'PUT',
    headers: { cookie: writerCookie, origin: base, 'content-type': 'application/json' },
    setupRequest: (req: Record<string, unknown>, context: SaveContext) => {
      context.draft ??= drafts[nextDraft++ % drafts.length];
      context.edits = (context.edits ?? 0) + 1;
      return {
        ...req,
        path: `/api/pages/${context.draft.id}`,
        body: JSON.stringify({ version: context.draft.version, title: `Load draft (benchmark)`, doc: draftDoc(context.edits) }),
      };
    },
    onResponse: (status: number, body: string, context: SaveContext) => {
      if (status === 200 && context.draft)
        context.draft.version = (JSON.parse(body) as { data: { version: number } }).data.version;
    },
  },
];

async function phase(name: string, connections: number, duration: number) {
  const startRss = rssMb();
  const result = await autocannon({ url: base, connections, duration, requests, excludeErrorStats: false } as never);
  const bad = result.non2xx - (result.statusCodeStats?.['304']?.count ?? 0);
  const codes = Object.entries(result.statusCodeStats ?? {})
    .filter(([code]) => !/^(2..|304)$/.test(code))
    .map(([code, v]) => `${code}×${(v as { count: number }).count}`);
  console.log(
    `${name}: ${connections} connections, ${duration} s — ${Math.round(result.requests.average)} req/s, ` +
      `p50 ${result.latency.p50} ms, p99 ${result.latency.p99} ms, errors ${bad + result.errors + result.timeouts} ` +
      `(non-2xx/304 ${bad}${codes.length ? `: ${codes.join(', ')}` : ''}, socket ${result.errors}, timeouts ${result.timeouts}); RSS ${startRss.toFixed(0)} → ${rssMb().toFixed(0)} MB`,
  );
  return { startRss, endRss: rssMb() };
}

console.log(`mixed traffic: ${requests.length} request kinds per connection, in turn`);
const first = await phase('load', 100, LOAD_SECONDS);
// A save in flight when a phase ends was stored without its answer being read: start from the stored versions.
for (const draft of drafts) {
  draft.version = (
    (await (await fetch(`${base}/api/pages/${draft.id}`, { headers: { cookie: writerCookie } })).json()) as {
      data: { version: number };
    }
  ).data.version;
}
const soak = await phase('soak', 10, SOAK_SECONDS);
const growth = ((soak.endRss - first.startRss) / first.startRss) * 100;
const soakGrowth = ((soak.endRss - soak.startRss) / soak.startRss) * 100;
console.log(
  `resident memory: ${first.startRss.toFixed(0)} MB idle before any traffic, ${soak.startRss.toFixed(0)} MB after the load phase, ${soak.endRss.toFixed(0)} MB at the end of the soak`,
);
console.log(
  `  growth over the soak ${soakGrowth.toFixed(1)} % (target < 15 %); from idle ${growth.toFixed(1)} % (warm-up included: compiled code, connection pools, caches)`,
);

server.kill('SIGTERM');
await new Promise((r) => server.once('exit', r));
await closeSequelize();
stopLocalPostgres(dataDir);
