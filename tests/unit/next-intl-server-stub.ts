// next-intl's server functions resolve to their client build outside Next's react-server bundle
// (they throw "not supported in Client Components"), so the tests that call server actions and pages
// directly get this stand-in: the same catalogues through use-intl's core translator, in the
// locale of the request's hm-locale cookie when the test gives one, English otherwise.
import { createTranslator } from 'use-intl/core';
import { DEFAULT_LOCALE, LOCALE_COOKIE, parseLocale, type Locale } from '@/lib/i18n/locales';
import { MESSAGES } from '@/lib/i18n/messages';

async function cookieLocale(): Promise<Locale> {
  try {
    const { cookies } = await import('next/headers');
    return parseLocale((await cookies()).get(LOCALE_COOKIE)?.value) ?? DEFAULT_LOCALE;
  } catch {
    return DEFAULT_LOCALE; // no request scope and no mock: the fallback language
  }
}

export async function getLocale(): Promise<Locale> {
  return cookieLocale();
}

export async function getTranslations(arg?: string | { locale?: string; namespace?: string }) {
  const namespace = typeof arg === 'string' ? arg : arg?.namespace;
  const locale = (typeof arg === 'object' && parseLocale(arg.locale)) || (await cookieLocale());
  return createTranslator({ locale, messages: MESSAGES[locale], namespace: namespace as never });
}

export function getRequestConfig<T>(make: T): T {
  return make;
}
