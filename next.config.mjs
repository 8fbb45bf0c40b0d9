/** @type {import('next').NextConfig} */
const nextConfig = {
  reactStrictMode: true,
  poweredByHeader: false,
  // forbidden() renders app/forbidden.tsx with a 403 status.
  experimental: { authInterrupts: true, serverActions: { bodySizeLimit: '2mb' } },
  serverExternalPackages: ['pg', 'nodemailer', 'pdf-lib', 'graphile-worker'],
};

export default nextConfig;
