// PostgreSQL error codes (SQLSTATE, PostgreSQL manual appendix A) as services meet them: drizzle
// wraps the driver's error, so the code and constraint are looked for down the `cause` chain.

type PgError = { code?: string; constraint?: string; cause?: unknown };

function pgErrorOf(error: unknown, code: string): PgError | null {
  for (let e: unknown = error, depth = 0; e && typeof e === 'object' && depth < 4; depth++) {
    if ((e as PgError).code === code) return e as PgError;
    e = (e as PgError).cause;
  }
  return null;
}

/** unique_violation (23505), optionally of one named constraint or unique index. */
export function isUniqueViolation(error: unknown, constraint?: string): boolean {
  const pg = pgErrorOf(error, '23505');
  return pg !== null && (!constraint || pg.constraint === constraint);
}
