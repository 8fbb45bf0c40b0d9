import 'server-only';
import { getTrailerForGate } from '@/db/queries/trailers';
import type { Role } from '@/lib/auth/roles';
import { lastKnownCondition, lastReadings } from '@/lib/handoffs/last-condition';
import { localizeChecklist } from '@/lib/i18n/checklist';
import { checklistOf } from '@/lib/trailers/checklist';
import { loadTimeline } from './timeline';

/**
 * A trailer, its checklist (zone and item labels in `locale`, the reader's language) and the last
 * known condition per item; null for an unknown trailer.
 */
export async function getTrailerCondition(trailerId: string, role: Role, locale: string = 'en') {
  const trailer = await getTrailerForGate(trailerId);
  if (!trailer) return null;
  const checklist = checklistOf(trailer);
  const timeline = await loadTimeline(trailerId);
  return {
    trailer,
    checklist: localizeChecklist({ spec: checklist.spec, zones: checklist.zones }, locale),
    last: lastKnownCondition(checklist, timeline, role !== 'driver'),
    lastReadings: lastReadings(timeline),
  };
}
export type TrailerCondition = NonNullable<Awaited<ReturnType<typeof getTrailerCondition>>>;
