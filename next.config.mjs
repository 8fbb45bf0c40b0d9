/** @type {import('next').NextConfig} */
const nextConfig = {
  reactStrictMode: true,
  poweredByHeader: false,
  // forbidden() renders app/forbidden.tsx with a 403 status.
  experimental: { authInterrupts: true, serverActions: { bodySizeLimit: '2mb' } },
  serverExternalPackages: ['pg', 'nodemailer', 'pdf-lib'],
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

export default nextConfig;
