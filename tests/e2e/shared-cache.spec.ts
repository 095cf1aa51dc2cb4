import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { test, expect } from '@playwright/test';
import { serverEnv } from '../../playwright.config';
import { signedIn } from '../support/session';

/**
 * Two app instances sharing Redis (REDIS_URL): Next's page cache in Redis
 * (scripts/redis-cache-handler.mjs) and the response cache's clear channel
 * (scripts/response-cache-redis.mjs). A hide taken by instance A is gone from instance B's
 * thread page and list at once, although B had both kept. Starts its own redis-server on
 * REDIS_TEST_PORT (6399 unless set) and skips when the binary is missing.
 */
const REDIS_PORT = Number(process.env.REDIS_TEST_PORT ?? 6399);
const REDIS_URL = `redis://127.0.0.1:${REDIS_PORT}`;
const BASE_PORT = Number(process.env.E2E_PORT ?? 3100);
const A = `http://127.0.0.1:${BASE_PORT + 18}`;
const B = `http://127.0.0.1:${BASE_PORT + 19}`;
const hasRedis = spawnSync('redis-server', ['--version']).status === 0;
const children: ChildProcess[] = [];

test.skip(!hasRedis, 'redis-server is not installed (apt-get install redis-server)');

async function until(ok: () => Promise<boolean>, what: string) {
  for (let i = 0; i < 240; i++) {
    if (await ok().catch(() => false)) return;
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`${what} did not start`);
}

test.beforeAll(async () => {
  test.setTimeout(120_000);
  const dir = path.resolve('.data', `redis-e2e-${REDIS_PORT}`);
  mkdirSync(dir, { recursive: true });
  children.push(
    spawn(
      'redis-server',
      ['--port', String(REDIS_PORT), '--bind', '127.0.0.1', '--save', '', '--appendonly', 'no', '--dir', dir],
      {
        stdio: 'ignore',
      },
    ),
  );
  await until(
    async () =>
      spawnSync('redis-cli', ['-p', String(REDIS_PORT), 'ping'])
        .stdout?.toString()
        .trim() === 'PONG',
    'redis-server',
  );
  spawnSync('redis-cli', ['-p', String(REDIS_PORT), 'flushall']);
  for (const at of [A, B]) {
    children.push(
      spawn('node', ['scripts/server.mjs', '-p', new URL(at).port, '-H', '127.0.0.1'], {
        env: { ...(serverEnv(at) as NodeJS.ProcessEnv), REDIS_URL, MAIL_WORKER: 'off' },
        stdio: 'ignore',
      }),
    );
  }
  for (const at of [A, B]) await until(async () => (await fetch(`${at}/api/health`)).ok, at);
});
test.afterAll(() => {
  for (const c of children.reverse()) c.kill();
});

test(
  'a hide on one instance is gone from the other instance’s kept thread page and list at once',
  { tag: '@desktop-only' },
  async ({ browser }) => {
    test.setTimeout(90_000);
    // sessions are cookies for the host, so one sign-in serves both ports (two-instances.spec.ts)
    const moderator = await signedIn(browser, 'moss@clackwater.example');
    const member = await signedIn(browser, 'tamsin@ferncombe.example');
    const title = `Shared cache across instances ${Date.now() % 100000}`;
    const ask = await member.request.post(`${A}/api/questions`, {
      data: { title, body: 'Asked on one instance, hidden there, read on the other.', tags: ['stall'] },
    });
    expect(ask.status()).toBe(201);
    const { id } = (await ask.json()) as { id: number };
    const thread = `${B}/questions/${id}`;
    const anon = async (url: string) => {
      const res = await fetch(url);
      return { status: res.status, text: await res.text(), cache: res.headers.get('x-clackwater-cache') };
    };
    // B keeps the thread in both caches: Next's (in Redis) and its response cache
    await anon(thread);
    await anon(`${B}/questions`);
    expect((await anon(thread)).cache).toBe('hit');
    const list = await anon(`${B}/questions`);
    expect(list.cache).toBe('hit');
    expect(list.text).toContain(`/questions/${id}`);
    // and Next's page cache, asked without the response cache (a member's request passes it)
    const signedInThread = await moderator.request.get(thread);
    expect(signedInThread.headers()['x-nextjs-cache']).toMatch(/HIT|STALE/);

    const hide = await moderator.request.post(`${A}/api/review/actions`, {
      data: { action: 'hide', postType: 'question', postId: id, reason: 'checking the shared cache' },
    });
    expect(hide.status()).toBe(200);
    // the clear crosses Redis within a second (common practice, no source); the page cache mark at once
    await expect.poll(async () => (await anon(thread)).status, { timeout: 1_000, intervals: [50] }).toBe(404);
    expect((await anon(`${B}/questions`)).text).not.toContain(`/questions/${id}`);
    await moderator.context().close();
    await member.context().close();
  },
);
