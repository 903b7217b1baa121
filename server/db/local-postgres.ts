import { execFileSync, spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { setTimeout as sleep } from 'node:timers/promises';

/** Options for a PostgreSQL cluster that the project runs itself on loopback. */
export interface LocalPostgresOptions {
  /** Folder holding the cluster; created on first use and kept between runs. */
  dataDir: string;
  /** TCP port on 127.0.0.1; non-default so a system PostgreSQL is never disturbed. */
  port: number;
  /** Database to create if missing. */
  database: string;
  /** Trade durability for speed; only for throw-away test clusters. */
  fast?: boolean;
}

const SUPERUSER = 'postgres';

/** Finds a PostgreSQL server binary: on PATH first, then the newest /usr/lib/postgresql/<v>/bin. */
export function findPgBinary(
  name: 'initdb' | 'pg_ctl' | 'postgres' | 'pg_dump' | 'pg_restore' | 'psql' | 'pg_basebackup',
): string {
  const onPath = spawnSync('sh', ['-c', `command -v ${name}`], { encoding: 'utf8' }).stdout.trim();
  // Debian puts only client wrappers on PATH; the server tools live in the versioned folder.
  if (onPath && !onPath.startsWith('/usr/bin/')) return onPath;
  const root = '/usr/lib/postgresql';
  const versions = fs.existsSync(root)
    ? fs
        .readdirSync(root)
        .filter((v) => fs.existsSync(path.join(root, v, 'bin', name)))
        .sort((a, b) => Number(b) - Number(a))
    : [];
  if (versions.length > 0) return path.join(root, versions[0], 'bin', name);
  if (onPath) return onPath;
  throw new Error(`PostgreSQL's ${name} was not found. Install Debian's postgresql package (apt-get install postgresql).`);
}

const isRoot = () => typeof process.getuid === 'function' && process.getuid() === 0;

/** Runs a server tool; PostgreSQL refuses to run as root, so as root it runs as the postgres system user. */
function runPgTool(binary: string, args: string[], options: { allowFail?: boolean } = {}): { status: number; output: string } {
  const [cmd, cmdArgs] = isRoot() ? ['runuser', ['-u', SUPERUSER, '--', binary, ...args]] : [binary, args];
  const result = spawnSync(cmd, cmdArgs, { encoding: 'utf8' });
  const output = `${result.stdout ?? ''}${result.stderr ?? ''}`;
  if (result.status !== 0 && !options.allowFail) {
    throw new Error(`${path.basename(binary)} ${args.join(' ')} failed:\n${output}`);
  }
  return { status: result.status ?? 1, output };
}

/** Every parent folder must be traversable by the postgres user when we run as root. */
function prepareDataDir(dataDir: string): void {
  fs.mkdirSync(dataDir, { recursive: true });
  fs.chmodSync(dataDir, 0o700);
  if (isRoot()) {
    execFileSync('chown', ['-R', `${SUPERUSER}:${SUPERUSER}`, dataDir]);
    for (let dir = path.dirname(dataDir); dir !== path.dirname(dir); dir = path.dirname(dir)) {
      const mode = fs.statSync(dir).mode;
      if ((mode & 0o001) === 0) fs.chmodSync(dir, mode | 0o001);
    }
  }
}

function writeConfig(opts: LocalPostgresOptions): void {
  // A Unix socket path is limited to 107 bytes; fall back to TCP only for long paths.
  const socketDir = path.join(opts.dataDir, '.s.PGSQL.0000').length < 100 ? opts.dataDir : '';
  const lines = [
    '# written by Starproof (server/db/local-postgres.ts)',
    "listen_addresses = '127.0.0.1'",
    `port = ${opts.port}`,
    `unix_socket_directories = '${socketDir}'`,
    'max_connections = 60',
    'shared_buffers = 128MB',
    ...(opts.fast ? ['fsync = off', 'synchronous_commit = off', 'full_page_writes = off'] : []),
  ];
  fs.writeFileSync(path.join(opts.dataDir, 'postgresql.starproof.conf'), `${lines.join('\n')}\n`);
  const main = path.join(opts.dataDir, 'postgresql.conf');
  const text = fs.readFileSync(main, 'utf8');
  if (!text.includes("include_if_exists = 'postgresql.starproof.conf'")) {
    fs.appendFileSync(main, "\ninclude_if_exists = 'postgresql.starproof.conf'\n");
  }
}

/** True when the cluster in dataDir has a live postmaster. */
export function isRunning(dataDir: string): boolean {
  if (!fs.existsSync(path.join(dataDir, 'PG_VERSION'))) return false;
  return runPgTool(findPgBinary('pg_ctl'), ['-D', dataDir, 'status'], { allowFail: true }).status === 0;
}

/** The connection URL for a local cluster's database. */
export function localDatabaseUrl(opts: Pick<LocalPostgresOptions, 'port' | 'database'>): string {
  return `postgres://${SUPERUSER}@127.0.0.1:${opts.port}/${opts.database}`;
}

async function waitUntilReady(opts: LocalPostgresOptions): Promise<void> {
  const pg = await import('pg');
  const deadline = Date.now() + 30_000;
  for (;;) {
    const client = new pg.default.Client({ host: '127.0.0.1', port: opts.port, user: SUPERUSER, database: 'postgres' });
    try {
      await client.connect();
      await client.end();
      return;
    } catch (error) {
      await client.end().catch(() => undefined);
      if (Date.now() > deadline) throw new Error(`PostgreSQL did not become ready on port ${opts.port}: ${String(error)}`);
      await sleep(150);
    }
  }
}

/** Creates the database unless it exists. Names are our own constants, never user input. */
export async function ensureDatabase(
  opts: Pick<LocalPostgresOptions, 'port' | 'database'>,
  { recreate = false } = {},
): Promise<void> {
  const pg = await import('pg');
  const client = new pg.default.Client({ host: '127.0.0.1', port: opts.port, user: SUPERUSER, database: 'postgres' });
  await client.connect();
  try {
    if (!/^[a-z_][a-z0-9_]*$/.test(opts.database)) throw new Error(`Unsafe database name: ${opts.database}`);
    if (recreate) await client.query(`DROP DATABASE IF EXISTS ${opts.database} WITH (FORCE)`);
    const exists = await client.query('SELECT 1 FROM pg_database WHERE datname = $1', [opts.database]);
    if (exists.rowCount === 0) await client.query(`CREATE DATABASE ${opts.database} ENCODING 'UTF8' TEMPLATE template0`);
  } finally {
    await client.end();
  }
}

/**
 * Creates (first run) or reuses the cluster, starts it if stopped, waits until it answers,
 * and creates the database. Returns the connection URL.
 */
export async function startLocalPostgres(opts: LocalPostgresOptions): Promise<string> {
  const dataDir = path.resolve(opts.dataDir);
  const resolved = { ...opts, dataDir };
  if (!fs.existsSync(path.join(dataDir, 'PG_VERSION'))) {
    prepareDataDir(dataDir);
    runPgTool(findPgBinary('initdb'), ['-D', dataDir, '-U', SUPERUSER, '-A', 'trust', '-E', 'UTF8', '--locale=C.UTF-8']);
  } else if (isRoot()) {
    prepareDataDir(dataDir);
  }
  writeConfig(resolved);
  if (!isRunning(dataDir)) {
    const log = path.join(dataDir, 'server.log');
    runPgTool(findPgBinary('pg_ctl'), ['-D', dataDir, '-l', log, '-w', '-t', '30', 'start']);
  }
  await waitUntilReady(resolved);
  await ensureDatabase(resolved);
  return localDatabaseUrl(resolved);
}

/**
 * Makes a streaming replica of a running local cluster (`pg_basebackup -R`: a copy of its data plus
 * the standby settings that follow the primary over streaming replication) and starts it on its own
 * port. The primary's default `wal_level` (replica) and loopback replication rule from initdb suffice.
 * @param primaryPort the running primary's port
 * @param opts the replica's folder (must not exist yet), port and database
 * @returns the replica's connection URL (read-only)
 */
export async function startLocalReplica(primaryPort: number, opts: LocalPostgresOptions): Promise<string> {
  const dataDir = path.resolve(opts.dataDir);
  prepareDataDir(dataDir);
  runPgTool(findPgBinary('pg_basebackup'), [
    '-h',
    '127.0.0.1',
    '-p',
    String(primaryPort),
    '-U',
    SUPERUSER,
    '-D',
    dataDir,
    '-R',
    '-X',
    'stream',
    '-c',
    'fast',
  ]);
  return startLocalPostgres({ ...opts, dataDir });
}

/** Stops the cluster cleanly (fast shutdown: rolls back open transactions, keeps all committed data). */
export function stopLocalPostgres(dataDir: string): void {
  const dir = path.resolve(dataDir);
  if (!isRunning(dir)) return;
  runPgTool(findPgBinary('pg_ctl'), ['-D', dir, '-m', 'fast', '-w', '-t', '30', 'stop']);
}
