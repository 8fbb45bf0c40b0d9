import 'server-only';
import type { Db, Tx } from '@/db';
import { listTimelineRows } from '@/db/queries/timeline';
import type { TimelineEvent } from '@/lib/engine';
import { timelineOf } from '@/lib/handoffs/timeline';

/** A trailer's timeline for the engine, oldest first. Pass `tx` inside a transaction. */
export async function loadTimeline(trailerId: string, q?: Db | Tx): Promise<TimelineEvent[]> {
  return timelineOf(await listTimelineRows(trailerId, q));
}
