// Where a drop parks: the slot the driver or clerk chose, or the first free slot of the terminal.
// No `server-only` marker: the seed runs the submit service under plain Node.
import { and, asc, eq, isNull } from 'drizzle-orm';
import type { Tx } from '@/db';
import { trailers, yardRows, yardSpots } from '@/db/schema';
import { HandoffError } from '@/lib/handoff-errors';

async function firstFreeSlot(tx: Tx, terminalId: string): Promise<string | null> {
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

/** The chosen slot, checked free and in this terminal, or the first free one (row order, then slot order). */
export async function chooseSpot(
  tx: Tx,
  terminalId: string,
  wanted: string | null | undefined,
): Promise<string> {
  if (!wanted) {
    const free = await firstFreeSlot(tx, terminalId);
    if (!free) throw new HandoffError('conflict', 'The yard has no free slot. Ask the clerk where to drop.');
    return free;
  }
  const [spot] = await tx
    .select({ id: yardSpots.id, taken: trailers.id })
    .from(yardSpots)
    .leftJoin(trailers, eq(trailers.currentSpotId, yardSpots.id))
    .where(and(eq(yardSpots.id, wanted), eq(yardSpots.terminalId, terminalId), isNull(yardSpots.retiredAt)));
  if (!spot)
    throw new HandoffError('invalid', 'That slot is not in this yard.', {
      spotId: ['Choose a slot of this yard.'],
    });
  if (spot.taken)
    throw new HandoffError('conflict', 'That slot is taken. Choose another slot.', {
      spotId: ['That slot is taken.'],
    });
  return spot.id;
}
