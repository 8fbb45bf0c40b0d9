import { cookies } from 'next/headers';
import { getRequestConfig } from 'next-intl/server';
import { DEFAULT_LOCALE, LOCALE_COOKIE, parseLocale, type Locale } from '@/lib/i18n/locales';
import { MESSAGES } from '@/lib/i18n/messages';

/** The reader's language is the one kept in the hm-locale cookie (set at sign-in); no locale in URLs. */
export async function requestLocale(): Promise<Locale> {
  return parseLocale((await cookies()).get(LOCALE_COOKIE)?.value) ?? DEFAULT_LOCALE;
}

// next-intl reads this for every request (next.config.mjs points its plugin here).
export default getRequestConfig(async () => {
  const locale = await requestLocale();
  return { locale, messages: MESSAGES[locale] };
});
