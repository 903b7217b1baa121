import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import type { QueryInterface, Sequelize } from 'sequelize';
import { SequelizeStorage, Umzug } from 'umzug';

/** What every migration file exports: one change, with both directions. */
export interface Migration {
  up: (ctx: { context: QueryInterface }) => Promise<void>;
  down: (ctx: { context: QueryInterface }) => Promise<void>;
}

const folder = path.dirname(fileURLToPath(import.meta.url));

/** Builds the migrator over server/migrations/*.ts (files named YYYYMMDDHHMM-change.ts). */
export function createMigrator(sequelize: Sequelize) {
  return new Umzug({
    migrations: {
      glob: ['[0-9]*-*.ts', { cwd: folder }],
      // umzug's default loader uses require(), which cannot load .ts under Vitest or tsx ESM.
      resolve: ({ name, path: file, context }) => ({
        name,
        up: async () => ((await import(pathToFileURL(file!).href)) as Migration).up({ context }),
        down: async () => ((await import(pathToFileURL(file!).href)) as Migration).down({ context }),
      }),
    },
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
    logger: undefined,
  });
}

/** Applies every pending migration; returns the names applied. */
export async function migrate(sequelize: Sequelize): Promise<string[]> {
  const applied = await createMigrator(sequelize).up();
  return applied.map((m) => m.name);
}
