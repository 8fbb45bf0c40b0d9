import type {
  BoardSlot,
  ReconcileResult,
  SlotResult,
  SlotWalkStatus,
  TrailerResult,
  TrailerWalkStatus,
  WalkScan,
} from './types';

export interface ReconcileInput {
  /** The whole yard board: expected trailer per slot. */
  board: readonly BoardSlot[];
  /** Rows the walk covered; only their slots can be found missing or empty. */
  rowIds: readonly string[];
  /** Scans in the order they were made. */
  scans: readonly WalkScan[];
}

const SLOT_STATUSES: SlotWalkStatus[] = ['matched', 'empty', 'missing', 'wrong_trailer', 'unexpected'];
const TRAILER_STATUSES: TrailerWalkStatus[] = ['matched', 'wrong_slot', 'missing', 'unknown', 'duplicate'];

function zeroCounts<K extends string>(keys: K[]): Record<K, number> {
  return Object.fromEntries(keys.map((k) => [k, 0])) as Record<K, number>;
}

interface Seen {
  key: string;
  isKnown: boolean;
  slots: string[];
}

/**
 * Reconciles a yard walk with the board. Trailers: `matched` (in its slot), `wrong_slot`
 * (on the board elsewhere, found here), `missing` (expected in a walked row, not scanned),
 * `unknown` (not on the board or an unknown code), `duplicate` (scanned in two or more slots).
 * Slots of walked rows: `matched`, `empty` (expected and found empty), `missing` (its trailer
 * not found in it), `wrong_trailer` (another trailer in it), `unexpected` (expected empty,
 * something found). A repeat scan of the same trailer in the same slot is only counted.
 */
export function reconcileWalk({ board, rowIds, scans }: ReconcileInput): ReconcileResult {
  const rows = new Set(rowIds);
  const slotById = new Map<string, BoardSlot>();
  const expectedSlotOf = new Map<string, string>();
  for (const s of board) {
    slotById.set(s.slotId, s);
    if (s.expectedTrailerId !== null) expectedSlotOf.set(s.expectedTrailerId, s.slotId);
  }

  const foundInSlot = new Map<string, string[]>();
  const seen = new Map<string, Seen>();
  let repeatScans = 0;
  for (const scan of scans) {
    const key = scan.trailerId ?? scan.code;
    let entry = seen.get(key);
    if (!entry) {
      entry = { key, isKnown: scan.trailerId !== null, slots: [] };
      seen.set(key, entry);
    }
    if (entry.slots.includes(scan.slotId)) {
      repeatScans++;
      continue;
    }
    entry.slots.push(scan.slotId);
    const list = foundInSlot.get(scan.slotId);
    if (list) list.push(key);
    else foundInSlot.set(scan.slotId, [key]);
  }

  const trailers: TrailerResult[] = [];
  for (const e of seen.values()) {
    const expected = e.isKnown ? (expectedSlotOf.get(e.key) ?? null) : null;
    const status: TrailerWalkStatus =
      e.slots.length > 1
        ? 'duplicate'
        : expected === null
          ? 'unknown'
          : expected === e.slots[0]
            ? 'matched'
            : 'wrong_slot';
    trailers.push({
      trailerId: e.key,
      isKnownTrailer: e.isKnown,
      status,
      expectedSlotId: expected,
      foundSlotIds: e.slots,
    });
  }

  const slots: SlotResult[] = [];
  for (const s of board) {
    if (!rows.has(s.rowId)) continue;
    const found = foundInSlot.get(s.slotId) ?? [];
    const exp = s.expectedTrailerId;
    let status: SlotWalkStatus;
    if (exp === null) status = found.length === 0 ? 'empty' : 'unexpected';
    else if (found.includes(exp)) status = 'matched';
    else status = found.length === 0 ? 'missing' : 'wrong_trailer';
    slots.push({ slotId: s.slotId, rowId: s.rowId, expectedTrailerId: exp, found, status });
    if (exp !== null && !seen.has(exp)) {
      trailers.push({
        trailerId: exp,
        isKnownTrailer: true,
        status: 'missing',
        expectedSlotId: s.slotId,
        foundSlotIds: [],
      });
    }
  }
  // Scans in slots outside the walked rows or off the board still show up.
  for (const [slotId, found] of foundInSlot) {
    const s = slotById.get(slotId);
    if (s && rows.has(s.rowId)) continue;
    const exp = s?.expectedTrailerId ?? null;
    const status: SlotWalkStatus =
      exp === null ? 'unexpected' : found.includes(exp) ? 'matched' : 'wrong_trailer';
    slots.push({ slotId, rowId: s?.rowId ?? null, expectedTrailerId: exp, found, status });
  }

  const slotCounts = zeroCounts(SLOT_STATUSES);
  for (const s of slots) slotCounts[s.status]++;
  const trailerCounts = zeroCounts(TRAILER_STATUSES);
  for (const t of trailers) trailerCounts[t.status]++;
  return {
    slots,
    trailers,
    summary: { slots: slotCounts, trailers: trailerCounts, scans: scans.length, repeatScans },
  };
}
