import { execFile, spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { promisify } from 'node:util';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

/**
 * The two things that make several app instances agree through Redis, against a real
 * redis-server this test starts on its own port (REDIS_TEST_PORT, 6399 unless set):
 * - Next's page cache handler (scripts/redis-cache-handler.mjs): a page kept by one
 *   instance is read by another, and a revalidateTag on one (what a write's
 *   revalidatePath becomes) makes every other instance render the page afresh;
 * - the response cache's clear channel (scripts/response-cache-redis.mjs).
 * "Another instance" is a separate node process, so nothing in memory is shared.
 */
const PORT = Number(process.env.REDIS_TEST_PORT ?? 6399);
const URL_ = `redis://127.0.0.1:${PORT}`;
const ROOT = path.resolve(__dirname, '../..');
const HANDLER = path.join(ROOT, 'scripts/redis-cache-handler.mjs');
const hasRedis = spawnSync('redis-server', ['--version']).status === 0;
let redis: ChildProcess | null = null;
const run = promisify(execFile);

async function startRedis() {
  const dir = path.join(ROOT, '.data', `redis-test-${PORT}`);
  mkdirSync(dir, { recursive: true });
  redis = spawn(
    'redis-server',
    ['--port', String(PORT), '--bind', '127.0.0.1', '--save', '', '--appendonly', 'no', '--dir', dir],
    {
      stdio: 'ignore',
    },
  );
  for (let i = 0; i < 100; i++) {
    if (
      spawnSync('redis-cli', ['-p', String(PORT), 'ping'])
        .stdout?.toString()
        .trim() === 'PONG'
    )
      return;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`redis-server did not answer on ${PORT}`);
}

async function stopRedis() {
  if (!redis) return;
  const r = redis;
  redis = null;
  await new Promise((ok) => {
    r.once('exit', ok);
    r.kill('SIGTERM');
  });
}

/** What another instance's handler reads for `key`, in its own process. */
async function readElsewhere(key: string, ctx: object = { kind: 'APP_PAGE' }) {
  const code = `
    const { default: H } = await import(${JSON.stringify(HANDLER)});
    const e = await new H({}).get(${JSON.stringify(key)}, ${JSON.stringify(ctx)});
    const v = e?.value;
    console.log(JSON.stringify(e && { lastModified: e.lastModified, html: v.html,
      rsc: Buffer.isBuffer(v.rscData) ? v.rscData.toString() : null,
      segments: v.segmentData instanceof Map ? Object.fromEntries([...v.segmentData].map(([k, b]) => [k, b.toString()])) : null,
      revalidate: e.cacheControl?.revalidate }));
    process.exit(0);`;
  const { stdout } = await run('node', ['--input-type=module', '-e', code], {
    env: { ...process.env, REDIS_URL: URL_ },
    cwd: ROOT,
  });
  return JSON.parse(stdout.trim().split('\n').pop()!);
}

const page = (html: string) => ({
  kind: 'APP_PAGE',
  html,
  rscData: Buffer.from(`rsc of ${html}`),
  segmentData: new Map([['/_tree', Buffer.from('tree')]]),
  headers: { 'x-next-cache-tags': '_N_T_/layout,_N_T_/questions/[id]/page,_N_T_/questions/7' },
  status: 200,
  postponed: undefined,
});

describe.skipIf(!hasRedis)('Redis shared caches (redis-server on REDIS_TEST_PORT)', () => {
  let Handler: typeof import('../../scripts/redis-cache-handler.mjs').default;
  beforeAll(async () => {
    await startRedis();
    process.env.REDIS_URL = URL_;
    process.env.REDIS_CACHE_PREFIX = `test-${Date.now()}:`;
    ({ default: Handler } = await import('../../scripts/redis-cache-handler.mjs'));
  }, 30_000);
  afterAll(async () => {
    const c = (globalThis as Record<symbol, { redis: { disconnect(): void } } | undefined>)[
      Symbol.for('clackwater.nextCacheRedis')
    ];
    c?.redis.disconnect();
    await stopRedis();
  });

  it('a page kept by one instance is read whole by another, then marked stale for it by a write on the first', async () => {
    const a = new Handler({});
    const key = '/questions/7';
    await a.set(key, page('<p>before</p>'), { cacheControl: { revalidate: 60, expire: undefined } });
    const seen = await readElsewhere(key);
    expect(seen).toMatchObject({
      html: '<p>before</p>',
      rsc: 'rsc of <p>before</p>',
      segments: { '/_tree': 'tree' },
      revalidate: 60,
    });
    // what revalidatePath('/questions/7') asks of the handler (no profile: expire now)
    await new Promise((r) => setTimeout(r, 5));
    await a.revalidateTag(['_N_T_/questions/7']);
    expect(await readElsewhere(key)).toBeNull();
    // the page rendered again after the write is served everywhere
    await new Promise((r) => setTimeout(r, 5));
    await a.set(key, page('<p>after</p>'), { cacheControl: { revalidate: 60, expire: undefined } });
    expect((await readElsewhere(key)).html).toBe('<p>after</p>');
    // another thread's mark leaves this page alone
    await a.revalidateTag('_N_T_/questions/8');
    expect((await readElsewhere(key)).html).toBe('<p>after</p>');
  });

  it('a write on one instance empties the response cache of the others within a second, not its own twice', async () => {
    const { redisInvalidation } = await import('../../scripts/response-cache-redis.mjs');
    const heardA: string[] = [];
    const heardB: string[] = [];
    const a = redisInvalidation(URL_, 'instance-a', (r) => heardA.push(r));
    const b = redisInvalidation(URL_, 'instance-b', (r) => heardB.push(r));
    try {
      for (let i = 0; i < 50 && !(a.connected() && b.connected()); i++) await new Promise((r) => setTimeout(r, 100));
      expect(a.connected() && b.connected()).toBe(true);
      heardA.length = heardB.length = 0;
      a.publish('POST /api/moderation/hide');
      const t0 = Date.now();
      while (!heardB.length && Date.now() - t0 < 1_000) await new Promise((r) => setTimeout(r, 10));
      expect(heardB).toEqual(['remote: POST /api/moderation/hide']);
      expect(heardA).toEqual([]);
    } finally {
      await a.close();
      await b.close();
    }
  });

  it('with Redis down: the page cache answers "not kept" and takes writes without failing; the response cache stops keeping pages', async () => {
    const { redisInvalidation } = await import('../../scripts/response-cache-redis.mjs');
    const a = new Handler({});
    await a.set('/questions/9', page('<p>kept</p>'), {});
    const channel = redisInvalidation(URL_, 'instance-c', () => {});
    for (let i = 0; i < 50 && !channel.connected(); i++) await new Promise((r) => setTimeout(r, 100));
    expect(channel.connected()).toBe(true);
    await stopRedis();
    try {
      for (let i = 0; i < 50 && channel.connected(); i++) await new Promise((r) => setTimeout(r, 100));
      expect(channel.connected()).toBe(false);
      const t0 = Date.now();
      expect(await a.get('/questions/9', { kind: 'APP_PAGE' })).toBeNull();
      await expect(a.set('/questions/9', page('x'), {})).resolves.toBeUndefined();
      await expect(a.revalidateTag('_N_T_/questions/9')).resolves.toBeUndefined();
      // bounded by the client's command timeout, not hanging (common practice, no source)
      expect(Date.now() - t0).toBeLessThan(5_000);
    } finally {
      await channel.close();
      await startRedis();
    }
  }, 30_000);
});
