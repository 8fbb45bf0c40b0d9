// When to try an e-mail again after a failed send: 30 s, 1 min, 2 min … capped at 30 min. Pure.
export const OUTBOX_MAX_BACKOFF_SECONDS = 30 * 60;

export function nextAttemptAt(attempts: number, now: Date): Date {
  const seconds = Math.min(OUTBOX_MAX_BACKOFF_SECONDS, 30 * 2 ** Math.max(0, attempts - 1));
  return new Date(now.getTime() + seconds * 1000);
}
