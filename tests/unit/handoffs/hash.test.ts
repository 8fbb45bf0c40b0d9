import { describe, expect, it } from 'vitest';
import {
  canonicalJson,
  handoffContentHash,
  hmacSha256Hex,
  sha256Hex,
  unkeyedContentHash,
  verifyChain,
  type ChainLink,
  type HashableHandoff,
} from '@/lib/handoffs/hash';

const base = (prevHash: string | null, fuel = 8): HashableHandoff => ({
  content: { kind: 'drop', trailerId: 't-1', fuelEighths: fuel, occurredAt: '2026-11-03T14:05:00.000Z' },
  items: [
    {
      itemKey: 'rear.door_left.hinge_3',
      condition: 'ok',
      treadThirtySeconds: null,
      isHoldingAir: null,
      note: null,
    },
    {
      itemKey: 'tires.axle1.left_outer',
      condition: 'ok',
      treadThirtySeconds: 9,
      isHoldingAir: true,
      note: null,
    },
  ],
  photoSha256s: [],
  prevHash,
});

const KEY = 'a-test-chain-key-of-at-least-32-characters';

describe('handoff hash chain', () => {
  it('keys links with real HMAC-SHA-256 (RFC 4231, test case 2)', () => {
    // RFC 4231 section 4.3: key "Jefe", data "what do ya want for nothing?"
    expect(hmacSha256Hex('Jefe', 'what do ya want for nothing?')).toBe(
      '5bdcc146bf60754e6a042426089575c75a003f089d2739839dec58b964ec3843',
    );
    // the link is the HMAC of the canonical JSON, not a plain SHA-256 of it
    const h = base(null);
    expect(handoffContentHash(h, KEY)).not.toBe(unkeyedContentHash(h));
    expect(handoffContentHash(h, KEY)).not.toBe(handoffContentHash(h, `${KEY}-other`));
  });

  it('a chain re-linked without the key does not verify: as keyed links it is altered, as old links unkeyed', () => {
    const first = base(null);
    const second = base(unkeyedContentHash(first), 6);
    // someone with the database but not the key rewrites both links with plain SHA-256
    const rewritten: ChainLink[] = [
      {
        id: 'h1',
        storedHash: unkeyedContentHash(first),
        storedPrevHash: null,
        hashVersion: 2,
        recomputed: first,
      },
      {
        id: 'h2',
        storedHash: unkeyedContentHash(second),
        storedPrevHash: unkeyedContentHash(first),
        hashVersion: 2,
        recomputed: second,
      },
    ];
    expect(verifyChain(rewritten, KEY)).toEqual({ ok: false, brokenAt: 'h1', why: 'content_changed' });
    // ... and marks them as links from before the key: still not vouched for
    const downgraded = rewritten.map((l) => ({ ...l, hashVersion: 1 }));
    expect(verifyChain(downgraded, KEY)).toEqual({ ok: false, brokenAt: 'h1', why: 'unkeyed' });
    // the right key verifies the same content linked properly
    const k1 = handoffContentHash(first, KEY);
    const second2 = base(k1, 6);
    const good: ChainLink[] = [
      { id: 'h1', storedHash: k1, storedPrevHash: null, hashVersion: 2, recomputed: first },
      {
        id: 'h2',
        storedHash: handoffContentHash(second2, KEY),
        storedPrevHash: k1,
        hashVersion: 2,
        recomputed: second2,
      },
    ];
    expect(verifyChain(good, KEY)).toEqual({ ok: true, count: 2 });
    expect(verifyChain(good, `${KEY}-other`)).toEqual({ ok: false, brokenAt: 'h1', why: 'content_changed' });
  });

  it('uses real SHA-256 (FIPS 180-2 example: "abc")', () => {
    // NIST FIPS 180-2, Appendix B.1 worked example
    expect(sha256Hex('abc')).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad');
  });

  it('canonical JSON ignores key order but not values', () => {
    expect(canonicalJson({ b: 1, a: [true, null] })).toBe('{"a":[true,null],"b":1}');
    expect(canonicalJson({ a: 1, b: 2 })).toBe(canonicalJson({ b: 2, a: 1 }));
    expect(canonicalJson({ a: 1 })).not.toBe(canonicalJson({ a: 2 }));
  });

  it('item order does not change the hash; an item condition does', () => {
    const h = base(null);
    const reversed = { ...h, items: [...h.items].reverse() };
    expect(handoffContentHash(reversed, KEY)).toBe(handoffContentHash(h, KEY));
    const changed = { ...h, items: [{ ...h.items[0], condition: 'damaged' }, h.items[1]] };
    expect(handoffContentHash(changed, KEY)).not.toBe(handoffContentHash(h, KEY));
  });

  it('verifies a good chain and names the first record changed after the fact', () => {
    const first = base(null);
    const firstHash = handoffContentHash(first, KEY);
    const second = base(firstHash, 6);
    const secondHash = handoffContentHash(second, KEY);
    const chain: ChainLink[] = [
      { id: 'h1', storedHash: firstHash, storedPrevHash: null, hashVersion: 2, recomputed: first },
      { id: 'h2', storedHash: secondHash, storedPrevHash: firstHash, hashVersion: 2, recomputed: second },
    ];
    expect(verifyChain(chain, KEY)).toEqual({ ok: true, count: 2 });

    // someone edits the fuel reading of the first handoff in the database
    const tampered = [{ ...chain[0], recomputed: base(null, 3) }, chain[1]];
    expect(verifyChain(tampered, KEY)).toEqual({ ok: false, brokenAt: 'h1', why: 'content_changed' });

    // someone deletes the first handoff: the second no longer links to anything
    expect(verifyChain([chain[1]], KEY)).toEqual({ ok: false, brokenAt: 'h2', why: 'link_broken' });
  });
});
