'use client';

import { useState } from 'react';
import { THEME_COOKIE, themeAttribute, type Theme } from '@/lib/theme/theme';

const LABELS: Record<Theme, string> = { auto: 'Auto', light: 'Day', dark: 'Night' };

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
  const [theme, setTheme] = useState<Theme>(initial);
  function choose(next: Theme) {
    setTheme(next);
    applyTheme(next);
  }
  return (
    <div role="group" aria-label="Screen" className={`flex gap-1 ${className}`}>
      {(Object.keys(LABELS) as Theme[]).map((t) => (
        <button
          key={t}
          type="button"
          aria-pressed={theme === t}
          onClick={() => choose(t)}
          className={`min-h-tap min-w-tap rounded-lg border-2 border-current px-2 text-gate-sm font-bold ${onFill ? 'aria-pressed:bg-paper aria-pressed:text-brand' : 'text-brand aria-pressed:border-brand aria-pressed:bg-brand aria-pressed:text-on-fill'}`}
        >
          {LABELS[t]}
        </button>
      ))}
    </div>
  );
}
