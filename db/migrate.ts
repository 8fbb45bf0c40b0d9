// Applies committed migrations (idempotent: a second run is a no-op). Used by the start and test
// scripts. Always as the owner role: the app's role may not change the schema.
import { drizzle } from 'drizzle-orm/node-postgres';
import { migrate } from 'drizzle-orm/node-postgres/migrator';
import { Pool } from 'pg';
import { databaseUrl } from './url';

const pool = new Pool({ connectionString: databaseUrl(undefined, 'owner'), max: 1 });
await migrate(drizzle(pool), { migrationsFolder: new URL('./migrations', import.meta.url).pathname });
await pool.end();
console.log('migrations applied');
