import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { db, pool } from '@/db';
import { users } from '@/db/schema';
import { seed } from '@/db/seed';
import { IDLE } from '@/lib/result';
import { ACTIONS, VISITOR_ACCOUNTS, VISITORS, type Visitor } from '@/tests/support/access-matrix';
import { changedTables, rowCounts } from '@/tests/support/row-counts';

// The action column of the access matrix: each exported server action called as each visitor,
// with the real session check (currentUser, requireUser, formAction) and only the sealed cookie
// replaced by a plain object. An empty form: a visitor who is let in gets the form's field
// messages back, never a change. Record-level checks (a driver on another carrier's case) are in
// tests/unit/db/desk-actions.test.ts.
vi.hoisted(() => {
  // what next.config.mjs's experimental.authInterrupts sets in the built app: forbidden() throws its 403
  process.env.__NEXT_EXPERIMENTAL_AUTH_INTERRUPTS = 'true';
});
const session = vi.hoisted(() => ({ data: {} as Record<string, unknown> }));
vi.mock('@/lib/server/session', () => ({
  getSession: async () =>
    Object.assign(session.data, { save: async () => undefined, destroy: () => undefined }),
}));
vi.mock('next/headers', () => ({
  headers: async () => new Headers({ 'x-forwarded-for': '192.0.2.77' }),
  // the language cookie (lib/server/i18n/locale.ts): none chosen on this phone
  cookies: async () => ({ get: () => undefined, set: () => undefined }),
}));
vi.mock('next/cache', () => ({ revalidatePath: () => undefined }));

/** The cookie a visitor would carry, with the account's current session version. */
async function sessionOf(visitor: Visitor): Promise<Record<string, unknown>> {
  if (visitor === 'none') return {};
  const account = VISITOR_ACCOUNTS[visitor];
  const col = account.includes('@') ? users.email : users.driverNumber;
  const [u] = await db.select().from(users).where(eq(col, account));
  return {
    userId: u.id,
    role: u.role,
    carrierId: u.carrierId,
    terminalId: u.homeTerminalId,
    version: u.sessionVersion,
  };
}

type Answer = 'signin' | 'forbidden' | 'form';
async function answerOf(
  action: (prev: unknown, form: FormData) => Promise<unknown>,
): Promise<Answer | string> {
  try {
    const state = (await action(IDLE, new FormData())) as { ok?: boolean };
    return state && typeof state === 'object' && 'ok' in state
      ? 'form'
      : `unexpected ${JSON.stringify(state)}`;
  } catch (error) {
    const digest = String((error as { digest?: string }).digest ?? '');
    if (/^NEXT_REDIRECT;\w+;\/login/.test(digest)) return 'signin';
    if (digest === 'NEXT_HTTP_ERROR_FALLBACK;403') return 'forbidden';
    return `threw ${digest || String(error)}`;
  }
}

let before: Record<string, number>;
beforeAll(async () => {
  await seed();
  before = await rowCounts(pool);
});
afterAll(async () => {
  await pool.end();
});

describe('server actions × visitors', () => {
  it.each(ACTIONS.map((a) => [`${a.file}#${a.name}`, a] as const))('%s', async (_name, row) => {
    const mod = (await import(`@/${row.file.replace(/\.tsx?$/, '')}`)) as Record<string, never>;
    const action = mod[row.name] as (prev: unknown, form: FormData) => Promise<unknown>;
    expect(typeof action).toBe('function');
    const got: Record<string, string> = {};
    for (const visitor of VISITORS) {
      session.data = await sessionOf(visitor);
      got[visitor] = await answerOf(action);
    }
    expect(got).toEqual(row.expect);
  });

  it(`checked ${ACTIONS.length * VISITORS.length} action cells and wrote no record`, async () => {
    // sign-in attempts are counted (sign_in_throttle) and sign-out ends sessions (users): nothing else changes
    const changed = changedTables(before, await rowCounts(pool)).filter(
      (t) => !t.startsWith('sign_in_throttle'),
    );
    expect(changed).toEqual([]);
    console.log(`access matrix: ${ACTIONS.length * VISITORS.length} action cells checked`);
  });
});
