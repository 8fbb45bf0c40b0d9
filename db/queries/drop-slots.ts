import 'server-only';
import { and, asc, eq, isNull } from 'drizzle-orm';
import type { Tx } from '@/db';
import { trailers, yardRows, yardSpots } from '@/db/schema';

/** The terminal's first free slot in row order, then slot order; null when the yard is full. */
export async function firstFreeSlot(tx: Tx, terminalId: string): Promise<string | null> {
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
      ),
    )
    .orderBy(asc(yardRows.sortOrder), asc(yardSpots.sortOrder))
    .limit(1);
  return row?.id ?? null;
}

/** A spot of this terminal that is not retired, with the trailer standing on it (if any); null otherwise. */
export async function getOpenSpot(tx: Tx, spotId: string, terminalId: string) {
  const [spot] = await tx
    .select({ id: yardSpots.id, takenBy: trailers.id })
    .from(yardSpots)
    .leftJoin(trailers, eq(trailers.currentSpotId, yardSpots.id))
    .where(and(eq(yardSpots.id, spotId), eq(yardSpots.terminalId, terminalId), isNull(yardSpots.retiredAt)));
  return spot ?? null;
}
