import type { Server } from 'node:http';
import { createApp, createWorkerApp } from '../app.ts';
import { adoptDatabaseUrl, checkConfig, config, productionSettingProblems } from '../config.ts';
import { closeSequelize, getSequelize } from '../db.ts';
import { isDatabaseDown } from '../db-down.ts';
import { startLocalPostgres, stopLocalPostgres } from '../db/local-postgres.ts';
import { underStartUpLock } from '../db/start-up-lock.ts';
import { DEMO_ACCOUNTS } from '../demo/accounts.ts';
import { accountsWithDemoPasswords, seedDemo } from '../demo/seed.ts';
import { logger, routeConsoleToLogger } from '../logger.ts';
import { startMailCatcher } from '../mail/catcher.ts';
import { routeMailToCatcher } from '../mail/mailer.ts';
import { startJobQueue, stopJobQueue } from '../jobs/queue.ts';
import { migrate } from '../migrations/runner.ts';
import { initModels } from '../models/index.ts';
import { sweepOrphanMedia } from '../services/media/index.ts';
import { recomputeAfterRulesRelease } from '../services/statements/index.ts';
import { warmPasswordHashing } from '../services/users/index.ts';
import { startSchedules } from '../wiring.ts';

const started = Date.now();

try {
  checkConfig();
} catch (error) {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
}
const problems = productionSettingProblems();
if (problems.length) {
  console.error(`Refusing to start in production:\n  ${problems.join('\n  ')}`);
  process.exit(1);
}

// pg-boss 10 does not await its own complete/fail calls (timgit/pg-boss#577), so during a database
// outage they reject with nobody listening and Node would exit. Such a job stays active, expires and
// runs again. Any other unhandled rejection is a bug and still stops the process.
process.on('unhandledRejection', (reason) => {
  if (isDatabaseDown(reason)) {
    logger.warn({ err: reason }, 'database unreachable outside a request');
    return;
  }
  logger.fatal({ err: reason }, 'unhandled promise rejection');
  process.exit(1);
});
// From here on, library output goes through the JSON log like everything else.
routeConsoleToLogger();

const ownsPostgres = !config.databaseUrl;

if (ownsPostgres) {
  adoptDatabaseUrl(await startLocalPostgres(config.localPostgres));
  console.log(`PostgreSQL running on 127.0.0.1:${config.localPostgres.port} (data in ${config.localPostgres.dataDir})`);
}
const role = config.role;
const runsJobs = role !== 'web';
const servesRequests = role !== 'worker';
const sequelize = initModels(getSequelize());
// Several servers started together take turns: one migrates (and seeds), the others find it done.
const applied = await underStartUpLock(() => migrate(sequelize));
if (applied.length) console.log(`Applied ${applied.length} migration(s).`);
await sweepOrphanMedia();

let catcher: Awaited<ReturnType<typeof startMailCatcher>> | undefined;
if (!config.smtpUrl) {
  catcher = await startMailCatcher(config.smtpCatcherPort);
  routeMailToCatcher(catcher.port);
  console.log(`Mail catcher on 127.0.0.1:${catcher.port}; admins read it on the Outbox page.`);
}

if (config.isProduction) {
  const unsafe = await accountsWithDemoPasswords();
  if (unsafe.length) {
    console.error(
      `Refusing to start in production: these accounts still use demo passwords: ${unsafe.join(', ')}. Change or deactivate them first.`,
    );
    process.exit(1);
  }
} else {
  await underStartUpLock(() => seedDemo());
}

// A web server only queues jobs (a worker runs them); a worker serves nothing but its health.
const app = servesRequests ? createApp({ serveClient: true }) : createWorkerApp();
// A hashing thread started and one hash timed, while the job queue starts, before the first sign-in
// can arrive (about a quarter of a second at cost 11, in the thread).
const warmingHashes = servesRequests ? warmPasswordHashing() : undefined;
// Under the start-up lock: servers starting together would create pg-boss's queues at once and deadlock.
const queue = await underStartUpLock(() => startJobQueue(config.databaseUrl ?? '', { workers: runsJobs }));
if (runsJobs) {
  await startSchedules(queue);
  if (await recomputeAfterRulesRelease())
    console.log('Statement rules changed with this release: every statement is being recomputed.');
}
await warmingHashes;
const server: Server = app.listen(config.port, config.host, () => {
  const url = `http://${config.host}:${config.port}`;
  const what = role === 'both' ? '' : ` as ${role === 'web' ? 'a web server (no jobs)' : 'a worker (jobs and health only)'}`;
  console.log(`\nStarproof is ready at ${url}${what}  (${((Date.now() - started) / 1000).toFixed(1)} s)`);
  if (!config.isProduction && servesRequests) {
    console.log('\nDemo accounts (demo data only; never used in production):');
    for (const a of DEMO_ACCOUNTS) console.log(`  ${a.role.padEnd(9)} ${a.email.padEnd(30)} ${a.password}`);
  }
  console.log('\nPress Ctrl+C to stop.');
});

let stopping = false;
async function shutdown(signal: string) {
  if (stopping) return;
  stopping = true;
  logger.info({ signal }, 'shutting down');
  server.close();
  server.closeIdleConnections();
  // Requests under way finish, their session writes included, before the pools close (5 s at most).
  await Promise.race([
    new Promise((resolve) => server.once('close', resolve)),
    new Promise((resolve) => setTimeout(resolve, 5_000)),
  ]);
  server.closeAllConnections();
  await stopJobQueue().catch(() => undefined);
  catcher?.server.close(() => undefined);
  // A session write started by the last requests may still be on its way: let it land first.
  const sessions = app.locals.sessionPool as {
    end(): Promise<void>;
    totalCount: number;
    idleCount: number;
    waitingCount: number;
  };
  for (let i = 0; i < 50 && (sessions.totalCount > sessions.idleCount || sessions.waitingCount > 0); i++)
    await new Promise((resolve) => setTimeout(resolve, 100));
  await sessions.end().catch(() => undefined);
  await closeSequelize();
  if (ownsPostgres) stopLocalPostgres(config.localPostgres.dataDir);
  process.exit(0);
}
process.on('SIGINT', () => void shutdown('SIGINT'));
process.on('SIGTERM', () => void shutdown('SIGTERM'));
