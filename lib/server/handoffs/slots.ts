// Where a drop parks: the slot the driver or clerk chose, or the first free slot of the terminal.
import 'server-only';
import type { Tx } from '@/db';
import { firstFreeSlot, getOpenSpot } from '@/db/queries/drop-slots';
import { done, refuse, type Result } from '@/lib/result';

/** The chosen slot, checked free and in this terminal, or the first free one (row order, then slot order). */
export async function chooseSpot(
  tx: Tx,
  terminalId: string,
  wanted: string | null | undefined,
): Promise<Result<string>> {
  if (!wanted) {
    const free = await firstFreeSlot(tx, terminalId);
    return free ? done(free) : refuse('conflict', 'The yard has no free slot. Ask the clerk where to drop.');
  }
  const spot = await getOpenSpot(tx, wanted, terminalId);
  if (!spot)
    return refuse('invalid', 'That slot is not in this yard.', { spotId: ['Choose a slot of this yard.'] });
  if (spot.takenBy)
    return refuse('conflict', 'That slot is taken. Choose another slot.', {
      spotId: ['That slot is taken.'],
    });
  return done(spot.id);
}
