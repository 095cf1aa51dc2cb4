import { beforeAll, describe, expect, it } from 'vitest';
import { RateLimiterRes } from 'rate-limiter-flexible';
import { createSequelize } from '@/lib/db';
import { RateLimiterMariaDB } from '@/lib/auth/rate-limit-store';
import { freshDemoDatabase } from '../support/db';

/** What one app instance holds: its own pool and its own limiter object, on the shared database. */
const instance = (points: number, duration: number) =>
  new RateLimiterMariaDB({ points, duration, keyPrefix: 'post-account', sequelize: createSequelize() });

describe('flood limits hold across app instances sharing MariaDB (RATE_LIMIT_STORE=mariadb)', () => {
  beforeAll(freshDemoDatabase);

  it('counts one key once across two instances and refuses past the limit on either', async () => {
    const a = instance(5, 60);
    const b = instance(5, 60);
    for (const l of [a, a, a, b, b]) await l.consume('member:7');
    for (const l of [a, b]) {
      const refused = await l.consume('member:7').then(
        () => null,
        (e: unknown) => e,
      );
      expect(refused).toBeInstanceOf(RateLimiterRes);
      expect((refused as RateLimiterRes).msBeforeNext).toBeGreaterThan(0);
    }
    // another key is counted on its own
    await expect(b.consume('member:8')).resolves.toMatchObject({ remainingPoints: 4 });
  });

  it('starts a new window when the old one expires, and forgets a key on delete', async () => {
    const a = instance(2, 1);
    const b = instance(2, 1);
    await a.consume('ip:10.0.0.1');
    await b.consume('ip:10.0.0.1');
    await expect(a.consume('ip:10.0.0.1')).rejects.toBeInstanceOf(RateLimiterRes);
    await new Promise((r) => setTimeout(r, 1100));
    await expect(b.consume('ip:10.0.0.1')).resolves.toMatchObject({ remainingPoints: 1 });
    await a.delete('ip:10.0.0.1');
    await expect(b.get('ip:10.0.0.1')).resolves.toBeNull();
  });
});
