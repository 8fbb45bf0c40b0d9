// Slowing down repeated sign-in attempts. Pure: the counting itself happens atomically in
// PostgreSQL (db/queries/sign-in-throttle.ts), which applies these rules.
//
// Three counters, each with growing delays instead of a lockout:
// - an account tried from one address: a few free tries, then waits doubling up to 15 minutes;
// - one address across all accounts: more free tries, then the same doubling waits;
// - an account across all addresses (someone guessing from many addresses): the wait stays short
//   (at most a minute), so nobody can keep the account's owner out by failing on purpose.
// A success clears the account's counters; a key left quiet for an hour starts again from zero.

export type ThrottleRule = { free: number; baseSeconds: number; maxSeconds: number };

export const THROTTLE = {
  accountFromAddress: { free: 5, baseSeconds: 30, maxSeconds: 15 * 60 },
  address: { free: 20, baseSeconds: 30, maxSeconds: 15 * 60 },
  account: { free: 10, baseSeconds: 2, maxSeconds: 60 },
} as const satisfies Record<string, ThrottleRule>;

export const QUIET_RESET_SECONDS = 60 * 60;

/** Seconds to wait after the `tries`-th attempt: none before the free ones are used, then doubling, capped. */
export function delayAfter(tries: number, rule: ThrottleRule): number {
  if (tries < rule.free) return 0;
  return Math.min(rule.maxSeconds, rule.baseSeconds * 2 ** (tries - rule.free));
}

export function secondsLocked(lockedUntil: Date | null, now: Date): number {
  if (!lockedUntil) return 0;
  return Math.max(0, Math.ceil((lockedUntil.getTime() - now.getTime()) / 1000));
}

/** The counters' keys for one attempt. The account is named as typed, so unknown names are counted too. */
export function throttleKeys(account: string, address: string) {
  const who = account.trim().toLowerCase();
  return {
    accountFromAddress: `pair:${who}|${address}`,
    address: `address:${address}`,
    account: `account:${who}`,
  } as const;
}
