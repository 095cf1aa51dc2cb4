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
  projects: [{ name: 'desktop', use: { viewport: { width: 1280, height: 900 } } }],
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
