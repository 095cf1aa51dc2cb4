/**
 * Pages get their Content-Security-Policy (with a per-request nonce or hashes) and
 * HSTS from proxy.ts; API answers are data, never a document to run, so they allow
 * nothing at all. Two CSP headers on one response would both apply, so pages get none here.
 */
import { fileURLToPath } from 'node:url';

const apiCsp = "default-src 'none'; frame-ancestors 'none'";

const securityHeaders = [
  { key: 'X-Content-Type-Options', value: 'nosniff' },
  { key: 'Referrer-Policy', value: 'strict-origin-when-cross-origin' },
  { key: 'X-Frame-Options', value: 'DENY' },
  { key: 'Permissions-Policy', value: 'camera=(), microphone=(), geolocation=()' },
];

/**
 * Public pages that read no session: the service worker (app/sw.ts) may keep them for
 * offline use. Next marks every page rendered per request `private, no-store`, so this
 * mark is how the app says a page is the same for everyone. Never add a member's page.
 */
const offlinePublic = [{ key: 'Clackwater-Offline', value: 'public' }];
const offlinePages = [
  '/guides',
  '/guides/:path*',
  '/calculators',
  '/calculators/:path*',
  '/plan',
  '/field-kit',
  '/field-kit/:path*',
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
  // With REDIS_URL, Next's page cache (the thread pages) lives in Redis for every instance,
  // so a write marks a page stale on all of them at once (scripts/redis-cache-handler.mjs);
  // without it, Next's default (each instance's disk and memory). Read when the server starts.
  cacheHandler: process.env.REDIS_URL
    ? fileURLToPath(new URL('./scripts/redis-cache-handler.mjs', import.meta.url))
    : undefined,
  async headers() {
    return [
      { source: '/:path*', headers: securityHeaders },
      { source: '/api/:path*', headers: [{ key: 'Content-Security-Policy', value: apiCsp }] },
      // a calculator opened from a member's site (?site=) shows that site: never marked
      ...offlinePages.map((source) => ({ source, missing: [{ type: 'query', key: 'site' }], headers: offlinePublic })),
      // the worker must always be fetched fresh so a new build reaches readers
      { source: '/sw.js', headers: [{ key: 'Cache-Control', value: 'no-cache' }] },
    ];
  },
};

export default nextConfig;
