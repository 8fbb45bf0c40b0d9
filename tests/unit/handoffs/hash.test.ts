import { describe, expect, it } from 'vitest';
import {
  canonicalJson,
  handoffContentHash,
  sha256Hex,
  verifyChain,
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

describe('handoff hash chain', () => {
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
    expect(handoffContentHash(reversed)).toBe(handoffContentHash(h));
    const changed = { ...h, items: [{ ...h.items[0], condition: 'damaged' }, h.items[1]] };
    expect(handoffContentHash(changed)).not.toBe(handoffContentHash(h));
  });

  it('verifies a good chain and names the first record changed after the fact', () => {
    const first = base(null);
    const firstHash = handoffContentHash(first);
    const second = base(firstHash, 6);
    const secondHash = handoffContentHash(second);
    const chain = [
      { id: 'h1', storedHash: firstHash, storedPrevHash: null, recomputed: first },
      { id: 'h2', storedHash: secondHash, storedPrevHash: firstHash, recomputed: second },
    ];
    expect(verifyChain(chain)).toEqual({ ok: true, count: 2 });

    // someone edits the fuel reading of the first handoff in the database
    const tampered = [{ ...chain[0], recomputed: base(null, 3) }, chain[1]];
    expect(verifyChain(tampered)).toEqual({ ok: false, brokenAt: 'h1', why: 'content_changed' });

    // someone deletes the first handoff: the second no longer links to anything
    expect(verifyChain([chain[1]])).toEqual({ ok: false, brokenAt: 'h2', why: 'link_broken' });
  });
});
