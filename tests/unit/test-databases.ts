// The test databases: a template made once per run (migrated and seeded), and one copy of it per
// database test file, so no file sees another's rows. They live on the same server as the app's
// database: DATABASE_URL when set, else the local cluster of scripts/db.sh. The owner role
// creates, migrates, seeds and drops them; the tests themselves connect as the app's role.
import pg from 'pg';
import { APP_ROLE, databaseUrl, type DbRole } from '../../db/url';

const PREFIX = process.env.HM_TEST_DB ?? 'hitchmark_test';
export const TEMPLATE_DB = `${PREFIX}_template`;
/** Every per-file database starts with this, so an interrupted run's leftovers can be found. */
export const FILE_DB_PREFIX = `${PREFIX}_file_`;

/** The address of database `name` on the app's database server, as the app's role or the owner. */
export function urlOf(name: string, role: DbRole = 'app'): string {
  const url = new URL(databaseUrl(name, role));
  url.pathname = `/${name}`;
  return url.toString();
}

/** Points this process's `@/db` at database `name` (read when `@/db` is first imported). */
export function pointAtDatabase(name: string): void {
  process.env.HM_DB_NAME = name;
  if (process.env.DATABASE_URL) process.env.DATABASE_URL = urlOf(name, 'app');
  if (process.env.DATABASE_OWNER_URL) process.env.DATABASE_OWNER_URL = urlOf(name, 'owner');
}

async function onServer<T>(work: (client: pg.Client) => Promise<T>): Promise<T> {
  const client = new pg.Client({ connectionString: urlOf('postgres', 'owner') });
  await client.connect();
  try {
    return await work(client);
  } finally {
    await client.end();
  }
}

const quoted = (name: string) => `"${name.replace(/"/g, '""')}"`;

/** Creates `name`, empty or as a file-level copy of `template` (much faster than migrating and seeding again). */
export async function createDatabase(name: string, template?: string): Promise<void> {
  const from = template ? ` TEMPLATE ${quoted(template)} STRATEGY FILE_COPY` : '';
  await onServer((c) => c.query(`CREATE DATABASE ${quoted(name)}${from}`));
}

/**
 * Drops `name`, first closing any connection a test left open. Not `WITH (FORCE)`: that refuses
 * when an autovacuum worker is busy in the fresh copy (it is no role of ours), whereas a plain
 * DROP DATABASE stops autovacuum there by itself.
 */
export async function dropDatabase(name: string): Promise<void> {
  await onServer(async (c) => {
    await c.query(
      `SELECT pg_terminate_backend(pid) FROM pg_stat_activity
        WHERE datname = $1 AND usename IN (current_user, $2) AND pid <> pg_backend_pid()`,
      [name, APP_ROLE],
    );
    await c.query(`DROP DATABASE IF EXISTS ${quoted(name)}`);
  });
}

/** Drops the per-file databases an interrupted run left behind. */
export async function dropLeftoverFileDatabases(): Promise<void> {
  const names = await onServer(async (c) => {
    const { rows } = await c.query<{ datname: string }>(
      'SELECT datname FROM pg_database WHERE starts_with(datname, $1)',
      [FILE_DB_PREFIX],
    );
    return rows.map((r) => r.datname);
  });
  for (const name of names) await dropDatabase(name);
}
