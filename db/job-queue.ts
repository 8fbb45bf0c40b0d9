// The job queue's own tables (schema graphile_worker; graphile-worker keeps its own migrations).
// Created by the owner role, then opened to the app's role: the app's servers enqueue jobs, and
// the worker inside each one claims, completes and reschedules them.
import { runMigrations } from 'graphile-worker';
import { Client } from 'pg';
import { APP_ROLE } from './url';

export async function migrateJobQueue(ownerConnectionString: string): Promise<void> {
  await runMigrations({ connectionString: ownerConnectionString });
  const client = new Client({ connectionString: ownerConnectionString });
  await client.connect();
  try {
    await client.query(`GRANT USAGE ON SCHEMA graphile_worker TO ${APP_ROLE}`);
    await client.query(
      `GRANT SELECT, INSERT, UPDATE, DELETE ON ALL TABLES IN SCHEMA graphile_worker TO ${APP_ROLE}`,
    );
    await client.query(`GRANT USAGE, SELECT ON ALL SEQUENCES IN SCHEMA graphile_worker TO ${APP_ROLE}`);
    await client.query(`GRANT EXECUTE ON ALL FUNCTIONS IN SCHEMA graphile_worker TO ${APP_ROLE}`);
  } finally {
    await client.end();
  }
}
