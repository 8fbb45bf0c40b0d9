// Re-checks a trailer's handoff chain from the stored rows (lib/handoff-hash.ts verifyChain).
import { verifyChain, type ChainCheck, type HashableHandoff } from '@/lib/handoff-hash';

type Cell = string | number | boolean | null;
export type StoredHandoffRow = Record<string, unknown> & { id: string; contentHash: string; prevHash: string | null };
export type StoredItemRow = { itemKey: string; condition: string; treadThirtySeconds: number | null; isHoldingAir: boolean | null; note: string | null };

/** Fields a handoff's hash covers, in Hitchmark's canonical form (instants as ISO strings). */
export const HASHED_HANDOFF_FIELDS = [
  'id', 'trailerId', 'terminalId', 'kind', 'level', 'carrierId', 'driverId', 'driverName', 'tractorNumber', 'recordedById',
  'isLoaded', 'sealNumber', 'fuelEighths', 'isReeferOn', 'setpointTenthsF', 'returnAirTenthsF', 'engineHoursTenths',
  'pretripResult', 'pretripAt', 'note', 'occurredAt', 'correctsHandoffId', 'verificationCode',
] as const;

const cell = (v: unknown): Cell => (v instanceof Date ? v.toISOString() : v === undefined ? null : (v as Cell));

/** Rebuilds the hashable form of one stored handoff from its row, item rows and photo hashes. */
export function hashableFromRows(row: Record<string, unknown>, items: StoredItemRow[], photoSha256s: string[], prevHash: string | null): HashableHandoff {
  const content = Object.fromEntries(HASHED_HANDOFF_FIELDS.map((k) => [k, cell(row[k])]));
  return {
    content,
    items: items.map((i) => ({ itemKey: i.itemKey, condition: i.condition, treadThirtySeconds: i.treadThirtySeconds, isHoldingAir: i.isHoldingAir, note: i.note })),
    photoSha256s,
    prevHash,
  };
}

export type Rebuild = (row: StoredHandoffRow, items: StoredItemRow[], photoSha256s: string[]) => HashableHandoff;

/** Verifies a trailer's handoffs, oldest first; `rebuild` gives each row's hashable form. */
export function checkTrailerChain(
  rows: { row: StoredHandoffRow; items: StoredItemRow[]; photoSha256s: string[] }[],
  rebuild: Rebuild = (row, items, photoSha256s) => hashableFromRows(row, items, photoSha256s, row.prevHash),
): ChainCheck {
  return verifyChain(rows.map(({ row, items, photoSha256s }) => ({ id: row.id, storedHash: row.contentHash, storedPrevHash: row.prevHash, recomputed: rebuild(row, items, photoSha256s) })));
}
