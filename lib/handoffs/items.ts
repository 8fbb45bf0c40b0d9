// Submitted observations → what the engine reads and what handoff_items stores. Pure.
import {
  OBSERVATION_FIELDS,
  type Checklist,
  type ItemObservation,
  type ItemObservations,
} from '@/lib/engine';
import type { ItemObservationInput } from '@/lib/validation/handoffs';

export type ItemRowInput = {
  itemKey: string;
  condition: Exclude<ItemObservation['condition'], 'not_checked'>;
  treadThirtySeconds: number | null;
  isHoldingAir: boolean | null;
  note: string | null;
  details: Record<string, boolean | string> | null;
};

const DETAIL_FIELDS = [
  'isEngaged',
  'isMounted',
  'isLocking',
  'isInsulationShowing',
  'isLeaking',
  'cleanliness',
] as const;

const REQUIRED: Partial<Record<string, { field: keyof ItemObservation; message: string }[]>> = {
  pin: [{ field: 'isEngaged', message: 'Say whether this pin is engaged.' }],
  spare: [
    { field: 'isMounted', message: 'Say whether the spare is on its wheel.' },
    { field: 'isHoldingAir', message: 'Say whether the spare holds air.' },
  ],
  tire: [
    { field: 'treadThirtySeconds', message: 'Give the tread depth in 32nds of an inch.' },
    { field: 'isHoldingAir', message: 'Say whether the tire holds air.' },
  ],
};

/**
 * Keeps only items of this trailer's checklist and only the fields each item's kind asks for.
 * `not_checked` items are left out (absent means not checked; never ok). Field errors are keyed
 * `items.<itemKey>`.
 */
export function normalizeItems(checklist: Checklist, items: Record<string, ItemObservationInput>) {
  const byKey = new Map(checklist.items.filter((i) => i.kind !== 'reading').map((i) => [i.key, i]));
  const observations: ItemObservations = {};
  const rows: ItemRowInput[] = [];
  const photoIds = new Map<string, string[]>();
  const fieldErrors: Record<string, string[]> = {};
  for (const [key, o] of Object.entries(items)) {
    const item = byKey.get(key);
    if (!item) {
      fieldErrors[`items.${key}`] = ["This item is not on this trailer's checklist."];
      continue;
    }
    if (o.condition === 'not_checked') continue;
    const asked = OBSERVATION_FIELDS[item.kind];
    const kept: ItemObservation = { condition: o.condition };
    for (const f of asked) if (o[f] !== undefined) (kept as unknown as Record<string, unknown>)[f] = o[f];
    if (o.note) kept.note = o.note;
    if (o.condition !== 'missing') {
      const missing = (REQUIRED[item.kind] ?? []).filter((r) => kept[r.field] === undefined);
      if (missing.length) fieldErrors[`items.${key}`] = missing.map((m) => m.message);
    }
    observations[key] = kept;
    const details: Record<string, boolean | string> = {};
    for (const f of DETAIL_FIELDS) if (kept[f] !== undefined) details[f] = kept[f] as boolean | string;
    rows.push({
      itemKey: key,
      condition: o.condition,
      treadThirtySeconds: kept.treadThirtySeconds ?? null,
      isHoldingAir: kept.isHoldingAir ?? null,
      note: kept.note ?? null,
      details: Object.keys(details).length ? details : null,
    });
    if (o.photoIds?.length) photoIds.set(key, [...new Set(o.photoIds)]);
  }
  return { observations, rows, photoIds, fieldErrors };
}

/** New or worse damage needs a note and at least one photo. */
export function damageEvidenceErrors(
  damageKeys: string[],
  rows: ItemRowInput[],
  photoIds: Map<string, string[]>,
) {
  const errors: Record<string, string[]> = {};
  for (const key of damageKeys) {
    const row = rows.find((r) => r.itemKey === key);
    const need: string[] = [];
    if (!photoIds.get(key)?.length) need.push('New or worse damage needs at least one photo.');
    if (!row?.note) need.push('New or worse damage needs a note saying what you see.');
    if (need.length) errors[`items.${key}`] = need;
  }
  return errors;
}
