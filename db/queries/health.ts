import 'server-only';
import { sql } from 'drizzle-orm';
import { db } from '@/db';

/** Answers when the database does; throws when it does not. */
export async function pingDatabase(): Promise<void> {
  await db.execute(sql`select 1`);
}
