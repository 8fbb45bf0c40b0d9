import 'server-only';
import { and, asc, eq, isNull, notInArray, sql } from 'drizzle-orm';
import type { Tx } from '@/db';
import { trailers, yardRows, yardSpots } from '@/db/schema';

/**
 * Takes the terminal's drop-slot lock until the transaction ends, so concurrent drops at one
 * terminal choose their slots one after another (a transaction-level advisory lock; PostgreSQL
 * manual, "Advisory Locks").
 */
export async function lockDropSlots(tx: Tx, terminalId: string) {
  await tx.execute(
    sql`select pg_advisory_xact_lock(hashtextextended(${`hitchmark.drop-slots.${terminalId}`}, 0))`,
  );
}

/**
 * The terminal's first free slot in row order, then slot order, row-locked; null when the yard is
 * full. Slots another transaction holds (a yard move into them) are skipped, not waited for.
 */
export async function firstFreeSlot(tx: Tx, terminalId: string, skip: string[] = []): Promise<string | null> {
  const [row] = await tx
    .select({ id: yardSpots.id })
    .from(yardSpots)
    .leftJoin(yardRows, eq(yardRows.id, yardSpots.rowId))
    .leftJoin(trailers, eq(trailers.currentSpotId, yardSpots.id))
    .where(
      and(
        eq(yardSpots.terminalId, terminalId),
        eq(yardSpots.kind, 'slot'),
        isNull(yardSpots.retiredAt),
        isNull(trailers.id),
        skip.length ? notInArray(yardSpots.id, skip) : undefined,
      ),
    )
    .orderBy(asc(yardRows.sortOrder), asc(yardSpots.sortOrder))
    .limit(1)
    .for('update', { of: yardSpots, skipLocked: true });
  return row?.id ?? null;
}

/** A spot of this terminal that is not retired, row-locked; null otherwise. */
export async function getOpenSpot(tx: Tx, spotId: string, terminalId: string) {
  const [spot] = await tx
    .select({ id: yardSpots.id })
    .from(yardSpots)
    .where(and(eq(yardSpots.id, spotId), eq(yardSpots.terminalId, terminalId), isNull(yardSpots.retiredAt)))
    .for('update');
  return spot ?? null;
}

/** The trailer standing on a spot now (a fresh read after the spot's lock is held), or null. */
export async function spotOccupant(tx: Tx, spotId: string): Promise<string | null> {
  const [row] = await tx.select({ id: trailers.id }).from(trailers).where(eq(trailers.currentSpotId, spotId));
  return row?.id ?? null;
}
