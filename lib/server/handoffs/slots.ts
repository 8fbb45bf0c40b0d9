// Where a drop parks: the slot the driver or clerk chose, or the first free slot of the terminal.
// Chosen under locks, so concurrent drops get distinct slots instead of colliding on the
// one-trailer-per-spot index: drops at one terminal take turns (advisory lock), the chosen spot's
// row is locked (as a yard move locks it), and whether it is free is read again after the lock.
import 'server-only';
import type { Tx } from '@/db';
import { firstFreeSlot, getOpenSpot, lockDropSlots, spotOccupant } from '@/db/queries/drop-slots';
import { done, refuse, type Result } from '@/lib/result';

const FULL = 'The yard has no free slot. Ask the clerk where to drop.';

/** The chosen slot, checked free and in this terminal, or the first free one (row order, then slot order). */
export async function chooseSpot(
  tx: Tx,
  terminalId: string,
  wanted: string | null | undefined,
): Promise<Result<string>> {
  await lockDropSlots(tx, terminalId);
  if (!wanted) {
    // a slot that looked free may have been filled by a move that committed meanwhile: try the next
    const filled: string[] = [];
    for (let tries = 0; tries < 20; tries++) {
      const free = await firstFreeSlot(tx, terminalId, filled);
      if (!free) return refuse('conflict', FULL);
      if (!(await spotOccupant(tx, free))) return done(free);
      filled.push(free);
    }
    return refuse('conflict', FULL);
  }
  const spot = await getOpenSpot(tx, wanted, terminalId);
  if (!spot)
    return refuse('invalid', 'That slot is not in this yard.', { spotId: ['Choose a slot of this yard.'] });
  if (await spotOccupant(tx, spot.id))
    return refuse('conflict', 'That slot is taken. Choose another slot.', {
      spotId: ['That slot is taken.'],
    });
  return done(spot.id);
}
