import 'server-only';
import { and, eq, isNull } from 'drizzle-orm';
import { db } from '@/db';
import { holds } from '@/db/schema';
import { recordAudit } from './audit';

export type HoldRelease = {
  holdId: string;
  trailerId: string;
  repairedBy: string;
  repairNote: string;
  repairedAt: Date;
  releasedById: string;
};

/**
 * Releases an open hold by recording the repair. The hold's releasedAt is the repair time the
 * clerk entered; the audit log keeps when the release was recorded and by whom.
 * Returns 'released', 'not_found', or 'already_released'.
 */
export async function releaseHold(r: HoldRelease, now = new Date()) {
  return db.transaction(async (tx) => {
    const [hold] = await tx
      .select({ id: holds.id, releasedAt: holds.releasedAt, placedAt: holds.placedAt })
      .from(holds)
      .where(and(eq(holds.id, r.holdId), eq(holds.trailerId, r.trailerId)))
      .for('update');
    if (!hold) return { ok: false as const, error: 'not_found' as const };
    if (hold.releasedAt) return { ok: false as const, error: 'already_released' as const };
    if (r.repairedAt.getTime() > now.getTime() + 60_000)
      return { ok: false as const, error: 'repair_in_future' as const };
    if (r.repairedAt.getTime() < hold.placedAt.getTime())
      return { ok: false as const, error: 'repair_before_hold' as const };
    await tx
      .update(holds)
      .set({
        releasedAt: r.repairedAt,
        releasedById: r.releasedById,
        repairedBy: r.repairedBy,
        repairNote: r.repairNote,
      })
      .where(and(eq(holds.id, r.holdId), isNull(holds.releasedAt)));
    await recordAudit(
      {
        actorId: r.releasedById,
        action: 'hold_released',
        entityType: 'hold',
        entityId: r.holdId,
        detail: {
          repairedBy: r.repairedBy,
          repairedAt: r.repairedAt.toISOString(),
          recordedAt: now.toISOString(),
        },
      },
      tx,
    );
    return { ok: true as const };
  });
}
