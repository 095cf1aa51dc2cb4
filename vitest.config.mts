import { defineConfig } from 'vitest/config';
import { fileURLToPath } from 'node:url';

export default defineConfig({
  resolve: {
    alias: {
      '@': fileURLToPath(new URL('.', import.meta.url)).replace(/\/$/, ''),
      // Next resolves 'server-only' in its bundles (an error in a client one); tests are server code
      'server-only': 'next/dist/compiled/server-only/empty.js',
    },
  },
  test: {
    include: ['tests/{unit,hydraulics,integration,reliability}/**/*.test.{ts,tsx}'],
    environment: 'node',
    // Never the development database: settings default to the test server (scripts/env.sh).
    env: {
      CLACKWATER_ENV: 'test',
      MAIL_WORKER: 'off',
      SMTP_PORT: process.env.VITEST_SMTP_PORT ?? '2525',
      NEXTAUTH_SECRET: 'vitest-only-secret-not-for-use-anywhere-else',
      SITE_URL: 'http://127.0.0.1:3100',
      NEXTAUTH_URL: 'http://127.0.0.1:3100',
    },
    // integration tests share one MariaDB database: run files one at a time
    fileParallelism: false,
    testTimeout: 30_000,
    hookTimeout: 60_000,
    benchmark: { include: ['bench/**/*.bench.ts'] },
  },
});
