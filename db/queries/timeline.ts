import { asc, eq, inArray } from 'drizzle-orm';
import { db, type Db, type Tx } from '@/db';
import { carriers, handoffItems, handoffs, users, walkScans, yardMoves, yardWalks } from '@/db/schema';
import type { ItemObservation, ItemObservations, TimelineEvent } from '@/lib/engine';

// No `server-only` marker: the seed runs the submit service (and so this) under plain Node.

type HandoffRow = typeof handoffs.$inferSelect;
type ItemRow = typeof handoffItems.$inferSelect;

/** One stored handoff item back into the engine's observation (details carry the kind-specific fields). */
export function observationFromRow(
  row: Pick<ItemRow, 'condition' | 'treadThirtySeconds' | 'isHoldingAir' | 'note' | 'details'>,
): ItemObservation {
  const o: ItemObservation = { condition: row.condition, ...(row.details ?? {}) } as ItemObservation;
  if (row.treadThirtySeconds !== null) o.treadThirtySeconds = row.treadThirtySeconds;
  if (row.isHoldingAir !== null) o.isHoldingAir = row.isHoldingAir;
  if (row.note) o.note = row.note;
  return o;
}

/** A stored handoff row (with its carrier's name and items) as the engine's drop/hook event. */
export function handoffEventFromRow(h: HandoffRow, carrierName: string, items: ItemRow[]): TimelineEvent {
  const observed: ItemObservations = {};
  for (const i of items) observed[i.itemKey] = observationFromRow(i);
  const tenths = (v: number | null) => (v === null ? null : v / 10);
  return {
    type: h.kind,
    id: h.id,
    at: h.occurredAt,
    party: {
      carrierId: h.carrierId,
      carrierName,
      ...(h.driverId ? { driverId: h.driverId } : {}),
      driverName: h.driverName,
    },
    items: observed,
    fuelEighths: h.fuelEighths,
    reefer: {
      isUnitOn: h.isReeferOn,
      setpointF: tenths(h.setpointTenthsF),
      returnAirF: tenths(h.returnAirTenthsF),
      engineHours: tenths(h.engineHoursTenths),
      preTrip:
        h.pretripAt && (h.pretripResult === 'pass' || h.pretripResult === 'fail')
          ? { result: h.pretripResult === 'pass' ? 'passed' : 'failed', at: h.pretripAt }
          : null,
    },
    isLoaded: h.isLoaded,
    sealNumber: h.sealNumber,
  };
}

/**
 * A trailer's whole timeline for the engine, oldest first: handoffs with their items, yard
 * moves, and yard-walk scans. A handoff that a later correction replaces is left out (the
 * correction stands in its place). Walk scans carry fuel and unit readings but no item
 * observations (the walk's quick checks are not checklist items). Pass `tx` inside a transaction.
 */
export async function listTimeline(trailerId: string, q: Db | Tx = db): Promise<TimelineEvent[]> {
  // sequential: inside a transaction all queries share one connection
  const hRows = await q
    .select({ h: handoffs, carrierName: carriers.name })
    .from(handoffs)
    .innerJoin(carriers, eq(carriers.id, handoffs.carrierId))
    .where(eq(handoffs.trailerId, trailerId))
    .orderBy(asc(handoffs.occurredAt), asc(handoffs.createdAt));
  const moves = await q
    .select({
      id: yardMoves.id,
      at: yardMoves.movedAt,
      from: yardMoves.fromSpotId,
      to: yardMoves.toSpotId,
      jockeyName: users.name,
    })
    .from(yardMoves)
    .innerJoin(users, eq(users.id, yardMoves.movedById))
    .where(eq(yardMoves.trailerId, trailerId));
  const scans = await q
    .select({ s: walkScans, jockeyName: users.name })
    .from(walkScans)
    .innerJoin(yardWalks, eq(yardWalks.id, walkScans.walkId))
    .innerJoin(users, eq(users.id, yardWalks.startedById))
    .where(eq(walkScans.trailerId, trailerId));

  const ids = hRows.map((r) => r.h.id);
  const itemRows = ids.length
    ? await q.select().from(handoffItems).where(inArray(handoffItems.handoffId, ids))
    : [];
  const itemsBy = new Map<string, ItemRow[]>();
  for (const i of itemRows) itemsBy.set(i.handoffId, [...(itemsBy.get(i.handoffId) ?? []), i]);
  const corrected = new Set(hRows.map((r) => r.h.correctsHandoffId).filter((v): v is string => v !== null));

  const events: TimelineEvent[] = [];
  for (const r of hRows) {
    if (corrected.has(r.h.id)) continue;
    events.push(handoffEventFromRow(r.h, r.carrierName, itemsBy.get(r.h.id) ?? []));
  }
  for (const m of moves) {
    events.push({
      type: 'move',
      id: m.id,
      at: m.at,
      jockeyName: m.jockeyName,
      fromSlotId: m.from,
      toSlotId: m.to,
    });
  }
  for (const { s, jockeyName } of scans) {
    events.push({
      type: 'walk',
      id: s.id,
      at: s.scannedAt,
      jockeyName,
      items: {},
      fuelEighths: s.fuelEighths,
      reefer: {
        isUnitOn: s.isUnitRunning,
        setpointF: s.setpointTenthsF === null ? null : s.setpointTenthsF / 10,
      },
    });
  }
  // stable: equal times keep handoffs before moves before walks, as pushed
  return events
    .map((e, i) => ({ e, i }))
    .sort((a, b) => a.e.at.getTime() - b.e.at.getTime() || a.i - b.i)
    .map(({ e }) => e);
}
