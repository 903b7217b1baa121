import path from 'node:path';
import { z } from 'zod';

// Every environment variable the server reads, with its default and its rule. Documented in the
// README's configuration table; keep the two in step. Values are read when asked for (not frozen
// at import), so a test may set a variable before the module that needs it first uses it.

/** An unset or empty variable takes the default (or stays unset). */
const unset = (value: unknown) => (value === '' ? undefined : value);
const variable = <T extends z.ZodType>(schema: T) => z.preprocess(unset, schema);
const text = (fallback: string) => variable(z.string().default(fallback));
const optionalText = () => variable(z.string().optional());
const wholeNumber = (min: number, max: number) => {
  const rule = `must be a whole number from ${min} to ${max}`;
  return z.coerce.number({ error: rule }).int(rule).min(min, rule).max(max, rule);
};
const positiveNumber = () =>
  variable(z.coerce.number({ error: 'must be a positive number' }).positive('must be a positive number').finite().optional());
const url = () => variable(z.url({ error: 'must be a full URL such as https://example.org' }).optional());
const port = (fallback: number) => variable(wholeNumber(0, 65_535).default(fallback));
const ms = (fallback: number) => variable(wholeNumber(0, 3_600_000).default(fallback));
const limit = () => wholeNumber(1, 1_000_000);

/** The environment's variables and their rules. */
export const EnvSchema = z.object({
  NODE_ENV: variable(z.enum(['development', 'production', 'test']).default('development')),
  HOST: text('127.0.0.1'),
  PORT: port(4780),
  DATABASE_URL: optionalText(),
  DATABASE_READ_URL: optionalText(),
  STARPROOF_REPLICA_MAX_LAG_MS: ms(500),
  STARPROOF_ROLE: variable(z.enum(['web', 'worker', 'both'], { error: 'must be "web", "worker" or "both"' }).default('both')),
  STARPROOF_PGDATA: text('.data/postgres'),
  STARPROOF_PGPORT: port(54380),
  SMTP_URL: optionalText(),
  STARPROOF_SMTP_PORT: port(2526),
  MAIL_FROM: text('Starproof <no-reply@starproof.invalid>'),
  SESSION_SECRET: text('starproof-development-secret-change-me'),
  PUBLIC_URL: url(),
  UPLOADS_DIR: text('uploads'),
  STARPROOF_DIST_DIR: text('dist'),
  LOG_LEVEL: variable(z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).optional()),
  STARPROOF_STORAGE: variable(z.enum(['local', 's3'], { error: 'must be "local" or "s3"' }).default('local')),
  STARPROOF_S3_BUCKET: optionalText(),
  STARPROOF_S3_REGION: optionalText(),
  AWS_REGION: optionalText(),
  STARPROOF_S3_ENDPOINT: url(),
  STARPROOF_S3_FORCE_PATH_STYLE: variable(z.enum(['true', 'false'], { error: 'must be "true" or "false"' }).default('false')),
  STARPROOF_S3_PREFIX: text(''),
  STARPROOF_MEDIA_PUBLIC_URL: url(),
  STARPROOF_UPLOAD_MAX_MB: positiveNumber(),
  STARPROOF_UPLOAD_MAX_MEGAPIXELS: positiveNumber(),
  STARPROOF_STATEMENT_WORKERS: variable(wholeNumber(0, 64).optional()),
  STARPROOF_KIOSK_AUTH_CACHE_MS: ms(1000),
  STARPROOF_FEED_CHECK_MS: ms(1000),
  STARPROOF_SIGNIN_LIMIT: variable(limit().optional()),
  STARPROOF_PAIRING_LIMIT: variable(limit().default(30)),
  STARPROOF_PUBLIC_LIMIT: variable(limit().default(300)),
  STARPROOF_PUBLISHER_NAME: text('Starproof'),
  PASSWORD_HASH_THREADS: variable(wholeNumber(1, 64).default(2)),
  PASSWORD_HASH_QUEUE: variable(wholeNumber(1, 100_000).default(64)),
  PASSWORD_HASH_MAX_WAIT_MS: ms(5_000),
  TRUST_PROXY: text('loopback'),
  DB_QUERY_TIMEOUT_MS: ms(15_000),
});

/** The checked environment. */
export type Env = z.infer<typeof EnvSchema>;
type Name = keyof Env;

/** A variable that breaks its rule; the message names it and says what is wanted. */
export class ConfigError extends Error {
  override name = 'ConfigError';
}

function describe(name: string, message: string, value: unknown): string {
  return `${name} ${message}, not ${JSON.stringify(value)}.`;
}

/**
 * Checks the whole environment at once (server start and createApp), so a bad value stops the
 * server with every problem named rather than failing later in a request.
 * @param env the environment (the process's own by default)
 * @throws ConfigError listing each variable that breaks its rule
 */
export function checkConfig(env: NodeJS.ProcessEnv = process.env): Env {
  const result = EnvSchema.safeParse(env);
  if (result.success) return result.data;
  const problems = result.error.issues.map((issue) => {
    const name = String(issue.path[0]);
    return describe(name, issue.message, env[name]);
  });
  throw new ConfigError(`The server's configuration is not usable:\n  ${problems.join('\n  ')}`);
}

/** Each variable's last checked value, with the text it was checked from. */
const checked = new Map<Name, { raw: string | undefined; value: unknown }>();

/**
 * One variable, checked against its rule. Settings are read on every use (a test may change one
 * between two), some on hot paths (each sign-in at the door): a value is checked again only when
 * its text changed.
 */
function read<K extends Name>(name: K): Env[K] {
  const raw = process.env[name];
  const last = checked.get(name);
  if (last && last.raw === raw) return last.value as Env[K];
  const result = EnvSchema.shape[name].safeParse(raw);
  if (!result.success) throw new ConfigError(describe(name, result.error.issues[0]?.message ?? 'is not usable', raw));
  checked.set(name, { raw, value: result.data });
  return result.data as Env[K];
}

/** Runtime settings from the environment; defaults suit one machine on loopback. */
export const config = {
  get env() {
    return read('NODE_ENV');
  },
  get isProduction() {
    return read('NODE_ENV') === 'production';
  },
  get host() {
    return read('HOST');
  },
  get port() {
    return read('PORT');
  },
  /** Set to use an existing PostgreSQL; when unset the project runs its own on loopback. */
  get databaseUrl() {
    return read('DATABASE_URL');
  },
  /**
   * A streaming replica for public reads (kiosk feed, public API, Atom); unset: everything reads the
   * primary. See services/publishing/public-reads.ts for when the replica is used.
   */
  get databaseReadUrl() {
    return read('DATABASE_READ_URL');
  },
  /** Longest a public read waits for the replica to replay the primary's position before it reads the primary (ms). */
  get replicaMaxLagMs() {
    return read('STARPROOF_REPLICA_MAX_LAG_MS');
  },
  /** What this process does: `web` serves requests only, `worker` runs jobs and schedules only, `both` (default) does both. */
  get role() {
    return read('STARPROOF_ROLE');
  },
  get localPostgres() {
    return { dataDir: path.resolve(read('STARPROOF_PGDATA')), port: read('STARPROOF_PGPORT'), database: 'starproof' };
  },
  /** Set to use a real relay; when unset a local catcher runs on loopback. */
  get smtpUrl() {
    return read('SMTP_URL');
  },
  get smtpCatcherPort() {
    return read('STARPROOF_SMTP_PORT');
  },
  get mailFrom() {
    return read('MAIL_FROM');
  },
  get sessionSecret() {
    return read('SESSION_SECRET');
  },
  /** Base URL used in e-mailed links; `https://…` also turns on Secure cookies and HSTS. */
  get publicUrl() {
    return read('PUBLIC_URL');
  },
  get uploadsDir() {
    return path.resolve(read('UPLOADS_DIR'));
  },
  get distDir() {
    return path.resolve(read('STARPROOF_DIST_DIR'));
  },
  get logLevel() {
    return read('LOG_LEVEL') ?? (read('NODE_ENV') === 'test' ? 'silent' : 'info');
  },
  /** Where images are kept: the local folder, or an S3-compatible bucket. */
  get storage() {
    return {
      driver: read('STARPROOF_STORAGE'),
      bucket: read('STARPROOF_S3_BUCKET'),
      region: read('STARPROOF_S3_REGION') ?? read('AWS_REGION') ?? 'us-east-1',
      endpoint: read('STARPROOF_S3_ENDPOINT'),
      forcePathStyle: read('STARPROOF_S3_FORCE_PATH_STYLE') === 'true',
      prefix: read('STARPROOF_S3_PREFIX'),
    };
  },
  /** Upload limits (unset: the shared defaults) and the CDN in front of renditions, if any. */
  get media() {
    return {
      uploadMaxMb: read('STARPROOF_UPLOAD_MAX_MB'),
      maxMegapixels: read('STARPROOF_UPLOAD_MAX_MEGAPIXELS'),
      publicUrl: read('STARPROOF_MEDIA_PUBLIC_URL')?.replace(/\/+$/, '') || null,
    };
  },
  /** Worker threads recomputing statements (unset: one per core, at most 4; 0: inline). */
  get statementWorkers() {
    return read('STARPROOF_STATEMENT_WORKERS');
  },
  /** How long (ms) a kiosk's checked token is trusted before the database is asked again. */
  get kioskAuthCacheMs() {
    return read('STARPROOF_KIOSK_AUTH_CACHE_MS');
  },
  /** How often (ms, at most) the kiosk feed and public API check whether what they show changed. */
  get feedCheckMs() {
    return read('STARPROOF_FEED_CHECK_MS');
  },
  /** Requests per address per window: sign-in and token links (unset: each route's own), pairing, public API. */
  get limits() {
    return {
      signIn: read('STARPROOF_SIGNIN_LIMIT'),
      pairing: read('STARPROOF_PAIRING_LIMIT'),
      publicApi: read('STARPROOF_PUBLIC_LIMIT'),
    };
  },
  /** Worker threads that hash and compare passwords (fewer if the machine has fewer cores). */
  get passwordHashThreads() {
    return read('PASSWORD_HASH_THREADS');
  },
  /** Hash jobs that may wait for a thread at most; more sign-ins at once are refused with 429 `busy`. */
  get passwordHashQueue() {
    return read('PASSWORD_HASH_QUEUE');
  },
  /** Longest a sign-in may wait for a hashing thread (ms, judged from recent hash times) before 429 `busy`. */
  get passwordHashMaxWaitMs() {
    return read('PASSWORD_HASH_MAX_WAIT_MS');
  },
  /**
   * Which peers' X-Forwarded-For / X-Forwarded-Proto / X-Forwarded-Host are believed (Express
   * `trust proxy` syntax: `loopback`, a list of addresses or subnets, a hop count). Loopback only by default.
   */
  get trustProxy() {
    return read('TRUST_PROXY');
  },
  /** Longest a single database query may take before the request answers 503 (ms). */
  get dbQueryTimeoutMs() {
    return read('DB_QUERY_TIMEOUT_MS');
  },
  /** The publisher named in the public API's Atom feed. */
  get publisherName() {
    return read('STARPROOF_PUBLISHER_NAME');
  },
};

/**
 * Points the server at a database it started itself (`npm start` without DATABASE_URL); the
 * variable is the one place the URL lives, so everything reading `config.databaseUrl` sees it.
 * @param url the connection URL
 */
export function adoptDatabaseUrl(url: string): void {
  process.env.DATABASE_URL = url;
}

/**
 * Settings production cannot run without; `npm start` calls it before anything else.
 * @returns what is wrong, one line per problem (empty when all is well)
 */
export function productionSettingProblems(): string[] {
  if (!config.isProduction) return [];
  const problems: string[] = [];
  if (!config.publicUrl)
    problems.push(
      'PUBLIC_URL is not set: links in e-mail and the Atom feed, and the same-origin check, need the address people use.',
    );
  else if (!/^https?:\/\/[^/]+/.test(config.publicUrl))
    problems.push(`PUBLIC_URL (${config.publicUrl}) is not an http(s) address.`);
  return problems;
}

/** The base URL for links in e-mail. */
export function appBaseUrl(): string {
  return config.publicUrl ?? `http://${config.host}:${config.port}`;
}
