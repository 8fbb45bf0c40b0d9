import 'server-only';
import { and, eq, isNull } from 'drizzle-orm';
import type { Tx } from '@/db';
import { holds } from '@/db/schema';

/** One hold of one trailer, locked for update; null when that trailer has no such hold. */
export async function lockHold(tx: Tx, holdId: string, trailerId: string) {
  const [hold] = await tx
    .select({ id: holds.id, releasedAt: holds.releasedAt, placedAt: holds.placedAt })
    .from(holds)
    .where(and(eq(holds.id, holdId), eq(holds.trailerId, trailerId)))
    .for('update');
  return hold ?? null;
}

/** Records the repair on a hold that is still open; its releasedAt is the repair time. */
export async function markHoldReleased(
  tx: Tx,
  r: { holdId: string; repairedAt: Date; releasedById: string; repairedBy: string; repairNote: string },
) {
  await tx
    .update(holds)
    .set({
      releasedAt: r.repairedAt,
      releasedById: r.releasedById,
      repairedBy: r.repairedBy,
      repairNote: r.repairNote,
    })
    .where(and(eq(holds.id, r.holdId), isNull(holds.releasedAt)));
}
