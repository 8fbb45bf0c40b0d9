// A trailer's stored records as the engine's timeline. Pure: db/queries/timeline.ts reads the
// rows, this turns them into events the comparison and the last-condition view read.
import type { Condition, ItemObservation, ItemObservations, TimelineEvent } from '@/lib/engine';

export type StoredItem = {
  handoffId: string;
  itemKey: string;
  condition: Condition;
  treadThirtySeconds: number | null;
  isHoldingAir: boolean | null;
  note: string | null;
  details: Record<string, boolean | string> | null;
};

export type StoredHandoff = {
  id: string;
  kind: 'drop' | 'hook';
  occurredAt: Date;
  carrierId: string;
  carrierName: string;
  driverId: string | null;
  driverName: string;
  isLoaded: boolean;
  sealNumber: string | null;
  fuelEighths: number | null;
  isReeferOn: boolean | null;
  setpointTenthsF: number | null;
  returnAirTenthsF: number | null;
  engineHoursTenths: number | null;
  pretripResult: 'pass' | 'fail' | 'not_run' | null;
  pretripAt: Date | null;
  correctsHandoffId: string | null;
};

export type TimelineRows = {
  /** Oldest first (occurred, then stored). */
  handoffs: StoredHandoff[];
  items: StoredItem[];
  moves: { id: string; at: Date; from: string | null; to: string | null; jockeyName: string }[];
  scans: {
    id: string;
    scannedAt: Date;
    fuelEighths: number | null;
    isUnitRunning: boolean | null;
    setpointTenthsF: number | null;
    jockeyName: string;
  }[];
};

const tenths = (v: number | null) => (v === null ? null : v / 10);

/** One stored handoff item back into the engine's observation (details carry the kind-specific fields). */
export function observationFromRow(
  row: Pick<StoredItem, 'condition' | 'treadThirtySeconds' | 'isHoldingAir' | 'note' | 'details'>,
): ItemObservation {
  const o: ItemObservation = { condition: row.condition, ...(row.details ?? {}) } as ItemObservation;
  if (row.treadThirtySeconds !== null) o.treadThirtySeconds = row.treadThirtySeconds;
  if (row.isHoldingAir !== null) o.isHoldingAir = row.isHoldingAir;
  if (row.note) o.note = row.note;
  return o;
}

/** A stored handoff (with its items) as the engine's drop/hook event. */
export function handoffEventFromRow(h: StoredHandoff, items: StoredItem[]): TimelineEvent {
  const observed: ItemObservations = {};
  for (const i of items) observed[i.itemKey] = observationFromRow(i);
  return {
    type: h.kind,
    id: h.id,
    at: h.occurredAt,
    party: {
      carrierId: h.carrierId,
      carrierName: h.carrierName,
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
 * The record a correction stands in for, followed back through corrections of corrections; null
 * when the corrected record is not one of this trailer's (such a row counts as a plain record).
 */
export function correctedRoot(h: StoredHandoff, byId: Map<string, StoredHandoff>): StoredHandoff | null {
  let root: StoredHandoff | null = null;
  let at: StoredHandoff | undefined = h;
  for (let hops = 0; at?.correctsHandoffId && hops < 100; hops++) {
    const target = byId.get(at.correctsHandoffId);
    if (!target) break;
    root = target;
    at = target;
  }
  return root;
}

/**
 * The whole timeline, oldest first: handoffs with their items, yard moves and yard-walk scans.
 * A handoff that a later correction of the same trailer replaces is left out: the correction
 * stands in its place, at its time, and says when it was recorded (`correctedAt`).
 * Walk scans carry fuel and unit readings but no item observations (the walk's quick checks
 * are not checklist items).
 */
export function timelineOf(rows: TimelineRows): TimelineEvent[] {
  const itemsBy = new Map<string, StoredItem[]>();
  for (const i of rows.items) itemsBy.set(i.handoffId, [...(itemsBy.get(i.handoffId) ?? []), i]);
  const byId = new Map(rows.handoffs.map((h) => [h.id, h]));
  const corrected = new Set(
    rows.handoffs.filter((h) => correctedRoot(h, byId)).map((h) => h.correctsHandoffId as string),
  );

  const events: TimelineEvent[] = [];
  for (const h of rows.handoffs) {
    if (corrected.has(h.id)) continue;
    const root = correctedRoot(h, byId);
    const event = handoffEventFromRow(
      root ? { ...h, occurredAt: root.occurredAt } : h,
      itemsBy.get(h.id) ?? [],
    );
    events.push(root ? ({ ...event, correctedAt: h.occurredAt } as TimelineEvent) : event);
  }
  for (const m of rows.moves) {
    events.push({
      type: 'move',
      id: m.id,
      at: m.at,
      jockeyName: m.jockeyName,
      fromSlotId: m.from,
      toSlotId: m.to,
    });
  }
  for (const s of rows.scans) {
    events.push({
      type: 'walk',
      id: s.id,
      at: s.scannedAt,
      jockeyName: s.jockeyName,
      items: {},
      fuelEighths: s.fuelEighths,
      reefer: { isUnitOn: s.isUnitRunning, setpointF: tenths(s.setpointTenthsF) },
    });
  }
  // stable: equal times keep handoffs before moves before walks, as pushed
  return events
    .map((e, i) => ({ e, i }))
    .sort((a, b) => a.e.at.getTime() - b.e.at.getTime() || a.i - b.i)
    .map(({ e }) => e);
}
