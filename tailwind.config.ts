import type { Config } from 'tailwindcss';

// Design tokens. The gate is used outdoors, in gloves, rain and dark: large type, 48 px+ touch
// targets, high-contrast colours in a light and a night theme (WCAG 2.2 AA: 4.5:1 text, 3:1 shapes).
const config: Config = {
  content: ['./app/**/*.{ts,tsx}', './lib/**/*.{ts,tsx}'],
  theme: {
    extend: {
      // Every colour is a CSS variable set in app/globals.css for the light and the night theme;
      // tests/unit/theme/contrast.test.ts checks the pairs the screens use in both.
      colors: {
        ink: { DEFAULT: 'var(--hm-ink)', soft: 'var(--hm-ink-soft)', faint: 'var(--hm-ink-faint)' },
        paper: { DEFAULT: 'var(--hm-paper)', dim: 'var(--hm-paper-dim)', line: 'var(--hm-paper-line)' },
        brand: { DEFAULT: 'var(--hm-brand)', dark: 'var(--hm-brand-dark)', light: 'var(--hm-brand-light)' },
        // text and icons drawn on a filled brand/ok/warn/danger/hold background
        'on-fill': 'var(--hm-on-fill)',
        ok: { DEFAULT: 'var(--hm-ok)', bg: 'var(--hm-ok-bg)' },
        warn: { DEFAULT: 'var(--hm-warn)', bg: 'var(--hm-warn-bg)' },
        danger: { DEFAULT: 'var(--hm-danger)', bg: 'var(--hm-danger-bg)' },
        hold: { DEFAULT: 'var(--hm-hold)', bg: 'var(--hm-hold-bg)' },
        // a loaded reefer whose unit is not running
        off: { DEFAULT: 'var(--hm-off)', bg: 'var(--hm-off-bg)' },
      },
      fontFamily: { sans: ['var(--font-hitchmark)', 'system-ui', 'sans-serif'] },
      fontSize: {
        'gate-sm': ['1rem', { lineHeight: '1.5rem' }],
        gate: ['1.125rem', { lineHeight: '1.75rem' }],
        'gate-lg': ['1.375rem', { lineHeight: '2rem' }],
        'gate-xl': ['1.875rem', { lineHeight: '2.25rem' }],
      },
      spacing: { tap: '3rem', 'tap-lg': '3.5rem' },
      minHeight: { tap: '3rem', 'tap-lg': '3.5rem' },
      minWidth: { tap: '3rem' },
    },
  },
};

export default config;
