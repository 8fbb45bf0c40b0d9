import 'server-only';
import bcrypt from 'bcryptjs';
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import { claimAttempt, clearAttempts, refundAttempt } from '@/db/queries/sign-in-throttle';
import { getUserForDriverSignIn, getUserForStaffSignIn } from '@/db/queries/users';
import { homeFor } from '@/lib/auth/roles';
import { secondsLocked, THROTTLE, throttleKeys } from '@/lib/auth/throttle';
import { lockedMessage, wrongSecretMessage } from '@/lib/auth/wording';
import { done, refuse, type Result } from '@/lib/result';
import { safeNext, type SignInInput } from '@/lib/validation/auth';
import { settleLocaleAtSignIn } from '../i18n/locale';
import { getSession } from '../session';

// Compared against when the account does not exist, so a wrong name costs the same time as a wrong secret.
const DUMMY_HASH = '$2b$10$CwTycUXWue0Thq9StjUM0uJ8.cSJcB6ZxLDIzl3nHZ9zA1l6pTzHO';
const FAILURE_DELAY_MS = 400;

/**
 * Signs a driver (driver number and PIN) or a staff member (e-mail and password) in. Every
 * attempt first claims a try on three counters (the account from this address, this address, the
 * account: lib/auth/throttle.ts), atomically in PostgreSQL; while one of them asks to wait, the
 * secret is not even checked. A failure answers after a short delay; a success clears the
 * account's counters, writes the audit log and seals the session with the user's session version.
 * Answers where to go next: the asked-for page when it is on this site, else the role's start page.
 */
export async function signIn(
  input: SignInInput,
  now = new Date(),
  address = 'unknown',
): Promise<Result<{ next: string }>> {
  const staff = input.method === 'staff';
  const keys = throttleKeys(`${input.method}:${staff ? input.email : input.driverNumber}`, address);
  for (const counter of ['accountFromAddress', 'address', 'account'] as const) {
    const claim = await claimAttempt(keys[counter], THROTTLE[counter], now);
    if (!claim.allowed) return refuse('locked', lockedMessage(secondsLocked(claim.blockedUntil, now)));
  }

  const user = staff
    ? await getUserForStaffSignIn(input.email)
    : await getUserForDriverSignIn(input.driverNumber);

  const secret = staff ? input.password : input.pin;
  const matches = await bcrypt.compare(secret, user?.secretHash ?? DUMMY_HASH);
  if (!user || !matches || !user.isActive) {
    await new Promise((resolve) => setTimeout(resolve, FAILURE_DELAY_MS));
    return refuse('unauthenticated', wrongSecretMessage(input.method));
  }

  await clearAttempts([keys.accountFromAddress, keys.account]);
  await refundAttempt(keys.address);
  await db.transaction(async (tx) => {
    await recordAudit({ actorId: user.id, action: 'sign_in', entityType: 'user', entityId: user.id }, tx);
  });
  const session = await getSession();
  session.userId = user.id;
  session.role = user.role;
  session.carrierId = user.carrierId;
  session.terminalId = user.homeTerminalId;
  session.version = user.sessionVersion;
  await session.save();
  await settleLocaleAtSignIn(user);
  return done({ next: safeNext(input.next) ?? homeFor(user.role) });
}
