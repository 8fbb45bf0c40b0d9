import 'server-only';
import { listTimeline } from '@/db/queries/timeline';
import { getTrailerForGate } from '@/db/queries/trailers';
import { buildChecklist } from '@/lib/engine';
import { lastKnownCondition, lastReadings } from '@/lib/handoffs/last-condition';
import type { Role } from '@/lib/auth/roles';

/** A trailer, its checklist and the last known condition per item; null for an unknown trailer. */
export async function getTrailerCondition(trailerId: string, role: Role) {
  const trailer = await getTrailerForGate(trailerId);
  if (!trailer) return null;
  const checklist = buildChecklist({
    kind: trailer.kind,
    hingesPerDoor: trailer.hingesPerDoor === 5 ? 5 : 4,
    axles: trailer.axleCount,
    tireLayout: trailer.tireLayout,
    fuelTankGallons: trailer.fuelTankGallons || undefined,
  });
  const timeline = await listTimeline(trailerId);
  return {
    trailer,
    checklist: { spec: checklist.spec, zones: checklist.zones },
    last: lastKnownCondition(checklist, timeline, role !== 'driver'),
    lastReadings: lastReadings(timeline),
  };
}
export type TrailerCondition = NonNullable<Awaited<ReturnType<typeof getTrailerCondition>>>;
