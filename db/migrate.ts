// Applies committed migrations (idempotent: a second run is a no-op). Used by the start and test
// scripts. Always as the owner role: the app's role may not change the schema. Then the job
// queue's own tables, opened to the app's role (db/job-queue.ts).
import { drizzle } from 'drizzle-orm/node-postgres';
import { migrate } from 'drizzle-orm/node-postgres/migrator';
import { Pool } from 'pg';
import { migrateJobQueue } from './job-queue';
import { databaseUrl } from './url';

const ownerUrl = databaseUrl(undefined, 'owner');
const pool = new Pool({ connectionString: ownerUrl, max: 1 });
await migrate(drizzle(pool), { migrationsFolder: new URL('./migrations', import.meta.url).pathname });
await pool.end();
await migrateJobQueue(ownerUrl);
console.log('migrations applied');
