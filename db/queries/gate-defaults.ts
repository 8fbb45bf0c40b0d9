import 'server-only';
import { desc, eq } from 'drizzle-orm';
import { db } from '@/db';
import { handoffs } from '@/db/schema';

/** What the gate form prefills for this driver: the tractor of their latest handoff (null when none). */
export async function getDriverGateDefaults(driverId: string): Promise<{ tractorNumber: string | null }> {
  const [row] = await db
    .select({ tractorNumber: handoffs.tractorNumber })
    .from(handoffs)
    .where(eq(handoffs.driverId, driverId))
    .orderBy(desc(handoffs.occurredAt))
    .limit(1);
  return { tractorNumber: row?.tractorNumber ?? null };
}
