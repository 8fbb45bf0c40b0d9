import 'server-only';
import { getIronSession, type SessionOptions } from 'iron-session';
import { cookies } from 'next/headers';
import type { Role } from '@/lib/auth/roles';
import { SESSION_COOKIE } from '@/lib/auth/session-cookie';
import { env } from './env';

export type SessionData = {
  userId?: string;
  role?: Role;
  carrierId?: string | null;
  terminalId?: string | null;
  /** users.session_version when the cookie was sealed: an older one is signed out. */
  version?: number;
};

const DEV_SECRET = 'hitchmark-local-development-secret-not-for-production';

function secret(): string {
  // env() refuses to start production without SESSION_SECRET, so the fallback serves local runs only
  return env().SESSION_SECRET ?? DEV_SECRET;
}

export function sessionOptions(): SessionOptions {
  const settings = env();
  return {
    password: secret(),
    cookieName: SESSION_COOKIE,
    ttl: 60 * 60 * 12,
    cookieOptions: {
      httpOnly: true,
      sameSite: 'lax',
      // A secure cookie is not sent back over plain http; local runs and tests set HM_INSECURE_COOKIES=1.
      secure: settings.NODE_ENV === 'production' && !settings.HM_INSECURE_COOKIES,
      path: '/',
    },
  };
}

export async function getSession() {
  return getIronSession<SessionData>(await cookies(), sessionOptions());
}
