import { describe, expect, it } from 'vitest';
import { hashableFromRows, type HandoffHashRow } from '@/lib/handoffs/canonical';
import { checkOneRecord, checkTrailerChain, type ChainRecord } from '@/lib/handoffs/chain';
import {
  handoffContentHash,
  KEYED_HASH_VERSION,
  PERISHABLE_HASH_VERSION,
  sha256Hex,
  WRITTEN_HASH_VERSION,
} from '@/lib/handoffs/hash';

// Two stored handoffs hashed the way the submit does; the photo's bytes are the FIPS 180-2
// example message "abc", whose SHA-256 is ba7816bf… (NIST FIPS 180-2, Appendix B.1).
const PHOTO = sha256Hex('abc');
const KEY = 'a-test-chain-key-of-at-least-32-characters';

const row = (id: string, at: string, prevHash: string | null): HandoffHashRow => ({
  id,
  trailerId: 't-1',
  terminalId: 'term-1',
  kind: 'drop',
  level: 'full',
  carrierId: 'c-1',
  driverId: null,
  driverName: 'Test Driver',
  tractorNumber: 'TR-1',
  recordedById: 'u-1',
  isLoaded: false,
  sealNumber: null,
  fuelEighths: 8,
  isReeferOn: null,
  setpointTenthsF: null,
  returnAirTenthsF: null,
  engineHoursTenths: null,
  pretripResult: null,
  pretripAt: null,
  note: null,
  occurredAt: new Date(at),
  correctsHandoffId: null,
  verificationCode: `CODE${id}`,
  prevHash,
});
const items = [
  {
    itemKey: 'left_side.skin',
    condition: 'damaged',
    treadThirtySeconds: null,
    isHoldingAir: null,
    note: 'Torn',
  },
];

/**
 * A chain whose first record was submitted with one stored photo; the second is a hook whose
 * driver answered "perishable: yes". Each record is hashed with the version given.
 */
function stored(firstVersion = KEYED_HASH_VERSION, secondVersion = KEYED_HASH_VERSION): ChainRecord[] {
  const first = row('h1', '2026-11-02T15:00:00Z', null);
  const firstHash = handoffContentHash(hashableFromRows(first, items, [PHOTO], firstVersion), KEY);
  const second = { ...row('h2', '2026-11-03T09:00:00Z', firstHash), kind: 'hook', isLoadPerishable: true };
  const secondHash = handoffContentHash(hashableFromRows(second, [], [], secondVersion), KEY);
  return [
    {
      row: { ...first, contentHash: firstHash, hashVersion: firstVersion },
      items,
      photos: [{ sha256: PHOTO, status: 'stored' }],
    },
    { row: { ...second, contentHash: secondHash, hashVersion: secondVersion }, items: [], photos: [] },
  ];
}

describe('the one chain check', () => {
  it('verifies the records as the submit hashed them', () => {
    expect(checkTrailerChain(stored(), KEY)).toEqual({ check: { ok: true, count: 2 }, brokenAt: null });
  });

  it('counts stored photos only: a photo no longer stored breaks the chain at its record', () => {
    const records = stored();
    records[0].photos = [{ sha256: PHOTO, status: 'rejected' }];
    expect(checkTrailerChain(records, KEY)).toEqual({
      check: { ok: false, brokenAt: 'h1', why: 'content_changed' },
      brokenAt: new Date('2026-11-02T15:00:00Z'),
    });
  });

  it('a photo attached later without being stored changes nothing; a stored one does', () => {
    const pending = stored();
    pending[1].photos = [{ sha256: sha256Hex('later'), status: 'pending' }];
    expect(checkTrailerChain(pending, KEY).check.ok).toBe(true);
    const added = stored();
    added[1].photos = [{ sha256: sha256Hex('later'), status: 'stored' }];
    expect(checkTrailerChain(added, KEY)).toEqual({
      check: { ok: false, brokenAt: 'h2', why: 'content_changed' },
      brokenAt: new Date('2026-11-03T09:00:00Z'),
    });
  });

  it('one record: matches, altered, or unproven because an earlier record broke the chain', () => {
    expect(checkOneRecord(stored(), 'h1', KEY)).toBe('matches');
    expect(checkOneRecord(stored(), 'h2', KEY)).toBe('matches');
    const edited = stored();
    edited[1].row = { ...edited[1].row, fuelEighths: 2 };
    expect(checkOneRecord(edited, 'h2', KEY)).toBe('altered');
    expect(checkOneRecord(edited, 'h1', KEY)).toBe('matches');
    const earlier = stored();
    earlier[0].row = { ...earlier[0].row, driverName: 'Someone Else' };
    expect(checkOneRecord(earlier, 'h2', KEY)).toBe('earlier_broken');
    expect(checkOneRecord(stored(), 'h9', KEY)).toBe('altered');
  });

  it('the submit writes version 3, which hashes the perishable answer; version 2 records keep verifying with theirs', () => {
    expect(WRITTEN_HASH_VERSION).toBe(PERISHABLE_HASH_VERSION);
    // an older version-2 record followed by a new version-3 one: both verify
    expect(checkTrailerChain(stored(KEYED_HASH_VERSION, PERISHABLE_HASH_VERSION), KEY).check).toEqual({
      ok: true,
      count: 2,
    });
    // version 3: flipping the answer (or clearing it) breaks the record
    for (const answer of [false, null]) {
      const flipped = stored(KEYED_HASH_VERSION, PERISHABLE_HASH_VERSION);
      flipped[1].row = { ...flipped[1].row, isLoadPerishable: answer };
      expect(checkOneRecord(flipped, 'h2', KEY)).toBe('altered');
    }
    // version 2 never covered the answer: its records verify whatever the column holds (the hole this closes)
    const old = stored(KEYED_HASH_VERSION, KEYED_HASH_VERSION);
    old[1].row = { ...old[1].row, isLoadPerishable: false };
    expect(checkOneRecord(old, 'h2', KEY)).toBe('matches');
  });

  it('relabelling a version-3 record as version 2 (to drop the answer from the hash) is detected', () => {
    const relabelled = stored(KEYED_HASH_VERSION, PERISHABLE_HASH_VERSION);
    relabelled[1].row = { ...relabelled[1].row, hashVersion: KEYED_HASH_VERSION, isLoadPerishable: false };
    expect(checkTrailerChain(relabelled, KEY).check).toEqual({
      ok: false,
      brokenAt: 'h2',
      why: 'content_changed',
    });
    // even with the answer left as it was: the version-3 content holds the field, version 2 does not
    const same = stored(KEYED_HASH_VERSION, PERISHABLE_HASH_VERSION);
    same[1].row = { ...same[1].row, hashVersion: KEYED_HASH_VERSION };
    expect(checkOneRecord(same, 'h2', KEY)).toBe('altered');
  });
});
