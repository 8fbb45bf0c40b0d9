import 'server-only';
import { and, asc, eq, gt, isNull, sql } from 'drizzle-orm';
import { db, type Tx } from '@/db';
import { holds, trailers, yardMoves, yardSpots } from '@/db/schema';

/** A trailer with where it stands, row-locked for the caller's transaction. */
export async function lockTrailerPlace(tx: Tx, trailerId: string) {
  const [trailer] = await tx
    .select({
      id: trailers.id,
      unitNumber: trailers.unitNumber,
      status: trailers.status,
      terminalId: trailers.currentTerminalId,
      spotId: trailers.currentSpotId,
    })
    .from(trailers)
    .where(eq(trailers.id, trailerId))
    .for('update');
  return trailer ?? null;
}

/** A slot or door of this terminal (live or retired), row-locked. */
export async function lockSpot(tx: Tx, terminalId: string, spotId: string) {
  const [spot] = await tx
    .select({ id: yardSpots.id, label: yardSpots.label, retiredAt: yardSpots.retiredAt })
    .from(yardSpots)
    .where(and(eq(yardSpots.id, spotId), eq(yardSpots.terminalId, terminalId)))
    .for('update');
  return spot ?? null;
}

/** The trailer standing in a spot, row-locked; null when the spot is free. */
export async function lockOccupant(tx: Tx, spotId: string) {
  const [occupant] = await tx
    .select({ unitNumber: trailers.unitNumber })
    .from(trailers)
    .where(eq(trailers.currentSpotId, spotId))
    .for('update');
  return occupant ?? null;
}

export async function spotLabel(tx: Tx, spotId: string): Promise<string | null> {
  const [spot] = await tx.select({ label: yardSpots.label }).from(yardSpots).where(eq(yardSpots.id, spotId));
  return spot?.label ?? null;
}

/**
 * The trailer's first move made after `at`, if any: a queued move that reaches the server after
 * it is history, and its from-spot is where that later move found the trailer.
 */
export async function firstMoveAfter(tx: Tx, trailerId: string, at: Date) {
  const [row] = await tx
    .select({ fromSpotId: yardMoves.fromSpotId })
    .from(yardMoves)
    .where(and(eq(yardMoves.trailerId, trailerId), gt(yardMoves.movedAt, at)))
    .orderBy(asc(yardMoves.movedAt))
    .limit(1);
  return row ?? null;
}

export async function insertYardMove(tx: Tx, move: typeof yardMoves.$inferInsert): Promise<string> {
  const [row] = await tx.insert(yardMoves).values(move).returning({ id: yardMoves.id });
  return row.id;
}

/** Puts the trailer in the spot and marks it seen there (a later sighting already recorded stays). */
export async function setTrailerSpot(tx: Tx, trailerId: string, spotId: string, seenAt: Date) {
  await tx
    .update(trailers)
    .set({
      currentSpotId: spotId,
      lastSeenAt: sql`greatest(${trailers.lastSeenAt}, ${seenAt.toISOString()}::timestamptz)`,
    })
    .where(eq(trailers.id, trailerId));
}

export async function hasOpenOutOfServiceHold(tx: Tx, trailerId: string): Promise<boolean> {
  const rows = await tx
    .select({ id: holds.id })
    .from(holds)
    .where(
      and(eq(holds.trailerId, trailerId), isNull(holds.releasedAt), eq(holds.severity, 'out_of_service')),
    )
    .limit(1);
  return rows.length > 0;
}

/** A live slot or door of this terminal by its label (case-insensitive), or null. */
export async function findSpotByLabel(terminalId: string, label: string) {
  const rows = await db
    .select({ id: yardSpots.id, label: yardSpots.label })
    .from(yardSpots)
    .where(and(eq(yardSpots.terminalId, terminalId), isNull(yardSpots.retiredAt)));
  const wanted = label.trim().toUpperCase();
  return rows.find((r) => r.label.toUpperCase() === wanted) ?? null;
}

/** A move this person already recorded under the phone's key (a queued move sent again). */
export async function getMoveByClientKey(tx: Tx, movedById: string, clientKey: string) {
  const [row] = await tx
    .select({
      moveId: yardMoves.id,
      trailerId: yardMoves.trailerId,
      unitNumber: trailers.unitNumber,
      fromSpotId: yardMoves.fromSpotId,
      toSpotId: yardMoves.toSpotId,
    })
    .from(yardMoves)
    .innerJoin(trailers, eq(trailers.id, yardMoves.trailerId))
    .where(and(eq(yardMoves.movedById, movedById), eq(yardMoves.clientKey, clientKey)));
  return row ?? null;
}
