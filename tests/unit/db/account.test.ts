import { randomUUID } from 'node:crypto';
import bcrypt from 'bcryptjs';
import { and, eq } from 'drizzle-orm';
import { afterAll, beforeEach, describe, expect, it, vi } from 'vitest';
import { db, pool } from '@/db';
import { auditLog, users } from '@/db/schema';
import { IDLE } from '@/lib/result';

// Changing one's own PIN or password, and an admin changing a role or switching an account off,
// against the database through the real actions; only the sealed cookie is a plain object. A
// cookie is "the phone": the one that made the change must keep working, every older copy not.
vi.hoisted(() => {
  process.env.__NEXT_EXPERIMENTAL_AUTH_INTERRUPTS = 'true';
});
const session = vi.hoisted(() => ({ data: {} as Record<string, unknown> }));
vi.mock('@/lib/server/session', () => ({
  getSession: async () =>
    Object.assign(session.data, { save: async () => undefined, destroy: () => undefined }),
}));
vi.mock('next/headers', () => ({
  headers: async () => new Headers({ 'x-forwarded-for': '198.51.100.9' }),
  // the language cookie (lib/server/i18n/locale.ts): none chosen on this phone
  cookies: async () => ({ get: () => undefined, set: () => undefined }),
}));
vi.mock('next/cache', () => ({ revalidatePath: () => undefined }));
vi.mock('next-intl/server', () => ({ getTranslations: async () => (key: string) => key }));
const { currentUser } = await import('@/lib/server/auth');
const { changePinAction, changePasswordAction } = await import('@/app/(app)/account/actions');
const { changeUserAccessAction } = await import('@/app/(app)/admin/actions');

type Account = { id: string; role: 'driver' | 'clerk' | 'admin' | 'jockey'; sessionVersion: number };

async function account(role: Account['role'], secret: string): Promise<Account> {
  const tag = randomUUID().slice(0, 8).toUpperCase();
  const [row] = await db
    .insert(users)
    .values({
      name: `Test ${tag}`,
      role,
      email: role === 'driver' ? null : `a-${tag.toLowerCase()}@hitchmark.example`,
      driverNumber: role === 'driver' ? `A-${tag}` : null,
      secretHash: await bcrypt.hash(secret, 4),
    })
    .returning({ id: users.id, role: users.role, sessionVersion: users.sessionVersion });
  return row as Account;
}

/** The cookie this account's phone holds now. */
const cookieOf = (a: Account) => ({
  userId: a.id,
  role: a.role,
  carrierId: null,
  terminalId: null,
  version: a.sessionVersion,
});

function form(fields: Record<string, string>) {
  const data = new FormData();
  for (const [k, v] of Object.entries(fields)) data.set(k, v);
  return data;
}
const stored = async (id: string) => (await db.select().from(users).where(eq(users.id, id)))[0];
/** Whether a request carrying `cookie` is still signed in. */
async function signedIn(cookie: Record<string, unknown>) {
  session.data = { ...cookie };
  return (await currentUser()) !== null;
}

beforeEach(() => {
  session.data = {};
});
afterAll(async () => {
  await pool.end();
});

describe('changing my own PIN or password', () => {
  it('a driver with the right current PIN: new PIN stored, this phone stays signed in, the other phone is out', async () => {
    const driver = await account('driver', '4826');
    const otherPhone = cookieOf(driver);
    session.data = { ...cookieOf(driver) };
    const state = await changePinAction(
      IDLE,
      form({ currentPin: '4826', newPin: '913572', repeatPin: '913572' }),
    );
    expect(state).toEqual({ ok: true, message: 'pinChanged' });
    const thisPhone = { ...session.data };
    const row = await stored(driver.id);
    expect(await bcrypt.compare('913572', row.secretHash)).toBe(true);
    expect(row.sessionVersion).toBe(driver.sessionVersion + 1);
    expect(thisPhone.version).toBe(row.sessionVersion);
    expect(await signedIn(thisPhone)).toBe(true);
    expect(await signedIn(otherPhone)).toBe(false);
    const audit = await db
      .select()
      .from(auditLog)
      .where(and(eq(auditLog.entityId, driver.id), eq(auditLog.action, 'pin_changed')));
    expect(audit).toHaveLength(1);
  });

  it('a wrong current PIN is refused under its field and changes nothing', async () => {
    const driver = await account('driver', '4826');
    session.data = { ...cookieOf(driver) };
    const state = await changePinAction(
      IDLE,
      form({ currentPin: '1111', newPin: '913572', repeatPin: '913572' }),
    );
    expect(state).toMatchObject({
      ok: false,
      fieldErrors: { currentPin: ['That is not your current PIN.'] },
    });
    // the secrets never go back to the browser
    expect(JSON.stringify(state)).not.toContain('913572');
    const row = await stored(driver.id);
    expect(row.sessionVersion).toBe(driver.sessionVersion);
    expect(await bcrypt.compare('4826', row.secretHash)).toBe(true);
  });

  it('the sign-in rules hold for the new secret: a 3-digit PIN, a short or mistyped password are refused', async () => {
    const driver = await account('driver', '4826');
    session.data = { ...cookieOf(driver) };
    const shortPin = await changePinAction(
      IDLE,
      form({ currentPin: '4826', newPin: '123', repeatPin: '123' }),
    );
    expect(shortPin).toMatchObject({ ok: false, fieldErrors: { newPin: ['Your PIN is 4 to 8 digits.'] } });

    const clerk = await account('clerk', 'first-password-here');
    session.data = { ...cookieOf(clerk) };
    const short = await changePasswordAction(
      IDLE,
      form({ currentPassword: 'first-password-here', newPassword: 'short', repeatPassword: 'short' }),
    );
    expect(short).toMatchObject({
      ok: false,
      fieldErrors: { newPassword: ['A new password is at least 8 characters.'] },
    });
    const differ = await changePasswordAction(
      IDLE,
      form({
        currentPassword: 'first-password-here',
        newPassword: 'second-password',
        repeatPassword: 'second-passwort',
      }),
    );
    expect(differ).toMatchObject({
      ok: false,
      fieldErrors: { repeatPassword: ['The two new passwords are not the same.'] },
    });
    const ok = await changePasswordAction(
      IDLE,
      form({
        currentPassword: 'first-password-here',
        newPassword: 'second-password',
        repeatPassword: 'second-password',
      }),
    );
    expect(ok).toEqual({ ok: true, message: 'passwordChanged' });
    expect(await bcrypt.compare('second-password', (await stored(clerk.id)).secretHash)).toBe(true);
  });

  it('guessing the current PIN through this form is throttled like sign-in (5 tries, then a wait)', async () => {
    const driver = await account('driver', '4826');
    const answers: unknown[] = [];
    for (const guess of ['0000', '1111', '2222', '3333', '4444', '4826']) {
      session.data = { ...cookieOf(driver) };
      answers.push(
        await changePinAction(IDLE, form({ currentPin: guess, newPin: '777777', repeatPin: '777777' })),
      );
    }
    // the sixth try, though right, waits: the secret is not even checked (docs/security.md's table)
    expect(answers.at(-1)).toMatchObject({ ok: false });
    expect((answers.at(-1) as { formError: string }).formError).toMatch(/wait|try again/i);
    expect(await bcrypt.compare('4826', (await stored(driver.id)).secretHash)).toBe(true);
  });
});

describe("an admin changes someone's role or switches the account off", () => {
  it("a new role ends that person's sessions; switching off keeps them out", async () => {
    const admin = await account('admin', 'admin-password-1');
    const jockey = await account('jockey', 'jockey-password-1');
    const jockeyPhone = cookieOf(jockey);
    expect(await signedIn(jockeyPhone)).toBe(true);

    session.data = { ...cookieOf(admin) };
    const promoted = await changeUserAccessAction(
      IDLE,
      form({ userId: jockey.id, role: 'clerk', isActive: 'on' }),
    );
    expect(promoted).toEqual({ ok: true, message: 'accessChanged' });
    expect((await stored(jockey.id)).role).toBe('clerk');
    expect(await signedIn(jockeyPhone)).toBe(false);

    session.data = { ...cookieOf(admin) };
    const off = await changeUserAccessAction(IDLE, form({ userId: jockey.id, role: 'clerk' })); // box unticked
    expect(off).toEqual({ ok: true, message: 'accessChanged' });
    const row = await stored(jockey.id);
    expect(row.isActive).toBe(false);
    // even a cookie with the newest version is refused while the account is off
    expect(await signedIn({ ...jockeyPhone, role: 'clerk', version: row.sessionVersion })).toBe(false);
    // the admin who made the changes is still signed in
    expect(await signedIn(cookieOf(admin))).toBe(true);
  });

  it('refuses changing my own account, a driver into staff, staff into a driver, and non-admins', async () => {
    const admin = await account('admin', 'admin-password-1');
    const driver = await account('driver', '4826');
    const clerk = await account('clerk', 'clerk-password-1');
    session.data = { ...cookieOf(admin) };
    expect(
      await changeUserAccessAction(IDLE, form({ userId: admin.id, role: 'clerk', isActive: 'on' })),
    ).toMatchObject({
      ok: false,
      fieldErrors: { userId: [expect.stringMatching(/Another admin/)] },
    });
    session.data = { ...cookieOf(admin) };
    expect(
      await changeUserAccessAction(IDLE, form({ userId: driver.id, role: 'clerk', isActive: 'on' })),
    ).toMatchObject({
      ok: false,
      fieldErrors: { role: [expect.stringMatching(/stays a driver/)] },
    });
    session.data = { ...cookieOf(admin) };
    expect(
      await changeUserAccessAction(IDLE, form({ userId: clerk.id, role: 'driver', isActive: 'on' })),
    ).toMatchObject({
      ok: false,
      fieldErrors: { role: [expect.stringMatching(/cannot become a driver/)] },
    });
    expect((await stored(driver.id)).sessionVersion).toBe(driver.sessionVersion);
    expect((await stored(clerk.id)).sessionVersion).toBe(clerk.sessionVersion);

    session.data = { ...cookieOf(clerk) };
    await expect(
      changeUserAccessAction(IDLE, form({ userId: driver.id, role: 'driver' })),
    ).rejects.toMatchObject({ digest: 'NEXT_HTTP_ERROR_FALLBACK;403' });
    expect((await stored(driver.id)).isActive).toBe(true);
  });
});
