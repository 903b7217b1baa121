/**
 * `npm run bench:capacity`: what one request of each public path, and one staff action, costs on
 * this machine, turned into how many screens and page views one core serves.
 *
 * Starts its own cluster (.data/bench-capacity-pg, port BENCH_CAPACITY_PGPORT or 54596), seeds the
 * demo scenario (Corrie Vale Planetarium), pairs a demo kiosk screen, and runs the app in a child
 * process (tests/bench/feed-server.ts, as bench:feed does, with the Node options `npm start` sets).
 * For each case it sends a fixed number of requests with autocannon (4 connections; autosaves one
 * at a time, each carrying the version the last one returned) and reads, over exactly those
 * requests: the app process's CPU time (every thread, statement workers and hashing included), the
 * CPU time of PostgreSQL's processes, and the statements the app sent to PostgreSQL (counted at the
 * driver). No job queue runs in the child, so a recompute is computed inside its request.
 * The figures are CPU per request, not latency: on a loaded machine they still hold, roughly.
 * `BENCH_CAPACITY_SCALE=0.2` sends a fifth of the requests (a quicker, noisier run).
 */
import { spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';
import autocannon from 'autocannon';
import { ensureDatabase, localDatabaseUrl, startLocalPostgres, stopLocalPostgres } from '../../server/db/local-postgres.ts';
import { DEMO_ACCOUNTS } from '../../server/demo/accounts.ts';
import { postgresCpuSeconds } from './postgres-cpu.ts';
import { productionNodeOptions } from './node-options.ts';

const dataDir = path.resolve('.data/bench-capacity-pg');
const pgPort = Number(process.env.BENCH_CAPACITY_PGPORT ?? 54596);
const database = 'starproof_bench_capacity';
const SCALE = Number(process.env.BENCH_CAPACITY_SCALE ?? 1);
// The address the app believes it is reached at: state-changing requests name it as their Origin.
const PUBLIC_URL = 'http://127.0.0.1';

await startLocalPostgres({ dataDir, port: pgPort, database: 'postgres', fast: true });
await ensureDatabase({ port: pgPort, database }, { recreate: true });
const databaseUrl = localDatabaseUrl({ port: pgPort, database });
process.env.DATABASE_URL = databaseUrl;
// The demo's review mails have no relay here: their errors are expected, not news.
process.env.LOG_LEVEL = 'silent';
const { getSequelize, closeSequelize } = await import('../../server/db.ts');
const { migrate } = await import('../../server/migrations/runner.ts');
const { initModels, KioskScreen, User, Statement } = await import('../../server/models/index.ts');
const sequelize = getSequelize();
await migrate(sequelize);
initModels(sequelize);
const { seedDemo } = await import('../../server/demo/seed.ts');
await seedDemo();
const { issuePairingCode, pairScreen } = await import('../../server/services/publishing/kiosk-pairing.ts');
const admin = (await User.findOne({ where: { role: 'admin' } }))!;
const screen = (await KioskScreen.findOne({ order: [['name', 'ASC']] }))!;
const { code } = await issuePairingCode(screen, admin);
const { token } = await pairScreen(code.replace('-', ''));
const statement = (await Statement.findOne({ where: { status: 'current' }, order: [['id', 'ASC']] }))!;

// ---- the app, in its own process
interface Report {
  cpuMs: number;
  queries: number;
}
const child: ChildProcess = spawn(
  process.execPath,
  [...productionNodeOptions(), '--import', 'tsx', 'tests/bench/feed-server.ts', 'app'],
  {
    env: {
      ...process.env,
      DATABASE_URL: databaseUrl,
      NODE_ENV: 'production',
      LOG_LEVEL: 'warn',
      MALLOC_ARENA_MAX: '2',
      PUBLIC_URL,
      STARPROOF_PUBLIC_LIMIT: '1000000',
      STARPROOF_SIGNIN_LIMIT: '1000',
    },
    stdio: ['ignore', 'pipe', 'inherit', 'ipc'],
  },
);
const ask = (message: 'reset' | 'report') =>
  new Promise<unknown>((resolve) => {
    child.once('message', resolve);
    child.send(message);
  });
const appPort = await new Promise<number>((resolve, reject) => {
  child.stdout!.once('data', (chunk: Buffer) => resolve((JSON.parse(chunk.toString()) as { port: number }).port));
  child.once('exit', (code) => reject(new Error(`app server exited ${code}`)));
});
const base = `http://127.0.0.1:${appPort}`;

async function signIn(role: string): Promise<string> {
  const account = DEMO_ACCOUNTS.find((a) => a.role === role)!;
  const res = await fetch(`${base}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email: account.email, password: account.password }),
  });
  if (!res.ok) throw new Error(`sign-in as ${role}: ${res.status} ${await res.text()}`);
  return res.headers.get('set-cookie')!.split(';')[0];
}
// Reviewers (and admins) may recompute a statement.
const reviewerCookie = await signIn('reviewer');
const writerCookie = await signIn('writer');
const kiosk = { authorization: `Bearer ${token}` };
const feed = await fetch(`${base}/api/kiosk/feed`, { headers: kiosk });
const feedEtag = feed.headers.get('etag')!;
const publicList = (await (await fetch(`${base}/api/public/pages`)).json()) as { data: Array<{ slug?: string; id: string }> };
const publicPage = publicList.data[0];
if (!publicPage) throw new Error('the demo scenario published no page');
const objectId = (await Statement.findByPk(statement.id))!.skyObjectId;
const made = await fetch(`${base}/api/pages`, {
  method: 'POST',
  headers: { cookie: writerCookie, origin: PUBLIC_URL, 'content-type': 'application/json' },
  body: JSON.stringify({ title: 'Capacity draft (benchmark)', objectId, locale: 'en-GB' }),
});
if (!made.ok) throw new Error(`creating the draft: ${made.status} ${await made.text()}`);
const draft = ((await made.json()) as { data: { id: string; version: number } }).data;

interface Case {
  name: string;
  amount: number;
  connections: number;
  request: Record<string, unknown>;
  expect: number;
}
let edits = 0;
const cases: Case[] = [
  {
    name: 'kiosk feed, full 200',
    amount: 3000,
    connections: 4,
    request: { path: '/api/kiosk/feed', headers: kiosk },
    expect: 200,
  },
  {
    name: 'kiosk feed, 304 revalidation',
    amount: 6000,
    connections: 4,
    request: { path: '/api/kiosk/feed', headers: { ...kiosk, 'if-none-match': feedEtag } },
    expect: 304,
  },
  {
    name: 'public page (JSON)',
    amount: 3000,
    connections: 4,
    request: { path: `/api/public/pages/${publicPage.slug ?? publicPage.id}` },
    expect: 200,
  },
  { name: 'Atom feed', amount: 3000, connections: 4, request: { path: '/api/public/pages.atom' }, expect: 200 },
  {
    name: 'staff: autosave (page save)',
    amount: 300,
    connections: 1,
    request: {
      method: 'PUT',
      path: `/api/pages/${draft.id}`,
      headers: { cookie: writerCookie, origin: PUBLIC_URL, 'content-type': 'application/json' },
      setupRequest: (req: Record<string, unknown>) => ({
        ...req,
        body: JSON.stringify({
          version: draft.version,
          title: 'Capacity draft (benchmark)',
          doc: {
            type: 'doc',
            content: [{ type: 'paragraph', content: [{ type: 'text', text: `Autosaved text, edit ${++edits}.` }] }],
          },
        }),
      }),
      onResponse: (status: number, body: string) => {
        if (status === 200) draft.version = (JSON.parse(body) as { data: { version: number } }).data.version;
      },
    },
    expect: 200,
  },
  {
    name: 'staff: statement recompute',
    amount: 100,
    connections: 1,
    request: {
      method: 'POST',
      path: `/api/statements/${statement.id}/recompute`,
      headers: { cookie: reviewerCookie, origin: PUBLIC_URL },
    },
    expect: 200,
  },
];

interface Row {
  name: string;
  requests: number;
  appMs: number;
  pgMs: number;
  queries: number;
  bad: number;
}
async function measure(c: Case, amount: number): Promise<Row> {
  await ask('reset');
  const pg0 = postgresCpuSeconds(dataDir);
  const r = await autocannon({ url: base, connections: c.connections, amount, requests: [c.request] } as never);
  const pgMs = (postgresCpuSeconds(dataDir) - pg0) * 1000;
  const report = (await ask('report')) as Report;
  const ok = Object.entries(r.statusCodeStats ?? {}).reduce(
    (n, [code, v]) => n + (Number(code) === c.expect ? (v as { count: number }).count : 0),
    0,
  );
  return {
    name: c.name,
    requests: amount,
    appMs: report.cpuMs / amount,
    pgMs: pgMs / amount,
    queries: report.queries / amount,
    bad: amount - ok,
  };
}

const rows: Row[] = [];
for (const c of cases) {
  // Warm-up: compiled code, pools, the prepared documents in memory.
  await measure(c, Math.max(10, Math.round(c.amount / 10)));
  rows.push(await measure(c, Math.max(10, Math.round(c.amount * SCALE))));
}
child.kill('SIGTERM');
await closeSequelize();
stopLocalPostgres(dataDir);

const f = (x: number, digits = 2) => x.toFixed(digits);
console.log(`Capacity (Node ${process.version}, this machine; CPU per request over a fixed number of requests)`);
console.log('| path | requests | app CPU per request | PostgreSQL CPU per request | queries per request | per app core |');
console.log('|---|---|---|---|---|---|');
for (const r of rows) {
  const perSecond = 1000 / r.appMs;
  const perCore = r.name.startsWith('kiosk feed, 304')
    ? `${Math.round(perSecond * 60).toLocaleString('en-GB')} screens polling every 60 s`
    : r.name === 'public page (JSON)'
      ? `${Math.round(perSecond).toLocaleString('en-GB')} page views/s`
      : `${Math.round(perSecond).toLocaleString('en-GB')} /s`;
  console.log(
    `| ${r.name} | ${r.requests}${r.bad ? ` (${r.bad} unexpected answers)` : ''} | ${f(r.appMs, 3)} ms | ${f(r.pgMs, 3)} ms | ${f(r.queries, 2)} | ${perCore} |`,
  );
}
process.exit(rows.some((r) => r.bad > 0) ? 1 : 0);
