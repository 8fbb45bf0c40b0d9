// Applies committed migrations (idempotent: a second run is a no-op). Used by the start and test scripts.
// Then the job queue's own tables (schema graphile_worker; graphile-worker keeps its migrations).
import { migrate } from 'drizzle-orm/node-postgres/migrator';
import { runMigrations } from 'graphile-worker';
import { db, pool } from './index';
import { databaseUrl } from './url';

await migrate(db, { migrationsFolder: new URL('./migrations', import.meta.url).pathname });
await runMigrations({ connectionString: databaseUrl() });
await pool.end();
console.log('migrations applied');
