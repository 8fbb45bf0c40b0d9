// A translator for text written outside a request (e-mail, PDF): the recipient's language, not the
// reader's cookie. use-intl's core, as lib/i18n/reasons.ts uses, so the seed and jobs can load it.
import { createTranslator } from 'use-intl/core';
import { DEFAULT_LOCALE, parseLocale, type Locale } from './locales';
import { MESSAGES, type Messages } from './messages';

export type Translate = ((key: string, values?: Record<string, string | number>) => string) & {
  has: (key: string) => boolean;
};

const cache = new Map<string, Translate>();

/** The language to write in: `locale` when Hitchmark speaks it, else English. */
export function writingLocale(locale: string | null | undefined): Locale {
  return parseLocale(locale) ?? DEFAULT_LOCALE;
}

/** Messages of one namespace in `locale` (English for a language Hitchmark does not speak). */
export function translatorFor(locale: string | null | undefined, namespace: keyof Messages): Translate {
  const lang = writingLocale(locale);
  const key = `${lang}|${namespace}`;
  let t = cache.get(key);
  if (!t) {
    t = createTranslator({ locale: lang, messages: MESSAGES[lang], namespace }) as unknown as Translate;
    cache.set(key, t);
  }
  return t;
}
