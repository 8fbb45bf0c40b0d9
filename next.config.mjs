import withSerwistInit from '@serwist/next';
import createNextIntlPlugin from 'next-intl/plugin';

// English and Spanish: the reader's language from the hm-locale cookie (see docs/i18n.md).
const withNextIntl = createNextIntlPlugin('./lib/server/i18n/request.ts');

// The service worker (app/sw.ts → public/sw.js). Built by webpack: `next build --webpack`
// (Serwist's Next plugin does not run under Turbopack). Off in `next dev`.
const withSerwist = withSerwistInit({
  swSrc: 'app/sw.ts',
  swDest: 'public/sw.js',
  cacheOnNavigation: true,
  reloadOnOnline: false,
  // off in `next dev` and under Turbopack (no worker then; the build scripts use webpack)
  disable: process.env.NODE_ENV !== 'production' || Boolean(process.env.TURBOPACK),
});

/** @type {import('next').NextConfig} */
const nextConfig = {
  reactStrictMode: true,
  poweredByHeader: false,
  // forbidden() renders app/forbidden.tsx with a 403 status. inlineCss: the 6 KB style sheet goes
  // in the HTML instead of a render-blocking request after it (bench:lcp showed first paint
  // waiting for it on the gate and the yard; the CSP already allows inline styles).
  experimental: { authInterrupts: true, inlineCss: true, serverActions: { bodySizeLimit: '2mb' } },
  serverExternalPackages: ['pg', 'nodemailer', 'pdf-lib', 'graphile-worker'],
  // Static files skip proxy.ts (which sets the full set with the CSP nonce): they get these.
  async headers() {
    return [
      {
        source: '/_next/static/:path*',
        headers: [
          { key: 'X-Content-Type-Options', value: 'nosniff' },
          { key: 'Referrer-Policy', value: 'same-origin' },
        ],
      },
    ];
  },
};

export default withSerwist(withNextIntl(nextConfig));
