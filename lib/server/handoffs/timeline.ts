import 'server-only';
import type { Db, Tx } from '@/db';
import { conditionWindowStart, listTimelineRows } from '@/db/queries/timeline';
import type { TimelineEvent } from '@/lib/engine';
import { timelineOf } from '@/lib/handoffs/timeline';

/**
 * A trailer's timeline for the engine, oldest first, from the oldest of its current item
 * observations on (trailer_condition): every item's last inspection and everything since, which is
 * all the comparison and the attribution use, however long the trailer's history. Pass `tx`
 * inside a transaction.
 */
export async function loadTimeline(trailerId: string, q?: Db | Tx): Promise<TimelineEvent[]> {
  const since = await conditionWindowStart(trailerId, q);
  return timelineOf(await listTimelineRows(trailerId, q, since));
}
