// The tamper-evident chain of a trailer's handoffs. Each handoff stores
//   contentHash = SHA-256( canonical JSON of { content, items, photoSha256s, prevHash } )
// where prevHash is the contentHash of the trailer's previous handoff (null for the first).
// Changing any stored field, item or photo of an earlier handoff breaks every later link.
import { createHash } from 'node:crypto';

export type HashableHandoff = {
  content: Record<string, string | number | boolean | null>;
  items: {
    itemKey: string;
    condition: string;
    treadThirtySeconds: number | null;
    isHoldingAir: boolean | null;
    note: string | null;
    /** Other observation fields (pins, spare, hinges, skin, leaks); absent keys leave older hashes unchanged. */
    details?: Record<string, boolean | string> | null;
  }[];
  photoSha256s: string[];
  prevHash: string | null;
};

/** JSON with object keys sorted at every level, so the same data always gives the same bytes. */
export function canonicalJson(value: unknown): string {
  if (value === null || typeof value !== 'object') return JSON.stringify(value ?? null);
  if (value instanceof Date) return JSON.stringify(value.toISOString());
  if (Array.isArray(value)) return `[${value.map(canonicalJson).join(',')}]`;
  const entries = Object.entries(value as Record<string, unknown>)
    .filter(([, v]) => v !== undefined)
    .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
  return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonicalJson(v)}`).join(',')}}`;
}

export function sha256Hex(data: string | Uint8Array): string {
  return createHash('sha256').update(data).digest('hex');
}

/** The content hash of one handoff; items and photo hashes are sorted so their order does not matter. */
export function handoffContentHash(h: HashableHandoff): string {
  const items = [...h.items].sort((a, b) => (a.itemKey < b.itemKey ? -1 : 1));
  const photos = [...h.photoSha256s].sort();
  return sha256Hex(canonicalJson({ content: h.content, items, photoSha256s: photos, prevHash: h.prevHash }));
}

export type ChainLink = {
  id: string;
  storedHash: string;
  storedPrevHash: string | null;
  recomputed: HashableHandoff;
};
export type ChainCheck =
  { ok: true; count: number } | { ok: false; brokenAt: string; why: 'content_changed' | 'link_broken' };

/** Verifies a trailer's chain, oldest first: each stored hash matches its content and points at the one before. */
export function verifyChain(links: ChainLink[]): ChainCheck {
  let prev: string | null = null;
  for (const link of links) {
    if (link.storedPrevHash !== prev || link.recomputed.prevHash !== prev)
      return { ok: false, brokenAt: link.id, why: 'link_broken' };
    if (handoffContentHash(link.recomputed) !== link.storedHash)
      return { ok: false, brokenAt: link.id, why: 'content_changed' };
    prev = link.storedHash;
  }
  return { ok: true, count: links.length };
}
