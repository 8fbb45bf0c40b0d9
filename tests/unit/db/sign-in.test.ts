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
const { signIn } = await import('@/lib/server/auth/sign-in');
const { signOut } = await import('@/lib/server/auth/sign-out');
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

const state = async (id: string) => (await db.select().from(users).where(eq(users.id, id)))[0];

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
    expect((await state(driver.id)).failedSignIns).toBe(1);
    expect(session.saved).toBe(0);
  });

  it('locks after five failures (even the right password waits), then lets the right password in and clears the count', async () => {
    const clerk = await account('clerk', 'the-right-one');
    const now = new Date('2026-12-01T12:00:00Z');
    const attempt = (password: string, at = now) =>
      signIn({ method: 'staff', email: clerk.email, password }, at);
    for (let i = 0; i < 4; i++) expect(await attempt('wrong')).toMatchObject({ code: 'unauthenticated' });
    expect((await state(clerk.id)).lockedUntil).toBeNull();
    await attempt('wrong');
    expect((await state(clerk.id)).lockedUntil).toEqual(new Date('2026-12-01T12:00:30Z'));
    expect(await attempt('the-right-one')).toEqual({
      ok: false,
      code: 'locked',
      message: 'Too many failed attempts. Try again in 30 seconds.',
    });
    expect(await attempt('the-right-one', new Date('2026-12-01T12:00:31Z'))).toMatchObject({ ok: true });
    expect(await state(clerk.id)).toMatchObject({ failedSignIns: 0, lockedUntil: null });
  });

  it('signing out ends the session', async () => {
    await signOut();
    expect(session.destroyed).toBe(1);
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
