/**
 * Pages get their Content-Security-Policy (with a per-request nonce or hashes) and
 * HSTS from proxy.ts; API answers are data, never a document to run, so they allow
 * nothing at all. Two CSP headers on one response would both apply, so pages get none here.
 */
const apiCsp = "default-src 'none'; frame-ancestors 'none'";

const securityHeaders = [
  { key: 'X-Content-Type-Options', value: 'nosniff' },
  { key: 'Referrer-Policy', value: 'strict-origin-when-cross-origin' },
  { key: 'X-Frame-Options', value: 'DENY' },
  { key: 'Permissions-Policy', value: 'camera=(), microphone=(), geolocation=()' },
];

/** @type {import('next').NextConfig} */
const nextConfig = {
  reactStrictMode: true,
  poweredByHeader: false,
  // ANALYZE=1 writes browser source maps, so bench/chunk-sources.ts can say what each chunk holds
  productionBrowserSourceMaps: process.env.ANALYZE === '1',
  // Sequelize loads its dialect at run time; keep it and the driver out of the bundle.
  // The e-mail renderer uses react-dom/server, which the server-component bundle refuses.
  serverExternalPackages: [
    'sequelize',
    'mariadb',
    '@react-email/render',
    '@react-email/components',
    'nodemailer',
    'node-cron',
    '@aws-sdk/client-s3',
  ],
  typedRoutes: false,
  async headers() {
    return [
      { source: '/:path*', headers: securityHeaders },
      { source: '/api/:path*', headers: [{ key: 'Content-Security-Policy', value: apiCsp }] },
    ];
  },
};

export default nextConfig;
