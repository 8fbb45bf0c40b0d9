import 'server-only';
import { and, eq, isNull, lte, or, sql } from 'drizzle-orm';
import type { Tx } from '@/db';
import { trailers, walkScans, yardSpots } from '@/db/schema';

/** The stored scan with this client key (of any walk), or null. */
export async function findScanByClientKey(tx: Tx, clientKey: string) {
  const [scan] = await tx
    .select({ walkId: walkScans.walkId, seq: walkScans.seq, trailerId: walkScans.trailerId })
    .from(walkScans)
    .where(eq(walkScans.clientKey, clientKey));
  return scan ?? null;
}

export async function trailerBasics(tx: Tx, trailerId: string) {
  const [trailer] = await tx
    .select({ unitNumber: trailers.unitNumber, kind: trailers.kind })
    .from(trailers)
    .where(eq(trailers.id, trailerId));
  return trailer ?? null;
}

export async function isLiveSpotOf(tx: Tx, terminalId: string, spotId: string): Promise<boolean> {
  const [spot] = await tx
    .select({ id: yardSpots.id })
    .from(yardSpots)
    .where(and(eq(yardSpots.id, spotId), eq(yardSpots.terminalId, terminalId), isNull(yardSpots.retiredAt)));
  return spot !== undefined;
}

/** The sequence number the next scan of this walk takes (the caller holds the walk's row lock). */
export async function nextScanSeq(tx: Tx, walkId: string): Promise<number> {
  const [max] = await tx
    .select({ n: sql<number>`coalesce(max(${walkScans.seq}), 0)::int` })
    .from(walkScans)
    .where(eq(walkScans.walkId, walkId));
  return max.n + 1;
}

export async function insertWalkScan(tx: Tx, scan: typeof walkScans.$inferInsert) {
  await tx.insert(walkScans).values(scan);
}

/**
 * Marks the trailer seen at `seenAt` with the given readings, unless a later sighting is already
 * stored (scans sent late from an offline phone must not overwrite newer ones).
 */
export async function recordSighting(
  tx: Tx,
  trailerId: string,
  seenAt: Date,
  readings: Partial<Pick<typeof trailers.$inferInsert, 'fuelEighths' | 'isReeferOn' | 'setpointTenthsF'>>,
) {
  await tx
    .update(trailers)
    .set({ lastSeenAt: seenAt, ...readings })
    .where(
      and(eq(trailers.id, trailerId), or(isNull(trailers.lastSeenAt), lte(trailers.lastSeenAt, seenAt))),
    );
}
