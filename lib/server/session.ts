import 'server-only';
import { getIronSession, type SessionOptions } from 'iron-session';
import { cookies } from 'next/headers';
import type { Role } from '@/lib/auth/roles';

export type SessionData = {
  userId?: string;
  role?: Role;
  carrierId?: string | null;
  terminalId?: string | null;
};

export const SESSION_COOKIE = 'hm_session';
const DEV_SECRET = 'hitchmark-local-development-secret-not-for-production';

function secret(): string {
  const value = process.env.SESSION_SECRET;
  if (value && value.length >= 32) return value;
  if (process.env.NODE_ENV === 'production') {
    throw new Error('SESSION_SECRET (32+ characters) must be set in production');
  }
  return DEV_SECRET;
}

export function sessionOptions(): SessionOptions {
  return {
    password: secret(),
    cookieName: SESSION_COOKIE,
    ttl: 60 * 60 * 12,
    cookieOptions: {
      httpOnly: true,
      sameSite: 'lax',
      // A secure cookie is not sent back over plain http; local runs and tests set HM_INSECURE_COOKIES=1.
      secure: process.env.NODE_ENV === 'production' && process.env.HM_INSECURE_COOKIES !== '1',
      path: '/',
    },
  };
}

export async function getSession() {
  return getIronSession<SessionData>(await cookies(), sessionOptions());
}
