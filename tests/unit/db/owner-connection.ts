// The owner role's connection to this test file's database, for tests that play someone who
// holds the database but not the app's secrets (disable a trigger, rewrite a row). Not a test file.
import pg from 'pg';
import { urlOf } from '../test-databases';

/** Runs `work` on a connection as the owner role to the database this file's `@/db` uses. */
export async function asOwner<T>(work: (client: pg.Client) => Promise<T>): Promise<T> {
  const name = process.env.HM_DB_NAME;
  if (!name) throw new Error('HM_DB_NAME is not set: database-per-file.ts points each file at its own copy');
  const client = new pg.Client({ connectionString: urlOf(name, 'owner') });
  await client.connect();
  try {
    return await work(client);
  } finally {
    await client.end();
  }
}
