// The account remembers the language: chosen at sign-in or in the header it is saved on
// users.locale and in the hm-locale cookie; signing in on a phone with no choice takes the account's.
import { randomUUID } from 'node:crypto';
import bcrypt from 'bcryptjs';
import { eq } from 'drizzle-orm';
import { afterAll, beforeEach, describe, expect, it, vi } from 'vitest';
import { db, pool } from '@/db';
import { users } from '@/db/schema';

const jar = vi.hoisted(() => ({
  cookies: new Map<string, string>(),
  session: {} as Record<string, unknown>,
}));
vi.mock('@/lib/server/session', () => ({
  getSession: async () =>
    Object.assign(jar.session, { save: async () => undefined, destroy: () => undefined }),
}));
vi.mock('next/headers', () => ({
  headers: async () => new Headers({ 'x-forwarded-for': '203.0.113.77' }),
  cookies: async () => ({
    get: (name: string) => (jar.cookies.has(name) ? { name, value: jar.cookies.get(name)! } : undefined),
    set: (name: string, value: string) => void jar.cookies.set(name, value),
  }),
}));
const { signIn } = await import('@/lib/server/auth/sign-in');
const { chooseLocaleAction } = await import('@/lib/server/i18n/actions');

async function driver(locale = 'en') {
  const tag = randomUUID().slice(0, 8).toUpperCase();
  const [row] = await db
    .insert(users)
    .values({
      name: `Test ${tag}`,
      role: 'driver',
      driverNumber: `L-${tag}`,
      secretHash: await bcrypt.hash('4321', 4),
      locale,
    })
    .returning({ id: users.id, driverNumber: users.driverNumber });
  return row as { id: string; driverNumber: string };
}
const localeOf = async (id: string) =>
  (await db.select({ l: users.locale }).from(users).where(eq(users.id, id)))[0].l;

beforeEach(() => {
  jar.cookies.clear();
  jar.session = {};
});
afterAll(async () => {
  await pool.end();
});

describe('the account remembers the language', () => {
  it('a new account speaks English by default', async () => {
    const [row] = await db
      .insert(users)
      .values({
        name: 'Test default',
        role: 'driver',
        driverNumber: `L-${randomUUID().slice(0, 8)}`,
        secretHash: 'x',
      })
      .returning({ locale: users.locale });
    expect(row.locale).toBe('en');
  });

  it('Spanish chosen on the sign-in page is saved on the account at sign-in', async () => {
    const d = await driver('en');
    jar.cookies.set('hm-locale', 'es');
    const r = await signIn({ method: 'driver', driverNumber: d.driverNumber, pin: '4321' });
    expect(r.ok).toBe(true);
    expect(await localeOf(d.id)).toBe('es');
    expect(jar.cookies.get('hm-locale')).toBe('es');
  });

  it('on a phone with no choice, the cookie follows the account after sign-in', async () => {
    const d = await driver('es');
    const r = await signIn({ method: 'driver', driverNumber: d.driverNumber, pin: '4321' });
    expect(r.ok).toBe(true);
    expect(jar.cookies.get('hm-locale')).toBe('es');
    expect(await localeOf(d.id)).toBe('es');
  });

  it('the header switch saves the choice on the signed-in account and the cookie; a bad value changes nothing', async () => {
    const d = await driver('es');
    jar.session.userId = d.id;
    expect(await chooseLocaleAction('en')).toEqual({ ok: true });
    expect(await localeOf(d.id)).toBe('en');
    expect(jar.cookies.get('hm-locale')).toBe('en');
    expect(await chooseLocaleAction('fr')).toEqual({ ok: false });
    expect(await localeOf(d.id)).toBe('en');
    // signed out (the sign-in page): only the cookie
    jar.session = {};
    expect(await chooseLocaleAction('es')).toEqual({ ok: true });
    expect(jar.cookies.get('hm-locale')).toBe('es');
    expect(await localeOf(d.id)).toBe('en');
  });
});
