'use client';

import { useLocale, useTranslations } from 'next-intl';
import { useRouter } from 'next/navigation';
import { useTransition } from 'react';
import { LOCALE_COOKIE, LOCALE_NAMES, LOCALES, type Locale } from '@/lib/i18n/locales';
import { chooseLocaleAction } from '@/lib/server/i18n/actions';

function rememberLocale(locale: Locale) {
  document.cookie = `${LOCALE_COOKIE}=${locale}; path=/; max-age=31536000; samesite=lax`;
}

/** English / Español, each written in its own language; the page re-renders in the one chosen. */
export function LanguageSwitch({ onFill = false, className = '' }: { onFill?: boolean; className?: string }) {
  const t = useTranslations('Language');
  const current = useLocale();
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  return (
    <div role="group" aria-label={t('label')} className={`flex gap-1 ${className}`}>
      {LOCALES.map((l) => (
        <button
          key={l}
          type="button"
          lang={l}
          aria-pressed={current === l}
          disabled={pending}
          onClick={() => {
            rememberLocale(l);
            // kept on the account too when signed in (the cookie alone works without signal)
            startTransition(async () => {
              await chooseLocaleAction(l).catch(() => null);
              router.refresh();
            });
          }}
          className={`min-h-tap min-w-tap rounded-lg border-2 border-current px-2 text-gate-sm font-bold ${onFill ? 'aria-pressed:bg-paper aria-pressed:text-brand' : 'text-brand aria-pressed:border-brand aria-pressed:bg-brand aria-pressed:text-on-fill'}`}
        >
          {LOCALE_NAMES[l]}
        </button>
      ))}
    </div>
  );
}
