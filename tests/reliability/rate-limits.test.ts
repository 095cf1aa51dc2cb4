import { beforeAll, describe, expect, it } from 'vitest';
import { RateLimiterRes } from 'rate-limiter-flexible';
import { QueryTypes } from 'sequelize';
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

  it('clears expired rows every time without keeping a pooled connection (the pool stays usable)', async () => {
    const sequelize = createSequelize();
    const max = (sequelize.connectionManager as unknown as { config: { pool?: { max?: number } } }).config.pool?.max;
    const a = new RateLimiterMariaDB({ points: 1, duration: 60, keyPrefix: 'cleanup', sequelize });
    await a.consume('gone');
    await sequelize.query("UPDATE rate_limits SET expire = 1 WHERE `key` = 'cleanup:gone'");
    // more cleanups than the pool has connections: a cleanup that kept its connection would stall the last ones
    const rounds = (max ?? 10) + 2;
    const inTime = async (p: Promise<void>) =>
      Promise.race([p.then(() => 'done'), new Promise((r) => setTimeout(() => r('stalled'), 3000))]);
    for (let i = 0; i < rounds; i++) expect(await inTime(a.clearExpired(Date.now()))).toBe('done');
    const rows = await sequelize.query<{ n: number }>(
      "SELECT COUNT(*) AS n FROM rate_limits WHERE `key` = 'cleanup:gone'",
      { type: QueryTypes.SELECT },
    );
    expect(Number(rows[0]!.n)).toBe(0);
    await expect(sequelize.query('SELECT 1 AS one', { type: QueryTypes.SELECT })).resolves.toEqual([{ one: 1 }]);
    await sequelize.close();
  });
});
