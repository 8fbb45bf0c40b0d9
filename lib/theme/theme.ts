/** The screen theme a person chose: follow the phone ("auto"), or always day or night. */
export const THEMES = ['auto', 'light', 'dark'] as const;
export type Theme = (typeof THEMES)[number];

/** The cookie that remembers the choice on this phone, read by the root layout before rendering. */
export const THEME_COOKIE = 'hm-theme';

export function parseTheme(value: string | undefined): Theme {
  return (THEMES as readonly string[]).includes(value ?? '') ? (value as Theme) : 'auto';
}

/** The data-theme attribute for <html>: none on "auto", so the CSS media query decides. */
export function themeAttribute(theme: Theme): 'light' | 'dark' | undefined {
  return theme === 'auto' ? undefined : theme;
}
