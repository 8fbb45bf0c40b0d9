import { describe, expect, it } from 'vitest';
import { canOpen, homeFor, ROLES, SECTION_ROLES } from '@/lib/auth/roles';
import {
  BASE_LOCK_SECONDS,
  FREE_ATTEMPTS,
  lockAfterFailure,
  MAX_LOCK_SECONDS,
  secondsLocked,
} from '@/lib/auth/throttle';
import { safeNext, signInSchema } from '@/lib/validation/auth';

describe('sign-in input', () => {
  it('accepts a driver number and PIN, normalising case and spaces', () => {
    const r = signInSchema.safeParse({ method: 'driver', driverNumber: ' d1001 ', pin: '4321' });
    expect(r.success && r.data.method === 'driver' && r.data.driverNumber).toBe('D1001');
  });
  it('refuses a PIN that is not 4–8 digits, with a message a driver understands', () => {
    const r = signInSchema.safeParse({ method: 'driver', driverNumber: 'D1001', pin: '12a' });
    expect(r.success).toBe(false);
    expect(r.error?.issues[0].message).toBe('Your PIN is 4 to 8 digits.');
  });
  it('lower-cases a staff e-mail and refuses a malformed one', () => {
    const ok = signInSchema.safeParse({
      method: 'staff',
      email: 'Clerk@Bramblecrest.Example',
      password: 'x',
    });
    expect(ok.success && ok.data.method === 'staff' && ok.data.email).toBe('clerk@bramblecrest.example');
    expect(signInSchema.safeParse({ method: 'staff', email: 'clerk', password: 'x' }).success).toBe(false);
  });
  it('refuses an unknown method', () => {
    expect(signInSchema.safeParse({ method: 'badge', id: '1' }).success).toBe(false);
  });
});

describe('next address after sign-in', () => {
  it.each([
    ['/gate', '/gate'],
    ['/trailers?q=R5', '/trailers?q=R5'],
    ['//elsewhere.example', null],
    ['/\\elsewhere.example', null],
    ['https://elsewhere.example/', null],
    [undefined, null],
  ])('%s → %s', (input, expected) => {
    expect(safeNext(input)).toBe(expected);
  });
});

describe('slowing down failed sign-ins', () => {
  const now = new Date('2026-12-01T12:00:00Z');
  it('lets the first attempts through without a lock', () => {
    for (let n = 1; n < FREE_ATTEMPTS; n++) expect(lockAfterFailure(n, now)).toBeNull();
  });
  it('locks from the fifth failure and doubles each time, capped', () => {
    const first = lockAfterFailure(FREE_ATTEMPTS, now)!;
    expect(secondsLocked(first, now)).toBe(BASE_LOCK_SECONDS);
    expect(secondsLocked(lockAfterFailure(FREE_ATTEMPTS + 1, now), now)).toBe(BASE_LOCK_SECONDS * 2);
    expect(secondsLocked(lockAfterFailure(FREE_ATTEMPTS + 20, now), now)).toBe(MAX_LOCK_SECONDS);
  });
  it('a lock in the past no longer holds', () => {
    expect(secondsLocked(new Date(now.getTime() - 1000), now)).toBe(0);
  });
});

describe('roles and sections', () => {
  it('every role has a start page it may open', () => {
    for (const role of ROLES) {
      const section = homeFor(role).slice(1) as keyof typeof SECTION_ROLES;
      expect(canOpen(role, section)).toBe(true);
    }
  });
  it('only admins open admin; drivers never open the yard', () => {
    expect(ROLES.filter((r) => canOpen(r, 'admin'))).toEqual(['admin']);
    expect(canOpen('driver', 'yard')).toBe(false);
  });
});
