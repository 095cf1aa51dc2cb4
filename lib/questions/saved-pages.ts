import { rmSync } from 'node:fs';
import { join } from 'node:path';

/**
 * Thread pages the server keeps (ISR) are also written under .next, and outlive a
 * restart. After the database is replaced under them (a test reset, a restore) the
 * same question numbers hold other threads, so those saved pages are dropped; a
 * server started afterwards renders each page afresh.
 */
export function forgetSavedPages(root = process.cwd()): void {
  rmSync(join(root, '.next', 'server', 'route-cache'), { recursive: true, force: true });
}
