// The reader's language follows the account: chosen at sign-in or in the header, it is kept on
// users.locale and in the hm-locale cookie; after sign-in the cookie follows the account.
import 'server-only';
import { cookies } from 'next/headers';
import { setUserLocale } from '@/db/queries/users';
import { LOCALE_COOKIE, parseLocale, type Locale } from '@/lib/i18n/locales';

const YEAR_SECONDS = 31_536_000;

async function setLocaleCookie(locale: Locale): Promise<void> {
  (await cookies()).set(LOCALE_COOKIE, locale, { path: '/', maxAge: YEAR_SECONDS, sameSite: 'lax' });
}

/**
 * At sign-in: a language chosen on the sign-in page (the cookie) is saved on the account; with no
 * choice on this phone, the cookie takes the account's language. Answers the language in force.
 */
export async function settleLocaleAtSignIn(user: { id: string; locale: string }): Promise<Locale> {
  const chosen = parseLocale((await cookies()).get(LOCALE_COOKIE)?.value);
  const account = parseLocale(user.locale);
  if (chosen) {
    if (chosen !== account) await setUserLocale(user.id, chosen);
    return chosen;
  }
  const locale = account ?? 'en';
  await setLocaleCookie(locale);
  return locale;
}

/** A language picked in the header (or on the sign-in page): the cookie, and the account when signed in. */
export async function saveLocale(raw: unknown, userId: string | undefined): Promise<Locale | null> {
  const locale = parseLocale(typeof raw === 'string' ? raw : null);
  if (!locale) return null;
  await setLocaleCookie(locale);
  if (userId) await setUserLocale(userId, locale);
  return locale;
}
