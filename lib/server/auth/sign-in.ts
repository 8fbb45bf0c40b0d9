import 'server-only';
import bcrypt from 'bcryptjs';
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import {
  clearFailedSignIns,
  countFailedSignIn,
  getUserForDriverSignIn,
  getUserForStaffSignIn,
  lockSignIns,
} from '@/db/queries/users';
import { homeFor } from '@/lib/auth/roles';
import { lockAfterFailure, secondsLocked } from '@/lib/auth/throttle';
import { lockedMessage, wrongSecretMessage } from '@/lib/auth/wording';
import { done, refuse, type Result } from '@/lib/result';
import { safeNext, type SignInInput } from '@/lib/validation/auth';
import { getSession } from '../session';

// Compared against when the account does not exist, so a wrong name costs the same time as a wrong secret.
const DUMMY_HASH = '$2b$10$CwTycUXWue0Thq9StjUM0uJ8.cSJcB6ZxLDIzl3nHZ9zA1l6pTzHO';
const FAILURE_DELAY_MS = 400;

/**
 * Signs a driver (driver number and PIN) or a staff member (e-mail and password) in: a locked
 * account is refused before its secret is checked; a failure counts towards the lock and answers
 * after a short delay; a success clears the count, writes the audit log and seals the session.
 * Answers where to go next: the asked-for page when it is on this site, else the role's start page.
 */
export async function signIn(input: SignInInput, now = new Date()): Promise<Result<{ next: string }>> {
  const staff = input.method === 'staff';
  const user = staff
    ? await getUserForStaffSignIn(input.email)
    : await getUserForDriverSignIn(input.driverNumber);

  const lockedFor = user ? secondsLocked(user.lockedUntil, now) : 0;
  if (lockedFor > 0) return refuse('locked', lockedMessage(lockedFor));

  const secret = staff ? input.password : input.pin;
  const matches = await bcrypt.compare(secret, user?.secretHash ?? DUMMY_HASH);
  if (!user || !matches || !user.isActive) {
    if (user)
      await db.transaction(async (tx) => {
        const until = lockAfterFailure(await countFailedSignIn(user.id, tx), now);
        if (until) await lockSignIns(user.id, until, tx);
      });
    await new Promise((resolve) => setTimeout(resolve, FAILURE_DELAY_MS));
    return refuse('unauthenticated', wrongSecretMessage(input.method));
  }

  await db.transaction(async (tx) => {
    await clearFailedSignIns(user.id, tx);
    await recordAudit({ actorId: user.id, action: 'sign_in', entityType: 'user', entityId: user.id }, tx);
  });
  const session = await getSession();
  session.userId = user.id;
  session.role = user.role;
  session.carrierId = user.carrierId;
  session.terminalId = user.homeTerminalId;
  await session.save();
  return done({ next: safeNext(input.next) ?? homeFor(user.role) });
}
