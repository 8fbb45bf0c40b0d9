import 'server-only';
import { getSession } from '../session';

/** Ends the session: the sealed cookie is cleared, so the next request is signed out. */
export async function signOut(): Promise<void> {
  const session = await getSession();
  session.destroy();
}
