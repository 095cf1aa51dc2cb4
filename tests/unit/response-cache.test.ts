import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { gunzipSync } from 'node:zlib';
import { afterEach, describe, expect, it } from 'vitest';
import { createResponseCache, inlineScriptHashes as mjsHashes } from '../../scripts/response-cache.mjs';
import { inlineScriptHashes, newNonce } from '@/lib/http/csp';

/**
 * The response cache of scripts/server.mjs against a stand-in for Next: a handler that,
 * like a page rendered per request, puts a fresh nonce in its policy and on its scripts
 * and streams the page in pieces. `renders` counts the requests that reached it.
 */
type Reply = {
  status?: number;
  setCookie?: boolean;
  body?: string;
  delayMs?: number;
  fail?: boolean;
  during?: () => void;
};
let servers: http.Server[] = [];
afterEach(async () => {
  await Promise.all(servers.map((s) => new Promise((r) => s.close(r))));
  servers = [];
});

async function start(
  opts: Parameters<typeof createResponseCache>[0] = {},
  reply: (req: http.IncomingMessage) => Reply = () => ({}),
) {
  const cache = createResponseCache(opts);
  const state = { renders: 0, version: 1 };
  const next = async (req: http.IncomingMessage, res: http.ServerResponse) => {
    state.renders++;
    const r = reply(req);
    if (r.delayMs) await new Promise((ok) => setTimeout(ok, r.delayMs));
    const nonce = newNonce();
    res.statusCode = r.status ?? 200;
    res.setHeader('content-type', 'text/html; charset=utf-8');
    res.setHeader(
      'content-security-policy',
      `default-src 'self'; script-src 'self' 'nonce-${nonce}' 'sha256-abc='; object-src 'none'`,
    );
    if (r.setCookie) res.setHeader('set-cookie', 'x=1; Path=/');
    // what instrumentation.ts onRequestError does when a render throws
    if (r.fail) cache.renderFailed(String(req.headers['x-clackwater-render']));
    res.write(`<!DOCTYPE html><html><head><script nonce="${nonce}">self.__next_f=[]</script></head>`);
    r.during?.();
    res.write(`<body>${r.body ?? `v${state.version} ${req.url}`}<script src="/_next/a.js" nonce="${nonce}"></script>`);
    res.end(`<script nonce="${nonce}">self.__next_f.push([1,"{\\"nonce\\":\\"${nonce}\\"}"])</script></body></html>`);
  };
  const server = http.createServer(cache.wrap(next));
  servers.push(server);
  await new Promise<void>((r) => server.listen(0, '127.0.0.1', r));
  const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  const get = (path: string, headers: Record<string, string> = {}, method = 'GET') =>
    fetch(base + path, { method, headers, redirect: 'manual' }).then(async (r) => {
      const out = {
        status: r.status,
        headers: r.headers,
        body: await r.text(),
        cache: r.headers.get('x-clackwater-cache'),
      };
      // a copy is kept just after its response ends: wait for that, so each check sees it
      await cache.idle();
      return out;
    });
  return { cache, state, get, base };
}

describe('response cache', () => {
  it('keeps a signed-out page and serves it again, keyed by path, query, units and https', async () => {
    const { state, get } = await start();
    const first = await get('/questions?page=3');
    expect(first.cache).toBe('miss');
    const again = await get('/questions?page=3');
    expect(again.cache).toBe('hit');
    expect(again.body).toContain('v1 /questions?page=3');
    expect(state.renders).toBe(1);
    // each of these differs in what the page shows, so each renders once
    await get('/questions?page=4');
    await get('/questions?page=3', { cookie: 'cw_units=metric' });
    await get('/questions?page=3', { 'x-forwarded-proto': 'https' });
    expect(state.renders).toBe(4);
    // an unknown unit value reads as the default, US, like lib/units/preference.ts
    expect((await get('/questions?page=3', { cookie: 'cw_units=furlongs; other=1' })).cache).toBe('hit');
    expect(state.renders).toBe(4);
  });

  it('never keeps a signed-in request, a Set-Cookie, a non-200, a failed render, an outage notice, a client navigation or a path off the list', async () => {
    const { state, get } = await start({}, (req) => ({
      status: req.url === '/tags/missing' ? 404 : 200,
      setCookie: req.url === '/search?q=cookie',
      // a render that threw (then answered 200 with the error boundary), and the outage notice
      fail: req.url === '/questions?page=2',
      body: req.url === '/questions?show=unanswered' ? '<div role="alert" data-cw-outage="">…</div>' : undefined,
    }));
    const twice = async (path: string, headers: Record<string, string> = {}) => {
      const before = state.renders;
      await get(path, headers);
      const second = await get(path, headers);
      expect(state.renders - before, path).toBe(2);
      expect(second.cache, path).not.toBe('hit');
    };
    await twice('/', { cookie: 'next-auth.session-token=abc' });
    await twice('/', { cookie: 'cw_units=US; __Secure-next-auth.session-token.0=abc' });
    await twice('/', { authorization: 'Bearer abc' });
    await twice('/search?q=cookie');
    await twice('/questions?page=2', {});
    await twice('/questions?show=unanswered');
    await twice('/tags/missing');
    await twice('/questions', { rsc: '1' });
    for (const path of [
      '/settings',
      '/api/questions',
      '/field-log/new',
      '/sites/1',
      '/review',
      '/admin/users',
      '/questions/ask',
    ])
      await twice(path);
  });

  it('a successful write empties it; a refused write does not', async () => {
    let status = 200;
    const { state, get } = await start({}, (req) => (req.method === 'POST' ? { status } : {}));
    await get('/');
    expect((await get('/')).cache).toBe('hit');
    status = 403;
    await get('/api/helpful', {}, 'POST');
    expect((await get('/')).cache).toBe('hit');
    status = 201;
    state.version = 2;
    await get('/api/questions', {}, 'POST');
    const after = await get('/');
    expect(after.cache).toBe('miss');
    expect(after.body).toContain('v2 /');
  });

  it('a page whose render began before a write finished is not kept', async () => {
    let clear = () => {};
    const { state, get, cache } = await start({}, (req) => ({
      during: req.url === '/field-log' && state.renders === 1 ? clear : undefined,
    }));
    clear = () => cache.clear('a write committed while the page was rendering');
    await get('/field-log');
    await get('/field-log');
    expect(state.renders).toBe(2);
  });

  it('readers that arrive during a render wait for it rather than render again', async () => {
    const { state, get } = await start({}, () => ({ delayMs: 100 }));
    const all = await Promise.all(Array.from({ length: 5 }, () => get('/tags/frost')));
    expect(state.renders).toBe(1);
    expect(all.filter((r) => r.cache === 'hit')).toHaveLength(4);
  });

  it('drops a page after its max age', async () => {
    let t = 1_000_000;
    const { state, get } = await start({ maxAgeMs: 60_000, now: () => t });
    await get('/guides');
    t += 59_000;
    expect((await get('/guides')).cache).toBe('hit');
    t += 1_000;
    expect((await get('/guides')).cache).toBe('miss');
    expect(state.renders).toBe(2);
  });

  it('holds at most maxEntries and maxBytes, dropping the least recently used first', async () => {
    const { cache, get } = await start({ maxEntries: 2 });
    await get('/tags/a');
    await get('/tags/b');
    await get('/tags/a'); // a is now the more recently used
    await get('/tags/c');
    expect(cache.size).toBe(2);
    expect((await get('/tags/a')).cache).toBe('hit');
    expect((await get('/tags/b')).cache).toBe('miss');

    const big = 'x'.repeat(20_000);
    // each entry is the page, its gzip (tiny here) and 1 kB for its headers
    const small = await start({ maxBytes: 50_000 }, () => ({ body: big }));
    await small.get('/tags/a');
    await small.get('/tags/b');
    await small.get('/tags/c');
    expect(small.cache.bytes).toBeLessThanOrEqual(50_000);
    expect(small.cache.size).toBe(2);
    expect((await small.get('/tags/a')).cache).toBe('miss');
  });

  it('two copies served from it never share a nonce: the kept copy has none, its scripts are allowed by hash', async () => {
    const { get } = await start();
    const rendered = await get('/');
    const nonce = /'nonce-([^']+)'/.exec(rendered.headers.get('content-security-policy')!)![1];
    expect(rendered.body).toContain(`nonce="${nonce}"`);
    const a = await get('/');
    const b = await get('/');
    for (const copy of [a, b]) {
      expect(copy.cache).toBe('hit');
      const csp = copy.headers.get('content-security-policy')!;
      expect(csp).not.toContain('nonce-');
      expect(copy.body).not.toContain(nonce);
      expect(copy.body).not.toContain('nonce=');
      const scriptSrc = /script-src ([^;]+)/.exec(csp)![1];
      expect(scriptSrc).not.toContain('unsafe-inline');
      // every inline script of the copy is allowed, and the page's own hash is still there
      for (const h of inlineScriptHashes(copy.body)) expect(scriptSrc).toContain(`'${h}'`);
      expect(scriptSrc).toContain("'sha256-abc='");
      expect(csp).toContain("object-src 'none'");
    }
    // a second render gets its own fresh nonce, never the first one
    const { get: get2 } = await start();
    const other = await get2('/');
    expect(other.headers.get('content-security-policy')).not.toContain(nonce);
  });

  it('hashes inline scripts as lib/http/csp.ts does', () => {
    const html =
      '<script>a()</script><script src="/x.js"></script><script type="application/json">{"a":1}</script><script type="module">b()</script><SCRIPT>c()</SCRIPT>';
    expect(mjsHashes(html)).toEqual(inlineScriptHashes(html));
  });

  it('serves a kept page gzipped to a reader who accepts it, and HEAD without a body', async () => {
    const long = 'a line of the page '.repeat(200);
    const { get, base } = await start({}, () => ({ body: long }));
    await get('/search?q=waste');
    const raw = await new Promise<{ enc?: string; buf: Buffer }>((resolve) =>
      http.get(`${base}/search?q=waste`, { headers: { 'accept-encoding': 'gzip' } }, (res) => {
        const parts: Buffer[] = [];
        res.on('data', (c: Buffer) => parts.push(c));
        res.on('end', () => resolve({ enc: res.headers['content-encoding'], buf: Buffer.concat(parts) }));
      }),
    );
    expect(raw.enc).toBe('gzip');
    expect(gunzipSync(raw.buf).toString()).toContain(long);
    const head = await get('/search?q=waste', {}, 'HEAD');
    expect(head.cache).toBe('hit');
    expect(head.body).toBe('');
  });

  it('keeps nothing while the shared channel is down', async () => {
    let up = false;
    const { state, get } = await start({ available: () => up });
    await get('/');
    await get('/');
    expect(state.renders).toBe(2);
    up = true;
    await get('/');
    expect((await get('/')).cache).toBe('hit');
    up = false;
    expect((await get('/')).cache).not.toBe('hit');
  });

  it('tells the other instances when it empties for a write, not when told by them', async () => {
    const told: string[] = [];
    const { cache, get } = await start({ onClear: (r) => told.push(r) });
    await get('/api/field-log', {}, 'POST');
    expect(told).toEqual(['POST /api/field-log']);
    cache.clear('remote', { local: true });
    expect(told).toHaveLength(1);
  });
});
