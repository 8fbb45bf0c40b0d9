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
  // migrations and the demo seed run as the owner; the test files connect as the app's role
  const before = process.env.HM_DB_ROLE;
  process.env.HM_DB_ROLE = 'owner';
  const { migrate } = await import('drizzle-orm/node-postgres/migrator');
  const { db, pool } = await import('../../db/index');
  const { seed } = await import('../../db/seed');
  await migrate(db, { migrationsFolder: 'db/migrations' });
  const { migrateJobQueue } = await import('../../db/job-queue');
  const { databaseUrl } = await import('../../db/url');
  await migrateJobQueue(databaseUrl());
  await seed();
  // a template cannot be copied while anyone is connected to it
  await pool.end();
  if (before === undefined) delete process.env.HM_DB_ROLE;
  else process.env.HM_DB_ROLE = before;
  project.provide('templateDb', TEMPLATE_DB);
  return async () => {
    await dropLeftoverFileDatabases();
    await dropDatabase(TEMPLATE_DB);
  };
}
