// The last known condition of each checklist item: what the gate form opens on. Pure.
import type { Checklist, ItemObservation, TimelineEvent } from '@/lib/engine';

export type LastSeen = {
  observation: ItemObservation;
  at: string;
  eventType: 'drop' | 'hook' | 'walk';
  /** "drop by Osterlind Freightways" or "yard walk by Tobias Q."; driver names only for staff. */
  by: string;
};

/** Per item, the latest drop, hook or walk that inspected it (not_checked never counts). Timeline oldest first. */
export function lastKnownCondition(
  checklist: Checklist,
  timeline: readonly TimelineEvent[],
  showDriverNames: boolean,
) {
  const out: Record<string, LastSeen> = {};
  const keys = checklist.items.filter((i) => i.kind !== 'reading').map((i) => i.key);
  for (let i = timeline.length - 1; i >= 0; i--) {
    const e = timeline[i];
    if (e.type === 'move') continue;
    for (const key of keys) {
      if (out[key]) continue;
      const o = e.items[key];
      if (!o || o.condition === 'not_checked') continue;
      const by =
        e.type === 'walk'
          ? `yard walk${showDriverNames && e.jockeyName ? ` by ${e.jockeyName}` : ''}`
          : `${e.type} by ${showDriverNames && e.party.driverName ? `${e.party.driverName}, ` : ''}${e.party.carrierName}`;
      const { photoIds: _p, note: _n, ...observation } = o;
      out[key] = { observation, at: e.at.toISOString(), eventType: e.type, by };
    }
    if (Object.keys(out).length === keys.length) break;
  }
  return out;
}

/** The latest fuel and reefer readings on record, for the form's side-by-side view. */
export function lastReadings(timeline: readonly TimelineEvent[]) {
  for (let i = timeline.length - 1; i >= 0; i--) {
    const e = timeline[i];
    if (e.type === 'drop' || e.type === 'hook') {
      return {
        at: e.at.toISOString(),
        fuelEighths: e.fuelEighths ?? null,
        isUnitOn: e.reefer?.isUnitOn ?? null,
        setpointF: e.reefer?.setpointF ?? null,
      };
    }
  }
  return null;
}
