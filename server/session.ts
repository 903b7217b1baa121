import connectPgSimple from 'connect-pg-simple';
import session from 'express-session';
import pg from 'pg';
import { config } from './config.ts';

const PgStore = connectPgSimple(session);

/** Sessions in PostgreSQL (so any server instance can serve any request), 12 h rolling. */
export function sessionMiddleware(databaseUrl: string, https: boolean) {
  const pool = new pg.Pool({ connectionString: databaseUrl, max: 5, connectionTimeoutMillis: 5_000 });
  // A dropped connection during a database outage must not crash the process.
  pool.on('error', () => undefined);
  return {
    pool,
    middleware: session({
      name: 'starproof.sid',
      secret: config.sessionSecret,
      store: new PgStore({ pool, tableName: 'user_sessions', createTableIfMissing: false, pruneSessionInterval: 60 * 15 }),
      resave: false,
      saveUninitialized: false,
      rolling: true,
      cookie: { httpOnly: true, sameSite: 'lax', secure: https, maxAge: 12 * 3_600_000 },
    }),
  };
}
