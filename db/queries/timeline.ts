import 'server-only';
import { and, asc, eq, gte, inArray, min } from 'drizzle-orm';
import { db, type Db, type Tx } from '@/db';
import {
  carriers,
  handoffItems,
  handoffs,
  trailerCondition,
  users,
  walkScans,
  yardMoves,
  yardWalks,
} from '@/db/schema';
import type { TimelineRows } from '@/lib/handoffs/timeline';

/**
 * When the oldest of the trailer's current item observations was made (trailer_condition): the
 * engine needs nothing older to know each item's last condition and who held the trailer since.
 * Null when nothing is recorded yet.
 */
export async function conditionWindowStart(trailerId: string, q: Db | Tx = db): Promise<Date | null> {
  const [row] = await q
    .select({ since: min(trailerCondition.observedAt) })
    .from(trailerCondition)
    .where(eq(trailerCondition.trailerId, trailerId));
  return row?.since ?? null;
}

/**
 * The stored records of a trailer's timeline (lib/handoffs/timeline.ts turns them into events):
 * its handoffs oldest first with their carrier's name and items, its yard moves and its walk
 * scans, from `since` on when given (else all). Pass `tx` inside a transaction.
 */
export async function listTimelineRows(
  trailerId: string,
  q: Db | Tx = db,
  since: Date | null = null,
): Promise<TimelineRows> {
  // sequential: inside a transaction all queries share one connection
  const stored = await q
    .select({ h: handoffs, carrierName: carriers.name })
    .from(handoffs)
    .innerJoin(carriers, eq(carriers.id, handoffs.carrierId))
    .where(and(eq(handoffs.trailerId, trailerId), since ? gte(handoffs.occurredAt, since) : undefined))
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
    .where(and(eq(yardMoves.trailerId, trailerId), since ? gte(yardMoves.movedAt, since) : undefined));
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
    .where(and(eq(walkScans.trailerId, trailerId), since ? gte(walkScans.scannedAt, since) : undefined));
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
