import { defineConfig } from 'vitest/config';
import { fileURLToPath } from 'node:url';
import path from 'node:path';
import { ports } from './tests/cluster/ports';

const root = fileURLToPath(new URL('.', import.meta.url)).replace(/\/$/, '');

/**
 * `npm run test:cluster`: tests/cluster against the servers scripts/cluster.sh starts
 * (after a build). The test process itself talks to the cluster's primary.
 */
export default defineConfig({
  resolve: {
    alias: { '@': root, 'server-only': 'next/dist/compiled/server-only/empty.js' },
  },
  test: {
    include: ['tests/cluster/**/*.test.ts'],
    environment: 'node',
    env: {
      CLACKWATER_ENV: 'test',
      MAIL_WORKER: 'off',
      DB_PORT: String(ports.db),
      DB_DATA_DIR: path.join(root, '.data/cluster/mariadb-primary'),
      NEXTAUTH_SECRET: 'vitest-only-secret-not-for-use-anywhere-else',
      SITE_URL: `http://127.0.0.1:${ports.balancer}`,
      NEXTAUTH_URL: `http://127.0.0.1:${ports.balancer}`,
    },
    fileParallelism: false,
    testTimeout: 60_000,
    hookTimeout: 300_000,
  },
});
