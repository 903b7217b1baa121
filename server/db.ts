import { Sequelize } from 'sequelize';
import { config } from './config.ts';

let instance: Sequelize | undefined;

/** The one Sequelize instance; created on first use so the URL can be decided at start-up. */
export function getSequelize(): Sequelize {
  if (!instance) {
    const url = config.databaseUrl;
    if (!url) throw new Error('DATABASE_URL is not set and no local PostgreSQL was started.');
    instance = new Sequelize(url, {
      dialect: 'postgres',
      logging: false,
      pool: { max: 10, min: 0, acquire: 10_000, idle: 10_000 },
      // A dead database must fail requests quickly rather than hang them.
      // random_page_cost 1.1 (common practice for solid-state storage, instead of the default 4 that
      // assumes spinning disks): with 4, PostgreSQL prefers a name index whose heap happens to be in
      // name order over the catalogue's exact partial index, and filters through 500,000 rows.
      dialectOptions: {
        connectionTimeoutMillis: 5_000,
        statement_timeout: 15_000,
        query_timeout: 20_000,
        options: '-c random_page_cost=1.1',
      },
    });
  }
  return instance;
}

/** Closes the pool (tests, shutdown). */
export async function closeSequelize(): Promise<void> {
  if (instance) {
    await instance.close();
    instance = undefined;
  }
}
