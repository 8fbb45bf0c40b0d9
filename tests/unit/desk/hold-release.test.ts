import { describe, expect, it } from 'vitest';
import { repairTimeProblem } from '@/lib/desk/hold-release';

const placedAt = new Date('2026-10-23T09:30:00Z');
const now = new Date('2026-10-25T12:00:00Z');
const at = (ms: number) => new Date(now.getTime() + ms);

describe('when a repair may release a hold', () => {
  it('takes any time from the hold up to a minute past now', () => {
    expect(repairTimeProblem(placedAt, placedAt, now)).toBeNull();
    expect(repairTimeProblem(now, placedAt, now)).toBeNull();
    expect(repairTimeProblem(at(60_000), placedAt, now)).toBeNull();
  });

  it('refuses a repair after that minute, or before the hold was placed', () => {
    expect(repairTimeProblem(at(60_001), placedAt, now)).toBe('repair_in_future');
    expect(repairTimeProblem(new Date(placedAt.getTime() - 1), placedAt, now)).toBe('repair_before_hold');
  });
});
