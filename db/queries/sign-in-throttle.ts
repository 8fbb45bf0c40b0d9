import 'server-only';
import { eq, inArray, sql } from 'drizzle-orm';
import { db } from '@/db';
import { signInThrottle } from '@/db/schema';
import { QUIET_RESET_SECONDS, type ThrottleRule } from '@/lib/auth/throttle';

export type Claim = { allowed: true; tries: number } | { allowed: false; blockedUntil: Date };

/**
 * Claims one attempt on `key` in a single statement: counts it and, once the free tries are used,
 * sets the wait (the SQL form of lib/auth/throttle.ts delayAfter). While a wait runs nothing is
 * counted and the claim is refused. Parallel claims queue on the row's lock, so no two read the
 * same count; a key quiet for an hour starts again from one.
 */
export async function claimAttempt(key: string, rule: ThrottleRule, now: Date): Promise<Claim> {
  const at = sql`${now.toISOString()}::timestamptz`;
  const free = sql`${rule.free}::int`;
  const wait = (tries: ReturnType<typeof sql>) =>
    sql`CASE WHEN ${tries} >= ${free} THEN ${at} + make_interval(secs => least(${rule.maxSeconds}::int,
      ${rule.baseSeconds}::int * power(2, ${tries} - ${free}))) END`;
  const next = sql`CASE WHEN t.updated_at < ${at} - make_interval(secs => ${QUIET_RESET_SECONDS}::int)
    THEN 1 ELSE t.tries + 1 END`;
  const { rows } = await db.execute<{ tries: number }>(sql`
    INSERT INTO sign_in_throttle AS t (key, tries, blocked_until, updated_at)
    VALUES (${key}, 1, ${wait(sql`1`)}, ${at})
    ON CONFLICT (key) DO UPDATE SET tries = ${next}, blocked_until = ${wait(next)}, updated_at = ${at}
    WHERE t.blocked_until IS NULL OR t.blocked_until <= ${at}
    RETURNING t.tries`);
  if (rows.length) return { allowed: true, tries: Number(rows[0].tries) };
  const [row] = await db
    .select({ blockedUntil: signInThrottle.blockedUntil })
    .from(signInThrottle)
    .where(eq(signInThrottle.key, key));
  return { allowed: false, blockedUntil: row?.blockedUntil ?? new Date(now.getTime() + 1000) };
}

/** After a good sign-in: the account's counters start again. */
export async function clearAttempts(keys: string[]): Promise<void> {
  await db.delete(signInThrottle).where(inArray(signInThrottle.key, keys));
}

/** After a good sign-in: the address's try is handed back, so people signing in at one gate never add up. */
export async function refundAttempt(key: string): Promise<void> {
  await db
    .update(signInThrottle)
    .set({ tries: sql`greatest(${signInThrottle.tries} - 1, 0)` })
    .where(eq(signInThrottle.key, key));
}
