import 'server-only';
import { eq, sql } from 'drizzle-orm';
import { db } from '@/db';
import { carriers, terminals, users } from '@/db/schema';

const signInColumns = {
  id: users.id,
  name: users.name,
  role: users.role,
  secretHash: users.secretHash,
  carrierId: users.carrierId,
  homeTerminalId: users.homeTerminalId,
  isActive: users.isActive,
  sessionVersion: users.sessionVersion,
};

export async function getUserForStaffSignIn(email: string) {
  const [row] = await db.select(signInColumns).from(users).where(eq(users.email, email)).limit(1);
  return row ?? null;
}

export async function getUserForDriverSignIn(driverNumber: string) {
  const [row] = await db
    .select(signInColumns)
    .from(users)
    .where(eq(users.driverNumber, driverNumber))
    .limit(1);
  return row ?? null;
}

/** Ends every session of the user: cookies carrying an older version are no longer accepted. */
export async function bumpSessionVersion(userId: string) {
  await db
    .update(users)
    .set({ sessionVersion: sql`${users.sessionVersion} + 1` })
    .where(eq(users.id, userId));
}

/** The signed-in user as the shell and the checks need it; null when the account is gone or disabled. */
export async function getSessionUser(userId: string) {
  const [row] = await db
    .select({
      id: users.id,
      name: users.name,
      role: users.role,
      carrierId: users.carrierId,
      carrierName: carriers.name,
      carrierScac: carriers.scac,
      terminalId: users.homeTerminalId,
      terminalName: terminals.name,
      terminalTimeZone: terminals.timeZone,
      isActive: users.isActive,
      sessionVersion: users.sessionVersion,
    })
    .from(users)
    .leftJoin(carriers, eq(carriers.id, users.carrierId))
    .leftJoin(terminals, eq(terminals.id, users.homeTerminalId))
    .where(eq(users.id, userId))
    .limit(1);
  return row && row.isActive ? row : null;
}
export type SessionUser = NonNullable<Awaited<ReturnType<typeof getSessionUser>>>;
