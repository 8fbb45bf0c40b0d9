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
    // graphile-worker turns row-level security on for its private tables, which only the table
    // owner passes; the app's role works the queue too, so the owner turns it off again here.
    const { rows } = await client.query<{ name: string }>(
      `SELECT c.relname AS name FROM pg_class c JOIN pg_namespace n ON n.oid = c.relnamespace
        WHERE n.nspname = 'graphile_worker' AND c.relkind = 'r' AND c.relrowsecurity`,
    );
    for (const { name } of rows) {
      await client.query(
        `ALTER TABLE graphile_worker.${client.escapeIdentifier(name)} DISABLE ROW LEVEL SECURITY`,
      );
    }
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
