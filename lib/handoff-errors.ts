import type { Hold } from './engine';

type Code = 'invalid' | 'conflict' | 'not_found' | 'forbidden';

/** An expected refusal of a handoff submit; route handlers turn it into `{ code, message, fieldErrors }`. */
export class HandoffError extends Error {
  constructor(
    readonly code: Code,
    message: string,
    readonly fieldErrors?: Record<string, string[]>,
    /** Open holds that refused a hook, shown with their reasons and cautions. */
    readonly holds?: Pick<Hold, 'reason' | 'severity' | 'caution'>[],
    /** Holds the refused record itself found: placed on the trailer even though the handoff is not stored. */
    readonly holdsToPlace?: Hold[],
  ) {
    super(message);
    this.name = 'HandoffError';
  }
}

/** PostgreSQL's lock_not_available (SELECT … FOR UPDATE NOWAIT on a row another transaction holds). */
export function isLockNotAvailable(error: unknown): boolean {
  for (let e: unknown = error, depth = 0; e && depth < 4; depth++) {
    if (typeof e === 'object' && (e as { code?: string }).code === '55P03') return true;
    e = (e as { cause?: unknown }).cause;
  }
  return false;
}

/** PostgreSQL's unique_violation (e.g. the same idempotency key inserted twice). */
export function isUniqueViolation(error: unknown, constraint?: string): boolean {
  for (let e: unknown = error, depth = 0; e && depth < 4; depth++) {
    const pg = e as { code?: string; constraint?: string };
    if (typeof e === 'object' && pg.code === '23505' && (!constraint || pg.constraint === constraint))
      return true;
    e = (e as { cause?: unknown }).cause;
  }
  return false;
}
