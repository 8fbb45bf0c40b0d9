import 'server-only';
import { eq, sql } from 'drizzle-orm';
import { db, type Tx } from '@/db';
import { carriers, terminals, users } from '@/db/schema';

const signInColumns = {
  id: users.id,
  name: users.name,
  role: users.role,
  secretHash: users.secretHash,
  carrierId: users.carrierId,
  homeTerminalId: users.homeTerminalId,
  isActive: users.isActive,
  failedSignIns: users.failedSignIns,
  lockedUntil: users.lockedUntil,
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

/** Counts one more failed attempt and returns the new count. */
export async function countFailedSignIn(userId: string, tx: Tx) {
  const [row] = await tx
    .update(users)
    .set({ failedSignIns: sql`${users.failedSignIns} + 1` })
    .where(eq(users.id, userId))
    .returning({ count: users.failedSignIns });
  return row.count;
}

export async function lockSignIns(userId: string, until: Date, tx: Tx) {
  await tx.update(users).set({ lockedUntil: until }).where(eq(users.id, userId));
}

export async function clearFailedSignIns(userId: string, tx: Tx) {
  await tx.update(users).set({ failedSignIns: 0, lockedUntil: null }).where(eq(users.id, userId));
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
    })
    .from(users)
    .leftJoin(carriers, eq(carriers.id, users.carrierId))
    .leftJoin(terminals, eq(terminals.id, users.homeTerminalId))
    .where(eq(users.id, userId))
    .limit(1);
  return row && row.isActive ? row : null;
}
export type SessionUser = NonNullable<Awaited<ReturnType<typeof getSessionUser>>>;
