import path from 'node:path';

/** Runtime settings, read once from the environment; defaults suit one machine on loopback. */
export const config = {
  env: process.env.NODE_ENV ?? 'development',
  get isProduction() {
    return this.env === 'production';
  },
  host: process.env.HOST ?? '127.0.0.1',
  port: Number(process.env.PORT ?? 4780),
  /** Set to use an existing PostgreSQL; when unset the project runs its own on loopback. */
  databaseUrl: process.env.DATABASE_URL,
  localPostgres: {
    dataDir: path.resolve(process.env.STARPROOF_PGDATA ?? '.data/postgres'),
    port: Number(process.env.STARPROOF_PGPORT ?? 54380),
    database: 'starproof',
  },
  /** Set to use a real relay; when unset a local catcher runs on loopback. */
  smtpUrl: process.env.SMTP_URL,
  smtpCatcherPort: Number(process.env.STARPROOF_SMTP_PORT ?? 2526),
  mailFrom: process.env.MAIL_FROM ?? 'Starproof <no-reply@starproof.invalid>',
  sessionSecret: process.env.SESSION_SECRET ?? 'starproof-development-secret-change-me',
  /** Base URL used in e-mailed links. */
  publicUrl: process.env.PUBLIC_URL,
  uploadsDir: path.resolve(process.env.UPLOADS_DIR ?? 'uploads'),
  distDir: path.resolve(process.env.STARPROOF_DIST_DIR ?? 'dist'),
  /** Worker threads that hash and compare passwords (fewer if the machine has fewer cores). */
  passwordHashThreads: Number(process.env.PASSWORD_HASH_THREADS ?? 2),
  /** Hash jobs that may wait for a thread at most; more sign-ins at once are refused with 429 `busy`. */
  passwordHashQueue: Number(process.env.PASSWORD_HASH_QUEUE ?? 64),
  /** Longest a sign-in may wait for a hashing thread (ms, judged from recent hash times) before 429 `busy`. */
  passwordHashMaxWaitMs: Number(process.env.PASSWORD_HASH_MAX_WAIT_MS ?? 5_000),
  /**
   * Which peers' X-Forwarded-For / X-Forwarded-Proto / X-Forwarded-Host are believed (Express
   * `trust proxy` syntax: `loopback`, a list of addresses or subnets, a hop count). Loopback only by default.
   */
  trustProxy: process.env.TRUST_PROXY ?? 'loopback',
  /** Longest a single database query may take before the request answers 503 (ms). */
  dbQueryTimeoutMs: Number(process.env.DB_QUERY_TIMEOUT_MS ?? 15_000),
  logLevel: process.env.LOG_LEVEL ?? (process.env.NODE_ENV === 'test' ? 'silent' : 'info'),
};

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
