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
  const rows = await listTimelineRows(trailerId, q, since);
  // a correction stands in for its original at the original's time: if that lies before the
  // window, read the whole history so the correction is placed (corrections are rare)
  const ids = new Set(rows.handoffs.map((h) => h.id));
  const outside = since && rows.handoffs.some((h) => h.correctsHandoffId && !ids.has(h.correctsHandoffId));
  return timelineOf(outside ? await listTimelineRows(trailerId, q, null) : rows);
}
