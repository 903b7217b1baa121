import type { TestProject } from 'vitest/node';
import { Sequelize } from 'sequelize';
import { migrate } from '../../server/migrations/runner.ts';
import { freshTestDatabase, stopTestCluster } from './test-postgres.ts';

declare module 'vitest' {
  export interface ProvidedContext {
    databaseUrl: string;
  }
}

/** Once per run of the API suite: an empty database with every migration applied. */
export default async function setup(project: TestProject) {
  const { url, startedCluster } = await freshTestDatabase('starproof_api_test');
  const sequelize = new Sequelize(url, { logging: false });
  await migrate(sequelize);
  await sequelize.close();
  project.provide('databaseUrl', url);
  return () => {
    if (startedCluster) stopTestCluster();
  };
}
