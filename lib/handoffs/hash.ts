// The tamper-evident chain of a trailer's handoffs. Each handoff stores
//   contentHash = HMAC-SHA-256( CHAIN_KEY, canonical JSON of { content, items, photoSha256s, prevHash } )
// where prevHash is the contentHash of the trailer's previous handoff (null for the first).
// Changing any stored field, item or photo of an earlier handoff breaks every later link, and
// without the key (it lives outside the database) nobody can compute a link that verifies.
// HMAC as in RFC 2104 / FIPS 198-1, with SHA-256 (FIPS 180-4), from node:crypto.
// Rows with hash_version 1 were linked with plain SHA-256 before the chain was keyed: they are
// recomputed that way, but never vouched for (anyone can compute a plain SHA-256).
import { createHash, createHmac } from 'node:crypto';

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

/** Rows linked before the chain was keyed: plain SHA-256. */
export const UNKEYED_HASH_VERSION = 1;
/** HMAC-SHA-256 with the chain key, before the hook's perishable answer was hashed. */
export const KEYED_HASH_VERSION = 2;
/** HMAC-SHA-256 with the chain key; the content also holds the hook's answer to "is the load perishable?". */
export const PERISHABLE_HASH_VERSION = 3;
/** The hash_version the submit writes now. Older keyed rows keep verifying with their own version. */
export const WRITTEN_HASH_VERSION = PERISHABLE_HASH_VERSION;
/** The versions whose links are keyed, and so can be vouched for. */
export const isKeyedHashVersion = (v: number) => v === KEYED_HASH_VERSION || v === PERISHABLE_HASH_VERSION;

/** The bytes a link covers; items and photo hashes are sorted so their order does not matter. */
function hashInput(h: HashableHandoff): string {
  const items = [...h.items].sort((a, b) => (a.itemKey < b.itemKey ? -1 : 1));
  const photos = [...h.photoSha256s].sort();
  return canonicalJson({ content: h.content, items, photoSha256s: photos, prevHash: h.prevHash });
}

/** The keyed content hash of one handoff (hash_version 2 or 3: the content differs, the HMAC does not). */
export function handoffContentHash(h: HashableHandoff, chainKey: string): string {
  return hmacSha256Hex(chainKey, hashInput(h));
}

/** HMAC-SHA-256 (RFC 2104) as lowercase hex. */
export function hmacSha256Hex(key: string, data: string): string {
  if (!key) throw new Error('the chain key is empty');
  return createHmac('sha256', key).update(data).digest('hex');
}

/** The plain SHA-256 of hash_version 1: only to tell an old unkeyed link from an altered one. */
export function unkeyedContentHash(h: HashableHandoff): string {
  return sha256Hex(hashInput(h));
}

export type ChainLink = {
  id: string;
  storedHash: string;
  storedPrevHash: string | null;
  hashVersion: number;
  recomputed: HashableHandoff;
};
export type ChainBreak = 'content_changed' | 'link_broken' | 'unkeyed';
export type ChainCheck = { ok: true; count: number } | { ok: false; brokenAt: string; why: ChainBreak };

/**
 * Verifies a trailer's chain, oldest first: each stored hash is the keyed hash of its content and
 * points at the one before. A link that only matches the plain, unkeyed hash is `unkeyed`: it may
 * be genuine from before the key, or a rewrite by someone without the key; either way it is not
 * vouched for.
 */
export function verifyChain(links: ChainLink[], chainKey: string): ChainCheck {
  let prev: string | null = null;
  for (const link of links) {
    if (link.storedPrevHash !== prev || link.recomputed.prevHash !== prev)
      return { ok: false, brokenAt: link.id, why: 'link_broken' };
    if (
      !isKeyedHashVersion(link.hashVersion) ||
      handoffContentHash(link.recomputed, chainKey) !== link.storedHash
    ) {
      const isOldLink =
        link.hashVersion === UNKEYED_HASH_VERSION && unkeyedContentHash(link.recomputed) === link.storedHash;
      return { ok: false, brokenAt: link.id, why: isOldLink ? 'unkeyed' : 'content_changed' };
    }
    prev = link.storedHash;
  }
  return { ok: true, count: links.length };
}
