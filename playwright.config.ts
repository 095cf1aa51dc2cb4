import { defineConfig } from '@playwright/test';

const port = Number(process.env.E2E_PORT ?? 3100);
/** The browser tests' own SMTP catcher (tests/support/smtp-catcher.ts) listens here. */
export const E2E_SMTP_PORT = Number(process.env.E2E_SMTP_PORT ?? 2526);
const origin = `http://127.0.0.1:${port}`;

/** Chromium flags for a closed network, as root, headless. */
export const CHROMIUM_ARGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

/**
 * What the app under test runs with (a second instance in tests/e2e/two-instances.spec.ts
 * uses the same): its own SMTP catcher, and rate limits kept in MariaDB so they hold
 * across instances.
 */
export function serverEnv(at: string): Record<string, string> {
  return {
    ...(process.env as Record<string, string>),
    SMTP_HOST: '127.0.0.1',
    SMTP_PORT: String(E2E_SMTP_PORT),
    NEXTAUTH_URL: at,
    SITE_URL: at,
    RATE_LIMIT_STORE: 'mariadb',
  };
}

/** Specs that check the server rather than the screen: run once, in the desktop project. */
const PHONE_SKIPS = [
  'two-instances.spec.ts',
  'csp.spec.ts',
  'hostile-input.spec.ts',
  'security-auth.spec.ts',
  'mail.spec.ts',
  'thread-cache.spec.ts',
  'units-everywhere.spec.ts',
  // the unit preference lives on the server and its test opens its own desktop browsers
  'units-preference.spec.ts',
].map((f) => `**/${f}`);

export default defineConfig({
  testDir: 'tests/e2e',
  fullyParallel: false,
  workers: 1,
  retries: 0,
  reporter: [['list']],
  timeout: 30_000,
  use: {
    baseURL: process.env.E2E_BASE_URL ?? origin,
    launchOptions: { executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium', args: CHROMIUM_ARGS },
    trace: 'off',
  },
  projects: [
    // `@phone-only`: a test of the phone's screen itself (nothing wider than 390 px)
    {
      name: 'desktop',
      use: { viewport: { width: 1280, height: 900 } },
      grepInvert: /@phone-only/,
    },
    {
      // a common phone's CSS viewport (390 × 844 at 3× density), touched rather than clicked
      name: 'phone',
      use: { viewport: { width: 390, height: 844 }, deviceScaleFactor: 3, isMobile: true, hasTouch: true },
      // the main journeys run here too; what depends on the server rather than the screen
      // (two instances, headers, hostile input, sign-in limits, mail, the page cache) and the
      // units check (the same words at any width) run once, on desktop
      testIgnore: PHONE_SKIPS,
      // single tests a spec marks as needing no second screen
      grepInvert: /@desktop-only/,
    },
  ],
  // scripts/test.sh builds the app first; this only serves the build.
  webServer: process.env.E2E_BASE_URL
    ? undefined
    : {
        // the production server (scripts/server.mjs), which appends the peer address as a proxy does
        command: `node scripts/server.mjs -p ${port} -H 127.0.0.1`,
        url: `http://127.0.0.1:${port}/api/health`,
        reuseExistingServer: false,
        timeout: 60_000,
        stdout: 'ignore',
        stderr: 'pipe',
        env: serverEnv(origin),
      },
});
