import type { Config } from 'tailwindcss';

// Design tokens. The gate is used outdoors, in gloves, rain and dark: large type, 48 px+ touch
// targets, high-contrast colours (text on these backgrounds meets WCAG AA 4.5:1).
const config: Config = {
  content: ['./app/**/*.{ts,tsx}', './lib/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: {
        ink: { DEFAULT: '#111827', soft: '#374151', faint: '#6b7280' },
        paper: { DEFAULT: '#ffffff', dim: '#f3f4f6', line: '#d1d5db' },
        brand: { DEFAULT: '#0b5c8a', dark: '#083f60', light: '#e0f0fa' },
        ok: { DEFAULT: '#166534', bg: '#dcfce7' },
        warn: { DEFAULT: '#854d0e', bg: '#fef3c7' },
        danger: { DEFAULT: '#b91c1c', bg: '#fee2e2' },
        hold: { DEFAULT: '#7c2d12', bg: '#ffedd5' },
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
