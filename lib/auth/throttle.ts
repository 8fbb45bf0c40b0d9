// Slowing down repeated failed sign-ins. Pure: callers pass the counter, the lock time and `now`.
export const FREE_ATTEMPTS = 5;
export const BASE_LOCK_SECONDS = 30;
export const MAX_LOCK_SECONDS = 15 * 60;

/** After the free attempts, each further failure doubles the lock, capped at 15 minutes. */
export function lockAfterFailure(failedSignIns: number, now: Date): Date | null {
  if (failedSignIns < FREE_ATTEMPTS) return null;
  const seconds = Math.min(MAX_LOCK_SECONDS, BASE_LOCK_SECONDS * 2 ** (failedSignIns - FREE_ATTEMPTS));
  return new Date(now.getTime() + seconds * 1000);
}

export function secondsLocked(lockedUntil: Date | null, now: Date): number {
  if (!lockedUntil) return 0;
  return Math.max(0, Math.ceil((lockedUntil.getTime() - now.getTime()) / 1000));
}
