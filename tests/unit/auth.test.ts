import { describe, expect, it } from 'vitest';
import { canOpen, homeFor, ROLES, SECTION_ROLES } from '@/lib/auth/roles';
import { delayAfter, secondsLocked, THROTTLE, throttleKeys } from '@/lib/auth/throttle';
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

// Growing delays rather than a lockout, and a cap on the per-account wait so a stranger cannot keep
// the owner out: OWASP Authentication Cheat Sheet, "Protect Against Automated Attacks" / "Account
// Lockout" (https://cheatsheetseries.owasp.org/cheatsheets/Authentication_Cheat_Sheet.html), and
// NIST SP 800-63B §5.2.2 "Rate Limiting (Throttling)", which names growing waits between attempts.
describe('slowing down failed sign-ins', () => {
  const now = new Date('2026-12-01T12:00:00Z');
  const pair = THROTTLE.accountFromAddress;
  it('lets the free attempts through without a wait', () => {
    for (let n = 1; n < pair.free; n++) expect(delayAfter(n, pair)).toBe(0);
  });
  it('waits from the last free attempt on, doubling each time, capped', () => {
    expect(delayAfter(pair.free, pair)).toBe(30);
    expect(delayAfter(pair.free + 1, pair)).toBe(60);
    expect(delayAfter(pair.free + 20, pair)).toBe(15 * 60);
  });
  it('the wait on an account from every address together stays short (at most a minute)', () => {
    expect(THROTTLE.account.free).toBeGreaterThan(THROTTLE.accountFromAddress.free);
    expect(delayAfter(10_000, THROTTLE.account)).toBe(60);
  });
  it('one address gets 5 tries at an account at once, then 7 more in the rest of the first hour', () => {
    // worked by hand: tries 1–5 at 0 s; the waits after them are 30, 60, 120, 240, 480, 900, 900 s,
    // so tries 6–12 come at 30, 90, 210, 450, 930, 1830 and 2730 s; the 13th not before 3630 s
    const times: number[] = [];
    for (let s = 0, n = 1; s < 3600; n++) {
      times.push(s);
      s += delayAfter(n, pair);
    }
    expect(times).toEqual([0, 0, 0, 0, 0, 30, 90, 210, 450, 930, 1830, 2730]);
  });
  it('a wait in the past no longer holds', () => {
    expect(secondsLocked(new Date(now.getTime() - 1000), now)).toBe(0);
    expect(secondsLocked(new Date(now.getTime() + 1500), now)).toBe(2);
  });
  it('names the account the same however it was typed, and keeps addresses apart', () => {
    expect(throttleKeys(' D1001', '10.0.0.1').account).toBe(throttleKeys('d1001 ', '10.0.0.2').account);
    expect(throttleKeys('D1001', '10.0.0.1').accountFromAddress).not.toBe(
      throttleKeys('D1001', '10.0.0.2').accountFromAddress,
    );
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
