import 'server-only';
import bcrypt from 'bcryptjs';
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import { claimAttempt, clearAttempts } from '@/db/queries/sign-in-throttle';
import { getUserAccess, getUserSecretHash, setUserAccess, setUserSecretHash } from '@/db/queries/users';
import { secondsLocked, THROTTLE, throttleKeys } from '@/lib/auth/throttle';
import { lockedMessage } from '@/lib/auth/wording';
import { done, refuse, refuseField, type Result } from '@/lib/result';
import type { UserAccessInput } from '@/lib/validation/account';
import type { SessionUser } from '../auth';
import { getSession } from '../session';

const HASH_ROUNDS = 10;

type SecretChange = {
  kind: 'pin' | 'password';
  current: string;
  next: string;
  /** The form's field for the current secret, where a wrong one is reported. */
  currentField: string;
};

/**
 * A signed-in person changes their own PIN (drivers) or password (staff). The current secret is
 * required and its tries are counted like sign-in's (a stolen, unlocked phone cannot guess it at
 * leisure). The new hash ends every session of the person (the users_end_sessions trigger moves
 * the session version on); this device's cookie is then sealed again with the new version, so the
 * person stays signed in where they made the change and nowhere else.
 */
export async function changeOwnSecret(
  user: SessionUser,
  change: SecretChange,
  address = 'unknown',
  now = new Date(),
): Promise<Result> {
  if ((user.role === 'driver') !== (change.kind === 'pin'))
    return refuse(
      'forbidden',
      user.role === 'driver' ? 'Drivers sign in with a PIN.' : 'Staff sign in with a password.',
    );
  const keys = throttleKeys(`change:${user.id}`, address);
  for (const counter of ['accountFromAddress', 'account'] as const) {
    const claim = await claimAttempt(keys[counter], THROTTLE[counter], now);
    if (!claim.allowed) return refuse('locked', lockedMessage(secondsLocked(claim.blockedUntil, now)));
  }
  const hash = await getUserSecretHash(user.id);
  if (!hash || !(await bcrypt.compare(change.current, hash))) {
    const what = change.kind === 'pin' ? 'PIN' : 'password';
    return refuseField('unauthenticated', change.currentField, `That is not your current ${what}.`);
  }
  const newHash = await bcrypt.hash(change.next, HASH_ROUNDS);
  const version = await db.transaction(async (tx) => {
    const v = await setUserSecretHash(tx, user.id, newHash);
    await recordAudit(
      { actorId: user.id, action: `${change.kind}_changed`, entityType: 'user', entityId: user.id },
      tx,
    );
    return v;
  });
  await clearAttempts([keys.accountFromAddress, keys.account]);
  const session = await getSession();
  session.version = version;
  await session.save();
  return done(undefined);
}

/**
 * An admin changes a person's role or switches the account off or on. A driver account stays a
 * driver and a staff account stays staff (they sign in differently); admins do not change their
 * own account here, so nobody locks the last admin out by a slip. The trigger ends the person's
 * sessions, so a new role or a switched-off account applies at their next request.
 */
export async function changeUserAccess(admin: SessionUser, input: UserAccessInput): Promise<Result> {
  if (input.userId === admin.id)
    return refuseField('forbidden', 'userId', 'Another admin must change your own role or account.');
  const target = await getUserAccess(input.userId);
  if (!target) return refuseField('not_found', 'userId', 'No such person.');
  if ((target.role === 'driver') !== (input.role === 'driver'))
    return refuseField(
      'invalid',
      'role',
      target.role === 'driver'
        ? 'A driver account stays a driver: it signs in with a driver number and PIN.'
        : 'A staff account cannot become a driver: drivers sign in with a driver number and PIN.',
    );
  if (target.role === input.role && target.isActive === input.isActive)
    return refuseField('invalid', 'role', 'Nothing to change.');
  await db.transaction(async (tx) => {
    await setUserAccess(tx, target.id, { role: input.role, isActive: input.isActive });
    await recordAudit(
      {
        actorId: admin.id,
        action: 'user_access_changed',
        entityType: 'user',
        entityId: target.id,
        detail: {
          from: { role: target.role, isActive: target.isActive },
          to: { role: input.role, isActive: input.isActive },
        },
      },
      tx,
    );
  });
  return done(undefined);
}
