import 'server-only';
import { forbidden, redirect } from 'next/navigation';
import { getSessionUser, type SessionUser } from '@/db/queries/users';
import type { Role } from '@/lib/auth/roles';
import { getSession } from './session';

export type { SessionUser };

/**
 * The signed-in user, or null. Reads the sealed cookie, then checks the account still exists, is
 * active, and has not ended its sessions since (sign-out, a new PIN or password, a new role).
 */
export async function currentUser(): Promise<SessionUser | null> {
  const session = await getSession();
  if (!session.userId) return null;
  const user = await getSessionUser(session.userId);
  if (!user || user.sessionVersion !== session.version) return null;
  return user;
}

/** Pages and server actions: no session → sign-in page; wrong role → 403 page. */
export async function requireUser(roles?: readonly Role[]): Promise<SessionUser> {
  const user = await currentUser();
  if (!user) redirect('/login');
  if (roles && !roles.includes(user.role)) forbidden();
  return user;
}
