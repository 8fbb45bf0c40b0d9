import { randomUUID } from 'node:crypto';
import bcrypt from 'bcryptjs';
import { and, eq } from 'drizzle-orm';
import { afterAll, beforeEach, describe, expect, it, vi } from 'vitest';
import { db, pool } from '@/db';
import { auditLog, users } from '@/db/schema';
import { IDLE } from '@/lib/result';

// The sign-in service and action against the database, without a running Next server: only the
// sealed cookie is replaced by a plain object.
const session = vi.hoisted(() => ({
  data: {} as Record<string, unknown>,
  saved: 0,
  destroyed: 0,
}));
vi.mock('@/lib/server/session', () => ({
  getSession: async () =>
    Object.assign(session.data, {
      save: async () => void session.saved++,
      destroy: () => void session.destroyed++,
    }),
}));
vi.mock('next/headers', () => ({
  headers: async () => new Headers({ 'x-forwarded-for': '203.0.113.200, 192.0.2.99' }),
  // the language cookie (lib/server/i18n/locale.ts): none chosen on this phone
  cookies: async () => ({ get: () => undefined, set: () => undefined }),
}));
const { signIn } = await import('@/lib/server/auth/sign-in');
const { signOut } = await import('@/lib/server/auth/sign-out');
const { currentUser } = await import('@/lib/server/auth');
const { signInAction } = await import('@/app/(auth)/actions');

type Account = { id: string; email: string; driverNumber: string };

/** A fresh account of our own (cost 4 keeps bcrypt quick), so one test's failures never lock another's. */
async function account(role: 'clerk' | 'driver', secret: string, isActive = true): Promise<Account> {
  const tag = randomUUID().slice(0, 8).toUpperCase();
  const [row] = await db
    .insert(users)
    .values({
      name: `Test ${tag}`,
      role,
      email: `t-${tag.toLowerCase()}@hitchmark.example`,
      driverNumber: `T-${tag}`,
      secretHash: await bcrypt.hash(secret, 4),
      isActive,
    })
    .returning({ id: users.id, email: users.email, driverNumber: users.driverNumber });
  return row as Account;
}

function form(fields: Record<string, string>) {
  const data = new FormData();
  for (const [k, v] of Object.entries(fields)) data.set(k, v);
  return data;
}

beforeEach(() => {
  session.data = {};
  session.saved = 0;
  session.destroyed = 0;
});
afterAll(async () => {
  await pool.end();
});

describe('signing in (service)', () => {
  it('a clerk with the right password gets a session, an audit entry and the desk as next page', async () => {
    const clerk = await account('clerk', 'long-enough-password');
    const result = await signIn({ method: 'staff', email: clerk.email, password: 'long-enough-password' });
    expect(result).toEqual({ ok: true, value: { next: '/desk' } });
    expect(session.data).toMatchObject({ userId: clerk.id, role: 'clerk' });
    expect(session.saved).toBe(1);
    const audit = await db
      .select()
      .from(auditLog)
      .where(and(eq(auditLog.action, 'sign_in'), eq(auditLog.entityId, clerk.id)));
    expect(audit).toHaveLength(1);
  });

  it('follows a same-site next page only', async () => {
    const driver = await account('driver', '2468');
    const input = { method: 'driver', driverNumber: driver.driverNumber, pin: '2468' } as const;
    expect(await signIn({ ...input, next: '/trailers?q=R5' })).toMatchObject({
      value: { next: '/trailers?q=R5' },
    });
    expect(await signIn({ ...input, next: '//elsewhere.example/' })).toMatchObject({
      value: { next: '/gate' },
    });
  });

  it('answers a wrong PIN, an unknown driver and a disabled account with the same words', async () => {
    const driver = await account('driver', '1357');
    const disabled = await account('driver', '1357', false);
    const wrong = { ok: false, code: 'unauthenticated', message: 'That driver number and PIN do not match.' };
    expect(await signIn({ method: 'driver', driverNumber: driver.driverNumber, pin: '7531' })).toEqual(wrong);
    expect(await signIn({ method: 'driver', driverNumber: 'NO-SUCH-1', pin: '7531' })).toEqual(wrong);
    expect(await signIn({ method: 'driver', driverNumber: disabled.driverNumber, pin: '1357' })).toEqual(
      wrong,
    );
    expect(session.saved).toBe(0);
  });

  it('waits after five failures (even the right password waits), then lets the right password in and starts again', async () => {
    const clerk = await account('clerk', 'the-right-one');
    const now = new Date('2026-12-01T12:00:00Z');
    const attempt = (password: string, at = now) =>
      signIn({ method: 'staff', email: clerk.email, password }, at, '192.0.2.10');
    for (let i = 0; i < 5; i++) expect(await attempt('wrong')).toMatchObject({ code: 'unauthenticated' });
    expect(await attempt('the-right-one')).toEqual({
      ok: false,
      code: 'locked',
      message: 'Too many failed attempts. Try again in 30 seconds.',
    });
    expect(await attempt('the-right-one', new Date('2026-12-01T12:00:31Z'))).toMatchObject({ ok: true });
    // the success cleared the account's counters: five free tries again
    const later = new Date('2026-12-01T12:01:00Z');
    for (let i = 0; i < 5; i++)
      expect(await attempt('wrong', later)).toMatchObject({ code: 'unauthenticated' });
  });

  it('30 parallel wrong PINs from one address: only 5 are checked, the rest wait', async () => {
    const driver = await account('driver', '8642');
    const now = new Date();
    const answers = await Promise.all(
      Array.from({ length: 30 }, (_, i) =>
        signIn(
          { method: 'driver', driverNumber: driver.driverNumber, pin: String(1000 + i) },
          now,
          '192.0.2.20',
        ),
      ),
    );
    const codes = answers.map((a) => (a.ok ? 'ok' : a.code));
    expect(codes.filter((c) => c === 'unauthenticated')).toHaveLength(5);
    expect(codes.filter((c) => c === 'locked')).toHaveLength(25);
  });

  it('a stranger failing on purpose cannot keep the driver out: the right PIN from another address works after a short wait', async () => {
    const driver = await account('driver', '9753');
    const now = new Date();
    // a stranger tries from six addresses, 30 wrong PINs each, in parallel
    const strangers = [
      '198.51.100.1',
      '198.51.100.2',
      '198.51.100.3',
      '198.51.100.4',
      '198.51.100.5',
      '198.51.100.6',
    ];
    await Promise.all(
      strangers.flatMap((address) =>
        Array.from({ length: 30 }, (_, i) =>
          signIn(
            { method: 'driver', driverNumber: driver.driverNumber, pin: String(2000 + i) },
            now,
            address,
          ),
        ),
      ),
    );
    const mine = (at: Date) =>
      signIn({ method: 'driver', driverNumber: driver.driverNumber, pin: '9753' }, at, '203.0.113.7');
    // 30 tries reached the account (5 per address); past its 10 free ones it asks for a wait of at most a minute
    const first = await mine(now);
    expect(first).toMatchObject({ ok: false, code: 'locked' });
    const seconds = Number(/(\d+) seconds/.exec((first as { message: string }).message)?.[1]);
    expect(seconds).toBeGreaterThan(0);
    expect(seconds).toBeLessThanOrEqual(60);
    expect(await mine(new Date(now.getTime() + 61_000))).toMatchObject({ ok: true });
  });

  it('signing out ends the session, and an old copy of the cookie no longer works', async () => {
    const clerk = await account('clerk', 'right-password');
    await signIn({ method: 'staff', email: clerk.email, password: 'right-password' });
    const copy = { ...session.data };
    expect((await currentUser())?.id).toBe(clerk.id);
    await signOut();
    expect(session.destroyed).toBe(1);
    session.data = { ...copy }; // someone kept the old cookie
    expect(await currentUser()).toBeNull();
  });

  it('a new password, a new role or disabling the account ends older sessions', async () => {
    for (const change of [
      { secretHash: await bcrypt.hash('new-password', 4) },
      { role: 'admin' as const },
      { isActive: false },
    ]) {
      const clerk = await account('clerk', 'right-password');
      await signIn({ method: 'staff', email: clerk.email, password: 'right-password' });
      expect((await currentUser())?.id).toBe(clerk.id);
      await db.update(users).set(change).where(eq(users.id, clerk.id));
      expect(await currentUser(), JSON.stringify(Object.keys(change))).toBeNull();
    }
    // an unrelated change (the name) keeps the session
    const clerk = await account('clerk', 'right-password');
    await signIn({ method: 'staff', email: clerk.email, password: 'right-password' });
    await db.update(users).set({ name: 'Renamed Clerk' }).where(eq(users.id, clerk.id));
    expect((await currentUser())?.id).toBe(clerk.id);
  });
});

describe('the sign-in action', () => {
  it('puts each malformed answer under its field and refills the driver number, never the PIN', async () => {
    const answer = await signInAction(IDLE, form({ method: 'driver', driverNumber: '!!', pin: '12' }));
    expect(answer).toMatchObject({
      ok: false,
      fieldErrors: {
        driverNumber: ['Enter your driver number (letters, digits, dashes).'],
        pin: ['Your PIN is 4 to 8 digits.'],
      },
      values: { method: 'driver', driverNumber: '!!' },
    });
    expect(answer.formError).toBeUndefined();
    expect(JSON.stringify(answer)).not.toContain('"12"');
  });

  it('refuses a wrong password on the form, refilling the e-mail but not the password', async () => {
    const clerk = await account('clerk', 'right-password');
    const answer = await signInAction(
      IDLE,
      form({ method: 'staff', email: clerk.email, password: 'typed-secret' }),
    );
    expect(answer).toMatchObject({
      ok: false,
      formError: 'That e-mail and password do not match.',
      values: { method: 'staff', email: clerk.email },
    });
    expect(JSON.stringify(answer)).not.toContain('typed-secret');
  });

  it('says how to sign in when the method is missing', async () => {
    const answer = await signInAction(IDLE, form({ driverNumber: 'D1001', pin: '4321' }));
    expect(answer).toMatchObject({ ok: false, formError: 'Choose how to sign in.' });
  });

  it('redirects to the next page after a good sign-in', async () => {
    const clerk = await account('clerk', 'right-password');
    await expect(
      signInAction(IDLE, form({ method: 'staff', email: clerk.email, password: 'right-password' })),
    ).rejects.toMatchObject({ digest: expect.stringMatching(/^NEXT_REDIRECT;\w+;\/desk;307;$/) });
    expect(session.data).toMatchObject({ userId: clerk.id });
  });
});
