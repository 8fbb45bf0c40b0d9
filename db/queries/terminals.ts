import 'server-only';
import { asc, eq } from 'drizzle-orm';
import { db } from '@/db';
import { terminals } from '@/db/schema';

/** A terminal by its short code (e.g. on a script's command line), or null. */
export async function getTerminalByCode(code: string) {
  const [row] = await db.select().from(terminals).where(eq(terminals.code, code));
  return row ?? null;
}

export function listTerminals() {
  return db.select().from(terminals).orderBy(asc(terminals.code));
}
