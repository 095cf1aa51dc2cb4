const dev = process.env.NODE_ENV !== 'production';

/**
 * Content-Security-Policy that fits Next and KaTeX: scripts from this origin (Next's
 * inline bootstrap needs 'unsafe-inline'; dev's hot reload also needs 'unsafe-eval'),
 * KaTeX's inline styles, fonts and images from this origin only, no framing.
 */
const csp = [
  "default-src 'self'",
  `script-src 'self' 'unsafe-inline'${dev ? " 'unsafe-eval'" : ''}`,
  "style-src 'self' 'unsafe-inline'",
  "img-src 'self' data: blob:",
  "font-src 'self' data:",
  `connect-src 'self'${dev ? ' ws:' : ''}`,
  "object-src 'none'",
  "base-uri 'self'",
  "form-action 'self'",
  "frame-ancestors 'none'",
].join('; ');

const securityHeaders = [
  { key: 'Content-Security-Policy', value: csp },
  { key: 'X-Content-Type-Options', value: 'nosniff' },
  { key: 'Referrer-Policy', value: 'strict-origin-when-cross-origin' },
  { key: 'X-Frame-Options', value: 'DENY' },
  { key: 'Permissions-Policy', value: 'camera=(), microphone=(), geolocation=()' },
];

/** @type {import('next').NextConfig} */
const nextConfig = {
  reactStrictMode: true,
  poweredByHeader: false,
  // Sequelize loads its dialect at run time; keep it and the driver out of the bundle.
  // The e-mail renderer uses react-dom/server, which the server-component bundle refuses.
  serverExternalPackages: ['sequelize', 'mariadb', '@react-email/render', '@react-email/components', 'nodemailer', 'node-cron', '@aws-sdk/client-s3'],
  typedRoutes: false,
  async headers() {
    return [{ source: '/:path*', headers: securityHeaders }];
  },
};

export default nextConfig;
