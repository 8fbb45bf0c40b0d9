'use server';

import { getSession } from '@/lib/server/session';
import { saveLocale } from './locale';

/** The language switch's action: keeps the choice in the cookie and, when signed in, on the account. */
export async function chooseLocaleAction(locale: string): Promise<{ ok: boolean }> {
  const session = await getSession();
  return { ok: (await saveLocale(locale, session.userId)) !== null };
}
