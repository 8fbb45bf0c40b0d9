/** The languages Hitchmark speaks. English is the fallback for anyone who has not chosen. */
export const LOCALES = ['en', 'es'] as const;
export type Locale = (typeof LOCALES)[number];
export const DEFAULT_LOCALE: Locale = 'en';

/** Chosen on the sign-in page (or in the header) and kept on this phone for a year. */
export const LOCALE_COOKIE = 'hm-locale';

/** Each language named in itself, so a driver finds their own on a screen they cannot read. */
export const LOCALE_NAMES: Record<Locale, string> = { en: 'English', es: 'Español' };

export function parseLocale(value: string | null | undefined): Locale | null {
  return (LOCALES as readonly string[]).includes(value ?? '') ? (value as Locale) : null;
}
