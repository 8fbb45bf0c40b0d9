'use client';

import { useTranslations } from 'next-intl';
import { useState } from 'react';
import { THEME_COOKIE, THEMES, themeAttribute, type Theme } from '@/lib/theme/theme';

function applyTheme(theme: Theme) {
  document.cookie = `${THEME_COOKIE}=${theme}; path=/; max-age=31536000; samesite=lax`;
  const attr = themeAttribute(theme);
  if (attr) document.documentElement.setAttribute('data-theme', attr);
  else document.documentElement.removeAttribute('data-theme');
}

/**
 * Day / night / follow the phone. The choice is kept in a cookie for a year, so the server
 * renders the next page in it straight away (no white flash at a dark gate).
 */
export function ThemeSwitch({
  initial,
  onFill = false,
  className = '',
}: {
  initial: Theme;
  /** drawn on the brand-coloured header rather than on paper */
  onFill?: boolean;
  className?: string;
}) {
  const t = useTranslations('Theme');
  const [theme, setTheme] = useState<Theme>(initial);
  function choose(next: Theme) {
    setTheme(next);
    applyTheme(next);
  }
  return (
    <div role="group" aria-label={t('label')} className={`flex gap-1 ${className}`}>
      {THEMES.map((option) => (
        <button
          key={option}
          type="button"
          aria-pressed={theme === option}
          onClick={() => choose(option)}
          className={`min-h-tap min-w-tap rounded-lg border-2 border-current px-2 text-gate-sm font-bold ${onFill ? 'aria-pressed:bg-paper aria-pressed:text-brand' : 'text-brand aria-pressed:border-brand aria-pressed:bg-brand aria-pressed:text-on-fill'}`}
        >
          {t(option)}
        </button>
      ))}
    </div>
  );
}
