import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import Redis from 'ioredis';
import { RateLimiterRes } from 'rate-limiter-flexible';
import { rateLimiterOnRedis } from '@/lib/auth/rate-limit-store';
import { closeRedis, redis } from '@/lib/redis';
import { TestRedis } from '../support/redis-server';

/** The limits singleton (lib/auth/rate-limit.ts), dropped so the next call reads REDIS_URL afresh. */
const g = globalThis as unknown as { __clackwaterLimits?: unknown };

const server = new TestRedis();
const clients: Redis[] = [];
/** What one app instance holds: its own connection and its own limiter object, on the shared Redis. */
const instance = (points: number, duration: number, keyPrefix = 'post-account') => {
  const client = new Redis(server.url, { enableOfflineQueue: false, maxRetriesPerRequest: 1 });
  client.on('error', () => {});
  clients.push(client);
  return { client, limiter: rateLimiterOnRedis({ points, duration, keyPrefix, client }) };
};
const ready = (c: Redis) => new Promise<void>((r) => (c.status === 'ready' ? r() : c.once('ready', () => r())));

describe('rate limits on Redis hold across app instances (REDIS_URL)', () => {
  beforeAll(async () => {
    await server.start();
    process.env.REDIS_URL = server.url;
    g.__clackwaterLimits = undefined;
  });
  afterAll(async () => {
    try {
      delete process.env.REDIS_URL;
      g.__clackwaterLimits = undefined;
      for (const c of clients) c.disconnect();
      await closeRedis();
    } finally {
      await server.stop();
    }
  });

  it('counts one key once across two instances and refuses past the limit on either', async () => {
    const a = instance(5, 60);
    const b = instance(5, 60);
    await Promise.all([ready(a.client), ready(b.client)]);
    for (const l of [a, a, a, b, b]) await l.limiter.consume('member:7');
    for (const l of [a, b]) {
      const refused = await l.limiter.consume('member:7').then(
        () => null,
        (e: unknown) => e,
      );
      expect(refused).toBeInstanceOf(RateLimiterRes);
      expect((refused as RateLimiterRes).msBeforeNext).toBeGreaterThan(0);
    }
    await expect(b.limiter.consume('member:8')).resolves.toMatchObject({ remainingPoints: 4 });
    // given back on one instance, spendable on the other (the two refused tries counted too: 7 spent); forgotten on delete
    await a.limiter.reward('member:7', 3);
    await expect(b.limiter.consume('member:7')).resolves.toMatchObject({ remainingPoints: 0 });
    await a.limiter.delete('member:7');
    await expect(b.limiter.get('member:7')).resolves.toBeNull();
  });

  it("the app's sign-in limits count in Redis when REDIS_URL is set", async () => {
    const { spend, forgive } = await import('@/lib/auth/rate-limit');
    await ready(redis()!);
    // 5 tries per account per 15 minutes (lib/auth/rate-limit.ts signInAccount; common practice, no source)
    for (let i = 0; i < 5; i++) expect(await spend([['signInAccount', 'Someone@Example.test']])).toEqual({ ok: true });
    expect(await spend([['signInAccount', 'someone@example.test']])).toMatchObject({ ok: false });
    const spy = instance(1, 1).client;
    await ready(spy);
    // the count is Redis's, where every instance reads it (5 spent, the refused 6th counted too)
    expect(Number(await spy.get('cw-rl:signin-account:someone@example.test'))).toBe(6);
    await forgive('signInAccount', 'someone@example.test');
    expect(await spy.exists('cw-rl:signin-account:someone@example.test')).toBe(0);
  });

  it('with Redis down, limits fall back to this process at once and requests do not wait', async () => {
    const { spend } = await import('@/lib/auth/rate-limit');
    await server.stop();
    const t0 = Date.now();
    for (let i = 0; i < 10; i++) expect(await spend([['signInIp', '192.0.2.10']])).toEqual({ ok: true });
    // ten attempts with Redis gone: each answered from memory, not after a timeout (common practice, no source)
    expect(Date.now() - t0).toBeLessThan(1_000);
    // the in-memory insurance still limits: 30 per address per 15 minutes (lib/auth/rate-limit.ts signInIp)
    for (let i = 0; i < 20; i++) await spend([['signInIp', '192.0.2.10']]);
    expect(await spend([['signInIp', '192.0.2.10']])).toMatchObject({ ok: false });
    await server.start();
  });
});
