import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { previousLocalDay } from '@/lib/format/time';
import { anchorDigest, chainHeads, checkAnchor } from '@/lib/handoffs/anchor';
import type { ChainRecord } from '@/lib/handoffs/chain';

describe('anchor digest', () => {
  it('of no heads is the SHA-256 of the empty message', () => {
    // FIPS 180-4 SHA-256 of the empty string (NIST CSRC "Examples with Intermediate Values", SHA-256)
    expect(anchorDigest([])).toBe('e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855');
  });

  it('is one SHA-256 over "<trailer> <handoff> <hash> <count>" lines sorted by trailer, in any input order', () => {
    const a = { trailerId: 'a-trailer', handoffId: 'h1', hash: 'f'.repeat(64), count: 3 };
    const b = { trailerId: 'b-trailer', handoffId: 'h9', hash: '0'.repeat(64), count: 1 };
    const expected = createHash('sha256')
      .update(`a-trailer h1 ${'f'.repeat(64)} 3\nb-trailer h9 ${'0'.repeat(64)} 1\n`)
      .digest('hex');
    expect(anchorDigest([b, a])).toBe(expected);
    expect(anchorDigest([a, b])).toBe(expected);
    expect(anchorDigest([a, { ...b, count: 2 }])).not.toBe(expected);
  });

  it('finds a missing head without throwing', () => {
    const heads = [{ trailerId: 't', handoffId: 'h', hash: 'x', count: 1 }];
    const check = checkAnchor(
      { digest: anchorDigest(heads), heads },
      new Map<string, ChainRecord[]>(),
      'test-chain-key',
    );
    expect(check).toEqual({
      ok: false,
      digestMatches: false,
      problems: [{ trailerId: 't', why: 'head_missing' }],
    });
    expect(chainHeads(new Map([['t', []]]))).toEqual([]);
  });
});

describe("a terminal's previous local day", () => {
  // US daylight saving time: starts the second Sunday of March, ends the first Sunday of November
  // (Energy Policy Act of 2005, 15 U.S.C. 260a); America/Chicago is UTC-6 standard, UTC-5 daylight.
  it('is the day before the local date, across the March and November changes', () => {
    expect(previousLocalDay(new Date('2026-03-08T07:30:00Z'), 'America/Chicago')).toBe('2026-03-07'); // 01:30 CST Mar 8
    expect(previousLocalDay(new Date('2026-03-08T05:30:00Z'), 'America/Chicago')).toBe('2026-03-06'); // 23:30 CST Mar 7
    expect(previousLocalDay(new Date('2026-11-01T05:30:00Z'), 'America/Chicago')).toBe('2026-10-31'); // 00:30 CDT Nov 1
    expect(previousLocalDay(new Date('2026-01-01T06:30:00Z'), 'America/Chicago')).toBe('2025-12-31'); // 00:30 CST Jan 1
    expect(previousLocalDay(new Date('2026-01-01T06:30:00Z'), 'America/Denver')).toBe('2025-12-30'); // 23:30 MST Dec 31
  });
});
