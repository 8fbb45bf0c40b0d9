import 'server-only';
import { bumpSessionVersion } from '@/db/queries/users';
import { getSession } from '../session';

/**
 * Ends the session for real: the user's session version moves on, so this cookie, a copy of it and
 * every other device of the same person are signed out; then the cookie is cleared.
 */
export async function signOut(): Promise<void> {
  const session = await getSession();
  if (session.userId) await bumpSessionVersion(session.userId);
  session.destroy();
}
