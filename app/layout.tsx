import type { Metadata, Viewport } from 'next';
import { cookies } from 'next/headers';
import { connection } from 'next/server';
import { NextIntlClientProvider } from 'next-intl';
import { getLocale } from 'next-intl/server';
import { parseTheme, THEME_COOKIE, themeAttribute } from '@/lib/theme/theme';
import { hitchmarkFont } from './fonts';
import './globals.css';

export const metadata: Metadata = {
  title: { default: 'Hitchmark', template: '%s · Hitchmark' },
  description: 'Trailer handoffs, holds, yard board and damage cases for a reefer terminal.',
};

export const viewport: Viewport = {
  width: 'device-width',
  initialScale: 1,
  themeColor: [
    { media: '(prefers-color-scheme: light)', color: '#0b5c8a' },
    { media: '(prefers-color-scheme: dark)', color: '#0b0f14' },
  ],
};

export default async function RootLayout({ children }: { children: React.ReactNode }) {
  // Every page renders per request: its scripts carry the nonce of that response's CSP (proxy.ts).
  await connection();
  // The theme switch's cookie, rendered on <html> by the server so a night page never flashes white.
  const theme = parseTheme((await cookies()).get(THEME_COOKIE)?.value);
  const locale = await getLocale();
  return (
    <html lang={locale} className={hitchmarkFont.variable} data-theme={themeAttribute(theme)}>
      <body className="min-h-screen">
        <NextIntlClientProvider>{children}</NextIntlClientProvider>
      </body>
    </html>
  );
}
