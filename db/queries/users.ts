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
  sessionVersion: users.sessionVersion,
  locale: users.locale,
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

/** The stored PIN or password hash of a user (to check the current one before a change). */
export async function getUserSecretHash(userId: string): Promise<string | null> {
  const [row] = await db.select({ hash: users.secretHash }).from(users).where(eq(users.id, userId)).limit(1);
  return row?.hash ?? null;
}

/** A new PIN or password hash; the users_end_sessions trigger moves the session version on. */
export async function setUserSecretHash(tx: Tx, userId: string, hash: string): Promise<number> {
  const [row] = await tx
    .update(users)
    .set({ secretHash: hash })
    .where(eq(users.id, userId))
    .returning({ sessionVersion: users.sessionVersion });
  return row.sessionVersion;
}

/** What an admin may change about an account; the trigger ends its sessions when either changes. */
export async function getUserAccess(userId: string) {
  const [row] = await db
    .select({ id: users.id, role: users.role, isActive: users.isActive, name: users.name })
    .from(users)
    .where(eq(users.id, userId))
    .limit(1);
  return row ?? null;
}

export async function setUserAccess(
  tx: Tx,
  userId: string,
  access: { role: (typeof users.$inferSelect)['role']; isActive: boolean },
) {
  await tx.update(users).set(access).where(eq(users.id, userId));
}

/** Keeps the language the user chose (en | es) on the account. */
export async function setUserLocale(userId: string, locale: string): Promise<void> {
  await db.update(users).set({ locale }).where(eq(users.id, userId));
}

/** The e-mail address kept on an account (null when none). */
export async function getUserEmail(userId: string): Promise<string | null> {
  const [row] = await db.select({ email: users.email }).from(users).where(eq(users.id, userId)).limit(1);
  return row?.email ?? null;
}

/** Keeps or removes an account's e-mail address (unique: users_email_unique). */
export async function setUserEmail(tx: Tx, userId: string, email: string | null): Promise<void> {
  await tx.update(users).set({ email }).where(eq(users.id, userId));
}
