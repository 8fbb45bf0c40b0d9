// Re-checks a trailer's hash chain from its records as stored now, with the same hash input the
// submit used (canonical.ts) and verifyChain (hash.ts). The one chain check: the trailer file
// and the tests both come here.
import { hashableFromRows, type HandoffHashRow, type HandoffItemHashRow } from './canonical';
import { verifyChain, type ChainCheck } from './hash';

export type ChainRecord = {
  row: HandoffHashRow & { contentHash: string; hashVersion: number };
  items: HandoffItemHashRow[];
  /** Every photo attached to the handoff, with its status. */
  photos: { sha256: string; status: string }[];
};

export type TrailerChain = { check: ChainCheck; brokenAt: Date | null };

export type RecordCheck = 'matches' | 'altered' | 'unkeyed' | 'earlier_broken';

/**
 * Whether one record still is what was receipted: its own link recomputes (`matches`), or its
 * content or link no longer does (`altered`), or it was linked without the key (`unkeyed`), or
 * an earlier record of the trailer breaks the chain before it (`earlier_broken`).
 */
export function checkOneRecord(records: ChainRecord[], handoffId: string, chainKey: string): RecordCheck {
  const upTo = records.findIndex((r) => r.row.id === handoffId);
  if (upTo < 0) return 'altered';
  const { check } = checkTrailerChain(records.slice(0, upTo + 1), chainKey);
  if (check.ok) return 'matches';
  if (check.brokenAt !== handoffId) return 'earlier_broken';
  return check.why === 'unkeyed' ? 'unkeyed' : 'altered';
}

/**
 * The submit hashed the photos it attached, which are all `stored` (it refuses any other), and
 * the receipt shows the stored ones: so only stored photos count. A photo that stops being
 * stored breaks the chain; one attached later without being stored changes nothing.
 */
export const hashedPhotos = (photos: ChainRecord['photos']) =>
  photos.filter((p) => p.status === 'stored').map((p) => p.sha256);

/** Verifies the records, given oldest first (the order the chain was written in), with the chain key. */
export function checkTrailerChain(records: ChainRecord[], chainKey: string): TrailerChain {
  const check = verifyChain(
    records.map(({ row, items, photos }) => ({
      id: row.id,
      storedHash: row.contentHash,
      storedPrevHash: row.prevHash,
      hashVersion: row.hashVersion,
      recomputed: hashableFromRows(row, items, hashedPhotos(photos), row.hashVersion),
    })),
    chainKey,
  );
  const brokenAt = check.ok
    ? null
    : (records.find((r) => r.row.id === check.brokenAt)?.row.occurredAt ?? null);
  return { check, brokenAt };
}
