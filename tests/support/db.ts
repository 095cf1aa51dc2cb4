import { execFileSync } from 'node:child_process';
import path from 'node:path';
import { getSequelize } from '@/lib/db';
import { resetDatabase } from './reset';

const ROOT = path.resolve(__dirname, '../..');

/** Stops or starts the embedded test MariaDB through the same script npm test uses. */
export function testDb(action: 'start' | 'stop') {
  execFileSync('bash', [path.join(ROOT, 'scripts/db.sh'), action], {
    env: { ...process.env, CLACKWATER_ENV: 'test' },
    stdio: 'pipe',
  });
}

export async function freshDemoDatabase() {
  await resetDatabase(getSequelize());
}
