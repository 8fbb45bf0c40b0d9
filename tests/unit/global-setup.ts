// Vitest global setup, once per run: the template database every database test file copies,
// migrated from the committed migrations and seeded with the demo data. PostgreSQL itself is
// started by scripts/test.sh (or scripts/db.sh start).
import type { TestProject } from 'vitest/node';
import {
  createDatabase,
  dropDatabase,
  dropLeftoverFileDatabases,
  TEMPLATE_DB,
  pointAtDatabase,
} from './test-databases';

declare module 'vitest' {
  export interface ProvidedContext {
    templateDb: string;
  }
}

export default async function setup(project: TestProject) {
  await dropLeftoverFileDatabases();
  await dropDatabase(TEMPLATE_DB);
  await createDatabase(TEMPLATE_DB);
  pointAtDatabase(TEMPLATE_DB);
  const { migrate } = await import('drizzle-orm/node-postgres/migrator');
  const { db, pool } = await import('../../db/index');
  const { seed } = await import('../../db/seed');
  await migrate(db, { migrationsFolder: 'db/migrations' });
  const { runMigrations } = await import('graphile-worker');
  const { databaseUrl } = await import('../../db/url');
  await runMigrations({ connectionString: databaseUrl() });
  await seed();
  // a template cannot be copied while anyone is connected to it
  await pool.end();
  project.provide('templateDb', TEMPLATE_DB);
  return async () => {
    await dropLeftoverFileDatabases();
    await dropDatabase(TEMPLATE_DB);
  };
}
