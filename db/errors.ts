// PostgreSQL errors a service turns into a refusal, recognised by their SQLSTATE (PostgreSQL
// manual, appendix "PostgreSQL Error Codes"). Drizzle wraps the driver's error, so the code may
// sit a few `cause`s down.

function pgError(error: unknown, code: string): { code?: string; constraint?: string } | null {
  for (let e: unknown = error, depth = 0; e && typeof e === 'object' && depth < 4; depth++) {
    if ((e as { code?: unknown }).code === code) return e as { code: string; constraint?: string };
    e = (e as { cause?: unknown }).cause;
  }
  return null;
}

/** lock_not_available (55P03): SELECT … FOR UPDATE NOWAIT on a row another transaction holds. */
export function isLockNotAvailable(error: unknown): boolean {
  return pgError(error, '55P03') !== null;
}

/** unique_violation (23505), of the named constraint when one is given. */
export function isUniqueViolation(error: unknown, constraint?: string): boolean {
  const e = pgError(error, '23505');
  return e !== null && (!constraint || e.constraint === constraint);
}
