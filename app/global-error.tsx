'use client';

import { LOCALE_COOKIE, parseLocale } from '@/lib/i18n/locales';
import enErrors from '@/lib/i18n/messages/en/Errors.json';
import esErrors from '@/lib/i18n/messages/es/Errors.json';

/** The root layout (and its translation provider) is gone here, so the language comes from the cookie. */
function chosenErrors() {
  const cookie = typeof document === 'undefined' ? '' : document.cookie;
  const value = cookie
    .split('; ')
    .find((c) => c.startsWith(`${LOCALE_COOKIE}=`))
    ?.split('=')[1];
  return parseLocale(value) === 'es' ? { lang: 'es', t: esErrors } : { lang: 'en', t: enErrors };
}

export default function GlobalError({
  error,
  reset,
}: {
  error: Error & { digest?: string };
  reset: () => void;
}) {
  const { lang, t } = chosenErrors();
  return (
    <html lang={lang}>
      <body style={{ fontFamily: 'system-ui', padding: 24 }}>
        <h1>{t.global}</h1>
        <p>{t.globalText}</p>
        <button type="button" onClick={() => reset()} style={{ minHeight: 48, padding: '0 20px' }}>
          {t.again}
        </button>
        {error.digest ? <p>{t.reference.replace('{digest}', error.digest)}</p> : null}
      </body>
    </html>
  );
}
