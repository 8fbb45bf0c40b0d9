// Re-checks a trailer's handoff chain from the rows as stored now, with the same hash input the
// submit service used (lib/handoff-canonical.ts) and lib/handoff-hash.ts verifyChain.
import { hashableFromRows, type HandoffHashRow, type HandoffItemHashRow } from '@/lib/handoffs/canonical';
import { verifyChain, type ChainCheck } from '@/lib/handoffs/hash';

export type StoredHandoff = {
  row: HandoffHashRow & { contentHash: string };
  items: HandoffItemHashRow[];
  photoSha256s: string[];
};

/** Verifies a trailer's handoffs, given oldest first (the order the chain was written in). */
export function checkTrailerChain(handoffs: StoredHandoff[]): ChainCheck {
  return verifyChain(
    handoffs.map(({ row, items, photoSha256s }) => ({
      id: row.id,
      storedHash: row.contentHash,
      storedPrevHash: row.prevHash,
      recomputed: hashableFromRows(row, items, photoSha256s),
    })),
  );
}
