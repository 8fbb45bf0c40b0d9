// Vitest global setup: a fresh database for this run, migrated from the committed migrations.
// PostgreSQL itself is started by scripts/test.sh (or scripts/db.sh start).
import { execFileSync } from 'node:child_process';

export default async function setup() {
  const name = process.env.HM_TEST_DB ?? 'hitchmark_test';
  process.env.HM_DB_NAME = name;
  if (!process.env.DATABASE_URL)
    execFileSync('bash', ['scripts/db.sh', 'createdb', name], { stdio: 'inherit' });
  const { migrate } = await import('drizzle-orm/node-postgres/migrator');
  const { db, pool } = await import('../../db/index');
  await migrate(db, { migrationsFolder: 'db/migrations' });
  await pool.end();
}
