import { describe, expect, it } from 'vitest';
import { labelStanding } from '@/lib/labels/standing';

const issued = new Date('2026-11-02T08:00:00Z');
const revoked = new Date('2026-11-20T15:30:00Z');
const newer = new Date('2026-11-21T09:00:00Z');

describe('whether a scanned label still speaks for its trailer', () => {
  it('the newest unrevoked label is current', () => {
    expect(labelStanding({ id: 'a', revokedAt: null }, { id: 'a', issuedAt: issued })).toEqual({
      isCurrent: true,
    });
  });
  it('a revoked label was replaced when it was revoked, whatever is current now', () => {
    expect(labelStanding({ id: 'a', revokedAt: revoked }, { id: 'b', issuedAt: newer })).toEqual({
      isCurrent: false,
      replacedAt: revoked,
    });
  });
  it('an unrevoked label superseded by a newer one was replaced when the newer one was issued', () => {
    expect(labelStanding({ id: 'a', revokedAt: null }, { id: 'b', issuedAt: newer })).toEqual({
      isCurrent: false,
      replacedAt: newer,
    });
  });
  it('with no current label at all, the date is unknown', () => {
    expect(labelStanding({ id: 'a', revokedAt: null }, null)).toEqual({ isCurrent: false, replacedAt: null });
  });
});
