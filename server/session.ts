import connectPgSimple from 'connect-pg-simple';
import session from 'express-session';
import pg from 'pg';
import { config } from './config.ts';
import { poolTimeouts } from './db.ts';
import { logger } from './logger.ts';

const PgStore = connectPgSimple(session);

/** Longest a session read or write may take (ms). */
export const SESSION_QUERY_TIMEOUT_MS = 4_000;

/** Sessions in PostgreSQL (so any server instance can serve any request), 12 h rolling. */
export function sessionMiddleware(databaseUrl: string, https: boolean) {
  // Every request with a cookie reads its session first: a short bound, so a frozen database answers 503 in seconds.
  const pool = new pg.Pool({ connectionString: databaseUrl, max: 5, ...poolTimeouts(SESSION_QUERY_TIMEOUT_MS) });
  // A dropped connection during a database outage must not crash the process.
  pool.on('error', () => undefined);
  return {
    pool,
    middleware: session({
      name: 'starproof.sid',
      secret: config.sessionSecret,
      // Its errors go to the log as lines like any other, not as raw stacks on standard error.
      store: new PgStore({
        pool,
        tableName: 'user_sessions',
        createTableIfMissing: false,
        pruneSessionInterval: 60 * 15,
        errorLog: (...args: unknown[]) =>
          logger.warn(
            { err: args.find((a) => a instanceof Error) },
            `session store: ${args.filter((a) => typeof a === 'string').join(' ')}`,
          ),
      }),
      resave: false,
      saveUninitialized: false,
      rolling: true,
      cookie: { httpOnly: true, sameSite: 'lax', secure: https, maxAge: 12 * 3_600_000 },
    }),
  };
}
