// The gate form's draft: what is kept in localStorage, how it becomes the submit body, and the
// immediate (client-side) comparison with the last record. The server's comparison is the authority.
import { classifyChange, type ChecklistItem, type FindingKind } from '@/lib/engine';
import { isChargeableDamage } from './damage';
import type { LastSeen } from './last-condition';
import type { HandoffSubmitInput, ItemObservationInput } from '@/lib/validation/handoffs';

export type DraftPhoto = { id: string };
export type DraftItem = ItemObservationInput & { photos?: DraftPhoto[] };

export type Draft = {
  idempotencyKey: string;
  trailerId: string;
  kind: 'drop' | 'hook';
  carrierId: string;
  driverName: string;
  tractorNumber: string;
  isLoaded: boolean | null;
  sealNumber: string;
  fuelEighths: number | null;
  reefer: {
    isUnitOn: boolean | null;
    setpointF: string;
    returnAirF: string;
    engineHours: string;
    preTripResult: 'pass' | 'fail' | 'not_run' | null;
    preTripAt: string;
  };
  items: Record<string, DraftItem>;
  spotId: string | null;
  note: string;
  /** Asked at a hook of a "no perishable loads" trailer. */
  isLoadPerishable?: boolean | null;
};

export function newDraft(init: {
  idempotencyKey: string;
  trailerId: string;
  kind: 'drop' | 'hook';
  carrierId: string;
  driverName: string;
}): Draft {
  return {
    ...init,
    tractorNumber: '',
    isLoaded: null,
    sealNumber: '',
    fuelEighths: null,
    reefer: {
      isUnitOn: null,
      setpointF: '',
      returnAirF: '',
      engineHours: '',
      preTripResult: null,
      preTripAt: '',
    },
    items: {},
    spotId: null,
    note: '',
  };
}

const num = (s: string) => (s.trim() === '' ? null : Number(s));

/** The submit body (zod-checked again by the caller and by the server). Untouched items are simply absent: not checked. */
export function draftToInput(d: Draft, isReefer: boolean): unknown {
  const items: HandoffSubmitInput['items'] = {};
  for (const [key, it] of Object.entries(d.items)) {
    if (it.condition === 'not_checked') continue;
    const { photos, ...rest } = it;
    items[key] = { ...rest, ...(photos?.length ? { photoIds: photos.map((p) => p.id) } : {}) };
  }
  return {
    idempotencyKey: d.idempotencyKey,
    trailerId: d.trailerId,
    kind: d.kind,
    carrierId: d.carrierId,
    driverName: d.driverName,
    tractorNumber: d.tractorNumber,
    isLoaded: d.isLoaded ?? undefined,
    sealNumber: d.sealNumber,
    fuelEighths: isReefer ? d.fuelEighths : null,
    reefer: isReefer
      ? {
          isUnitOn: d.reefer.isUnitOn,
          setpointF: num(d.reefer.setpointF),
          returnAirF: num(d.reefer.returnAirF),
          engineHours: num(d.reefer.engineHours),
          preTripResult: d.reefer.preTripResult ?? undefined,
          preTripAt: d.reefer.preTripAt ? new Date(d.reefer.preTripAt).toISOString() : null,
        }
      : null,
    items,
    spotId: d.spotId,
    note: d.note,
    isLoadPerishable: d.isLoadPerishable ?? null,
  };
}

/** Immediate feedback: how this item compares with its last record, with the engine's own rule. */
export function itemChange(current: DraftItem | undefined, last: LastSeen | undefined): FindingKind {
  return classifyChange(current?.condition ?? 'not_checked', last?.observation.condition ?? null);
}

/** New or worse damage past cosmetic needs a photo and a note (the server applies the same rule). */
export const needsEvidence = (k: FindingKind, current: DraftItem | undefined) =>
  isChargeableDamage(k, current?.condition);

/**
 * "Same as last": the last observation's condition and kind fields, without its note or photos.
 * Never for a safety item: those are looked at and answered in every handoff (null).
 */
export function sameAsLast(item: ChecklistItem, last: LastSeen | undefined): DraftItem | null {
  if (!last || item.isSafety) return null;
  return { ...last.observation };
}

/** "Same as last" for a whole zone: answers for its unanswered items, safety items left out. */
export function sameAsLastForZone(
  items: readonly ChecklistItem[],
  d: Draft,
  last: Record<string, LastSeen>,
): Record<string, DraftItem> {
  const out: Record<string, DraftItem> = {};
  for (const i of items) {
    if (d.items[i.key]) continue;
    const copy = sameAsLast(i, last[i.key]);
    if (copy) out[i.key] = copy;
  }
  return out;
}

/** Items of a zone still to answer (not yet given a condition). */
export function unanswered(items: ChecklistItem[], d: Draft): number {
  return items.filter((i) => i.kind !== 'reading' && !d.items[i.key]?.condition).length;
}
