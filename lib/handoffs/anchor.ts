// The daily anchor of a terminal's handoff chains. Pure.
// A head is the last record of a trailer's chain with its stored hash and the number of records
// leading to it. The digest is one SHA-256 over every head, sorted by trailer, in lines
//   "<trailer id> <handoff id> <stored hash> <record count>\n"
// and is e-mailed to the terminal's managers: a copy the database owner cannot reach. A history
// rewritten later (even with every hash recomputed) no longer leads to the anchored heads.
import type { ChainRecord } from './chain';
import { checkTrailerChain } from './chain';
import { sha256Hex } from './hash';

export type ChainHead = { trailerId: string; handoffId: string; hash: string; count: number };

/** The head of each non-empty chain (records oldest first, as stored). */
export function chainHeads(chains: ReadonlyMap<string, ChainRecord[]>): ChainHead[] {
  const heads: ChainHead[] = [];
  for (const [trailerId, records] of chains) {
    const last = records.at(-1);
    if (last)
      heads.push({ trailerId, handoffId: last.row.id, hash: last.row.contentHash, count: records.length });
  }
  return heads.sort((a, b) => (a.trailerId < b.trailerId ? -1 : a.trailerId > b.trailerId ? 1 : 0));
}

export function anchorDigest(heads: readonly ChainHead[]): string {
  const lines = [...heads]
    .sort((a, b) => (a.trailerId < b.trailerId ? -1 : a.trailerId > b.trailerId ? 1 : 0))
    .map((h) => `${h.trailerId} ${h.handoffId} ${h.hash} ${h.count}\n`);
  return sha256Hex(lines.join(''));
}

export type AnchorProblem = {
  trailerId: string;
  why: 'head_missing' | 'head_changed' | 'count_changed' | 'chain_broken';
};
export type AnchorCheck = { ok: boolean; digestMatches: boolean; problems: AnchorProblem[] };

/**
 * Whether today's chains still lead to the anchored heads: each anchored record is still in its
 * trailer's chain, at the same position, with the same stored hash, and the chain up to it
 * verifies; and the heads as found now give the anchored digest.
 */
export function checkAnchor(
  anchor: { digest: string; heads: readonly ChainHead[] },
  chains: ReadonlyMap<string, ChainRecord[]>,
  chainKey: string,
): AnchorCheck {
  const problems: AnchorProblem[] = [];
  const found: ChainHead[] = [];
  for (const head of anchor.heads) {
    const records = chains.get(head.trailerId) ?? [];
    const at = records.findIndex((r) => r.row.id === head.handoffId);
    if (at < 0) {
      problems.push({ trailerId: head.trailerId, why: 'head_missing' });
      continue;
    }
    const record = records[at];
    found.push({
      trailerId: head.trailerId,
      handoffId: record.row.id,
      hash: record.row.contentHash,
      count: at + 1,
    });
    if (record.row.contentHash !== head.hash)
      problems.push({ trailerId: head.trailerId, why: 'head_changed' });
    else if (at + 1 !== head.count) problems.push({ trailerId: head.trailerId, why: 'count_changed' });
    else if (!checkTrailerChain(records.slice(0, at + 1), chainKey).check.ok)
      problems.push({ trailerId: head.trailerId, why: 'chain_broken' });
  }
  const digestMatches = anchorDigest(found) === anchor.digest;
  return { ok: problems.length === 0 && digestMatches, digestMatches, problems };
}
