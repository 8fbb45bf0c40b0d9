// The one Postgres pool and Drizzle client. No `server-only` marker: seed and migrate scripts
// import this under plain Node.
import { drizzle, type NodePgDatabase } from 'drizzle-orm/node-postgres';
import { Pool } from 'pg';
import * as schema from './schema';
import { databaseUrl } from './url';

export type Db = NodePgDatabase<typeof schema>;
export type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];

type Cached = { pool: Pool; db: Db };
const globalForDb = globalThis as unknown as { hitchmarkDb?: Cached };

function build(): Cached {
  const url = databaseUrl();
  if (!/^postgres(ql)?:\/\//.test(url)) throw new Error('DATABASE_URL must be a postgres:// URL');
  const pool = new Pool({ connectionString: url, max: Number(process.env.HM_PG_POOL ?? 10) });
  // An idle connection can be closed under the pool (a database restart or failover, PgBouncer
  // recycling its server connections, a test dropping its database). Without a listener the
  // pool's 'error' event would end the process; the pool has already discarded that connection
  // and opens a new one on the next query, so it is only worth a line in the log.
  pool.on('error', (error) => {
    console.error(`[db] an idle database connection was closed: ${error.message}`);
  });
  return { pool, db: drizzle(pool, { schema }) };
}

const cached = globalForDb.hitchmarkDb ?? build();
// Outside production, keep one pool across hot reloads instead of opening a new one each time.
if (process.env.NODE_ENV !== 'production') globalForDb.hitchmarkDb = cached;

export const db = cached.db;
export const pool = cached.pool;
