import type { Metadata, Viewport } from 'next';
import { connection } from 'next/server';
import { hitchmarkFont } from './fonts';
import './globals.css';

export const metadata: Metadata = {
  title: { default: 'Hitchmark', template: '%s · Hitchmark' },
  description: 'Trailer handoffs, holds, yard board and damage cases for a reefer terminal.',
};

export const viewport: Viewport = { width: 'device-width', initialScale: 1, themeColor: '#0b5c8a' };

export default async function RootLayout({ children }: { children: React.ReactNode }) {
  // Every page renders per request: its scripts carry the nonce of that response's CSP (proxy.ts).
  await connection();
  return (
    <html lang="en" className={hitchmarkFont.variable}>
      <body className="min-h-screen">{children}</body>
    </html>
  );
}
