// A session cookie for a seeded account, sealed the way the app seals it (iron-session with
// SESSION_SECRET and the account's current session version), for tests that talk HTTP to `next start`.
import { eq } from 'drizzle-orm';
import { sealData } from 'iron-session';
import { db } from '../../db';
import { users } from '../../db/schema';
import { SESSION_COOKIE } from '../../lib/auth/session-cookie';

export async function sessionCookieFor(emailOrDriverNumber: string): Promise<string> {
  const col = emailOrDriverNumber.includes('@') ? users.email : users.driverNumber;
  const [u] = await db.select().from(users).where(eq(col, emailOrDriverNumber));
  if (!u) throw new Error(`no seeded account ${emailOrDriverNumber}`);
  const sealed = await sealData(
    {
      userId: u.id,
      role: u.role,
      carrierId: u.carrierId,
      terminalId: u.homeTerminalId,
      version: u.sessionVersion,
    },
    { password: process.env.SESSION_SECRET!, ttl: 3600 },
  );
  return `${SESSION_COOKIE}=${sealed}`;
}
