import { defineConfig } from 'vitest/config';
import { fileURLToPath } from 'node:url';
import path from 'node:path';

const root = fileURLToPath(new URL('.', import.meta.url)).replace(/\/$/, '');
// as tests/cluster/ports.ts counts them: the balancer on the base port, the primary on base + 3
const base = Number(process.env.CLUSTER_BASE_PORT ?? 3700);

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
      DB_PORT: String(base + 3),
      DB_DATA_DIR: path.join(root, '.data/cluster/mariadb-primary'),
      NEXTAUTH_SECRET: 'vitest-only-secret-not-for-use-anywhere-else',
      SITE_URL: `http://127.0.0.1:${base}`,
      NEXTAUTH_URL: `http://127.0.0.1:${base}`,
    },
    fileParallelism: false,
    testTimeout: 60_000,
    hookTimeout: 300_000,
  },
});
