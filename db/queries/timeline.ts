import 'server-only';
import { asc, eq, inArray } from 'drizzle-orm';
import { db, type Db, type Tx } from '@/db';
import { carriers, handoffItems, handoffs, users, walkScans, yardMoves, yardWalks } from '@/db/schema';
import type { TimelineRows } from '@/lib/handoffs/timeline';

/**
 * The stored records of a trailer's timeline (lib/handoffs/timeline.ts turns them into events):
 * its handoffs oldest first with their carrier's name and items, its yard moves and its walk
 * scans. Pass `tx` inside a transaction.
 */
export async function listTimelineRows(trailerId: string, q: Db | Tx = db): Promise<TimelineRows> {
  // sequential: inside a transaction all queries share one connection
  const stored = await q
    .select({ h: handoffs, carrierName: carriers.name })
    .from(handoffs)
    .innerJoin(carriers, eq(carriers.id, handoffs.carrierId))
    .where(eq(handoffs.trailerId, trailerId))
    .orderBy(asc(handoffs.occurredAt), asc(handoffs.createdAt));
  const moves = await q
    .select({
      id: yardMoves.id,
      at: yardMoves.movedAt,
      from: yardMoves.fromSpotId,
      to: yardMoves.toSpotId,
      jockeyName: users.name,
    })
    .from(yardMoves)
    .innerJoin(users, eq(users.id, yardMoves.movedById))
    .where(eq(yardMoves.trailerId, trailerId));
  const scans = await q
    .select({
      id: walkScans.id,
      scannedAt: walkScans.scannedAt,
      fuelEighths: walkScans.fuelEighths,
      isUnitRunning: walkScans.isUnitRunning,
      setpointTenthsF: walkScans.setpointTenthsF,
      jockeyName: users.name,
    })
    .from(walkScans)
    .innerJoin(yardWalks, eq(yardWalks.id, walkScans.walkId))
    .innerJoin(users, eq(users.id, yardWalks.startedById))
    .where(eq(walkScans.trailerId, trailerId));
  const ids = stored.map((r) => r.h.id);
  const items = ids.length
    ? await q.select().from(handoffItems).where(inArray(handoffItems.handoffId, ids))
    : [];
  return {
    handoffs: stored.map((r) => ({ ...r.h, carrierName: r.carrierName })),
    items,
    moves,
    scans,
  };
}
