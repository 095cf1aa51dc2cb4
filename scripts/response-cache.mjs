// A response cache in front of Next for the public pages a signed-out reader sees.
//
// Why here and not in Next: the lists, the home page, the field log and search read the
// reader's cookies (units, session), so Next renders them for every request (issue 23:
// 0.01–0.04× a static file's rate while their database work was under 10 ms). For a
// signed-out reader those pages depend only on the URL and the few request values listed
// in `cacheKey`, so the finished response can be kept and served again, and dropped the
// moment anything is written. Signed-in members always get pages rendered for them.
//
// What is never kept: a response with Set-Cookie, anything but a 200, a request carrying a
// session cookie or Next's client-navigation headers, any path off the allow-list, a render
// that reported an error (onRequestError in instrumentation.ts) and a page showing the
// database outage notice (a failed page can still go out as a 200 with its error boundary).
//
// CSP: a page rendered per request carries a fresh nonce (proxy.ts). A kept copy must not
// hand that nonce to every later reader (an injected script could reuse it), so before a
// response is kept its nonce is removed from the HTML and the policy lists the sha256 of
// each inline script instead, as for pages built once (lib/http/csp.ts). The body is then
// the same for everyone, which also lets it be gzipped once.
//
// Invalidation: any write that succeeds (a non-GET answered < 400) empties the cache once
// its response has finished, a page marked stale by lib/questions/after-write.ts empties it
// at once (`clear` on globalThis), and nothing is kept longer than `maxAgeMs` (relative
// times stay honest). A render that began before a clear is not kept after it
// (generations). Forum writes are rare next to reads, so emptying everything is cheap and
// leaves no page to forget. With several instances see response-cache-redis.mjs.
import { createHash, randomUUID } from 'node:crypto';
import { gzip } from 'node:zlib';
import { promisify } from 'node:util';

const gzipAsync = promisify(gzip);

/** The pages kept, by pathname. Never /api (but search), /sites, /settings, review, admin, forms. */
export const CACHEABLE_PATHS = [
  /^\/$/,
  /^\/questions$/,
  /^\/questions\/\d+$/,
  /^\/tags\/[^/]+$/,
  /^\/guides$/,
  /^\/guides\/[^/]+$/,
  /^\/field-log$/,
  /^\/search$/,
  /^\/api\/search$/,
];

/** Request headers Next's client navigation sends: the answer is an RSC payload, not the page. */
const NAVIGATION_HEADERS = [
  'rsc',
  'next-router-state-tree',
  'next-router-prefetch',
  'next-router-segment-prefetch',
  'next-action',
  'next-url',
  'purpose',
];

/** Response headers not replayed: per connection, per response, or recomputed. */
const DROPPED = new Set([
  'date',
  'connection',
  'keep-alive',
  'transfer-encoding',
  'content-length',
  'content-encoding',
  'x-clackwater-cache',
  // how Next answered that one request (HIT, MISS, STALE): not true of a later copy
  'x-nextjs-cache',
]);

export const GLOBAL_KEY = Symbol.for('clackwater.responseCache');
/** The attribute components/ServiceUnavailable.tsx puts on an outage notice. */
const OUTAGE_MARK = 'data-cw-outage';

function cookieValue(header, name) {
  const m = (header ?? '').match(new RegExp(`(?:^|;\\s*)${name}=([^;]*)`));
  return m?.[1];
}

/** next-auth's session cookie, under any prefix (__Secure-) and chunked (.0, .1). */
export function hasSession(cookieHeader) {
  return /(?:^|;\s*)(?:__Secure-|__Host-)?next-auth\.session-token(?:\.\d+)?=/.test(cookieHeader ?? '');
}

/**
 * Everything a kept page may differ by for a signed-out reader: the path and query, the
 * unit system (lib/units/preference.ts reads anything but these two as the default, US),
 * and https (proxy.ts adds HSTS). No page reads another header or cookie (grep of
 * cookies()/headers(): lib/units/server.ts and the session only).
 */
export function cacheKey(req) {
  const raw = cookieValue(req.headers.cookie, 'cw_units');
  const units = raw === 'metric' ? 'metric' : 'US';
  const proto = String(req.headers['x-forwarded-proto'] ?? '')
    .split(',')[0]
    .trim()
    .toLowerCase();
  return `${req.url}|${units}|${proto === 'https' ? 'https' : 'http'}`;
}

export function isCacheableRequest(req, paths = CACHEABLE_PATHS) {
  if (req.method !== 'GET' && req.method !== 'HEAD') return false;
  const pathname = (req.url ?? '').split('?')[0];
  if (!paths.some((p) => p.test(pathname))) return false;
  // next-auth's getToken also takes the session from `Authorization: Bearer …`
  if (hasSession(req.headers.cookie) || req.headers.authorization) return false;
  return !NAVIGATION_HEADERS.some((h) => h in req.headers);
}

/** sha256 of each inline script's code, as lib/http/csp.ts inlineScriptHashes (a test holds them equal). */
export function inlineScriptHashes(html) {
  const out = new Set();
  for (const m of html.matchAll(/<script\b([^>]*)>([\s\S]*?)<\/script>/gi)) {
    const [, attrs = '', code = ''] = m;
    if (/\bsrc\s*=/i.test(attrs)) continue;
    const type = /\btype\s*=\s*["']?([^"'\s>]+)/i.exec(attrs)?.[1]?.toLowerCase();
    if (type && type !== 'text/javascript' && type !== 'module' && type !== 'application/javascript') continue;
    out.add(`sha256-${createHash('sha256').update(code, 'utf8').digest('base64')}`);
  }
  return [...out];
}

/**
 * The body and policy to keep for a response whose policy has a nonce: the nonce gone from
 * both, each inline script allowed by its hash. Null when the nonce cannot be removed
 * cleanly (then the page is not kept).
 */
export function withoutNonce(body, csp) {
  const nonce = /'nonce-([^']+)'/.exec(csp ?? '')?.[1];
  if (!nonce) return { body, csp };
  const html = body.toString('utf8').split(` nonce="${nonce}"`).join('').split(nonce).join('');
  if (html.includes(nonce)) return null;
  const hashes = inlineScriptHashes(html).map((h) => `'${h}'`);
  const directive = /script-src ([^;]*)/.exec(csp)[1].split(' ');
  const merged = [...new Set(directive.flatMap((s) => (s === `'nonce-${nonce}'` ? hashes : [s])))];
  return { body: Buffer.from(html, 'utf8'), csp: csp.replace(/script-src [^;]*/, `script-src ${merged.join(' ')}`) };
}

function headerPairs(headers) {
  // writeHead takes an object or a flat [name, value, name, value] list
  if (!headers) return [];
  if (Array.isArray(headers)) {
    const out = [];
    for (let i = 0; i + 1 < headers.length; i += 2) out.push([String(headers[i]), headers[i + 1]]);
    return out;
  }
  return Object.entries(headers);
}

/**
 * @param {{ maxEntries?: number, maxBytes?: number, maxEntryBytes?: number, maxAgeMs?: number,
 *   now?: () => number, paths?: RegExp[], available?: () => boolean, onClear?: (reason: string) => void }} [opts]
 *   `available` says whether keeping pages is safe right now (false while the shared
 *   channel is down); `onClear` tells other instances.
 */
export function createResponseCache(opts = {}) {
  const maxEntries = opts.maxEntries ?? 1000;
  const maxBytes = opts.maxBytes ?? 64 * 1024 * 1024;
  const maxEntryBytes = opts.maxEntryBytes ?? 2 * 1024 * 1024;
  const maxAgeMs = opts.maxAgeMs ?? 60_000;
  const now = opts.now ?? Date.now;
  const available = opts.available ?? (() => true);
  /** @type {Map<string, { status: number, headers: Record<string, any>, body: Buffer, gz: Buffer | null, at: number, size: number }>} */
  const entries = new Map();
  /** renders in flight, by key: later readers wait for the first instead of rendering too */
  const inflight = new Map();
  /** renders that reported an error (instrumentation.ts onRequestError): never kept */
  const failedRenders = new Set();
  let bytes = 0;
  let generation = 0;
  const stats = { hits: 0, misses: 0, stored: 0, clears: 0, evictions: 0, passes: 0 };

  function remove(key) {
    const e = entries.get(key);
    if (!e) return;
    entries.delete(key);
    bytes -= e.size;
  }

  /** Empties the cache here (and, unless `local`, on every instance through `onClear`). */
  function clear(reason = 'clear', { local = false } = {}) {
    generation++;
    entries.clear();
    bytes = 0;
    stats.clears++;
    if (!local) opts.onClear?.(reason);
  }

  function lookup(key) {
    const e = entries.get(key);
    if (!e) return null;
    if (now() - e.at >= maxAgeMs) {
      remove(key);
      return null;
    }
    // least recently used goes first: a hit moves to the back of the Map's order
    entries.delete(key);
    entries.set(key, e);
    return e;
  }

  function store(key, e) {
    remove(key);
    entries.set(key, e);
    bytes += e.size;
    stats.stored++;
    for (const k of entries.keys()) {
      if (entries.size <= maxEntries && bytes <= maxBytes) break;
      remove(k);
      stats.evictions++;
    }
  }

  function serve(req, res, e) {
    stats.hits++;
    const zipped = e.gz && /\bgzip\b/.test(String(req.headers['accept-encoding'] ?? ''));
    const body = zipped ? e.gz : e.body;
    const headers = { ...e.headers, 'content-length': String(body.length), 'x-clackwater-cache': 'hit' };
    if (zipped) headers['content-encoding'] = 'gzip';
    res.writeHead(e.status, headers);
    res.end(req.method === 'HEAD' ? undefined : body);
  }

  /** Passes the request to Next, keeping a copy of a 200 without Set-Cookie. */
  function renderAndKeep(req, res, handle, key) {
    const gen = generation;
    // a page's age counts from when it began to render: what it shows is from then
    const started = now();
    const renderId = randomUUID();
    req.headers['x-clackwater-render'] = renderId;
    delete req.headers['accept-encoding']; // the copy kept must be plain text to take its nonce out
    const chunks = [];
    let size = 0;
    let tooBig = false;
    let headArgs = [];
    const capture = (chunk, encoding) => {
      if (tooBig || chunk == null || typeof chunk === 'function') return;
      const b = Buffer.isBuffer(chunk)
        ? chunk
        : chunk instanceof Uint8Array
          ? Buffer.from(chunk)
          : Buffer.from(chunk, typeof encoding === 'string' ? encoding : 'utf8');
      size += b.length;
      if (size > maxEntryBytes) tooBig = true;
      else chunks.push(Buffer.from(b));
    };
    const { writeHead, write, end } = res;
    res.writeHead = function (status, ...rest) {
      const h = rest.find((a) => a && typeof a === 'object');
      headArgs = headerPairs(h);
      return writeHead.call(this, status, ...rest);
    };
    res.write = function (chunk, encoding, cb) {
      capture(chunk, encoding);
      return write.call(this, chunk, encoding, cb);
    };
    res.end = function (chunk, encoding, cb) {
      capture(chunk, encoding);
      return end.call(this, chunk, encoding, cb);
    };
    res.setHeader('x-clackwater-cache', 'miss');
    let done;
    inflight.set(key, new Promise((r) => (done = r)));
    const finish = async () => {
      try {
        if (failedRenders.delete(renderId) || tooBig || res.statusCode !== 200) return;
        if (gen !== generation || !available()) return;
        const headers = new Map();
        for (const [k, v] of [...Object.entries(res.getHeaders()), ...headArgs]) headers.set(k.toLowerCase(), v);
        if (headers.has('set-cookie') || headers.has('content-encoding')) return;
        const body = Buffer.concat(chunks);
        // a page showing an outage in place of its content (components/ServiceUnavailable.tsx)
        if (body.includes(OUTAGE_MARK)) return;
        const clean = withoutNonce(body, headers.get('content-security-policy'));
        if (!clean) return;
        if (clean.csp) headers.set('content-security-policy', clean.csp);
        const gz = clean.body.length > 1024 ? await gzipAsync(clean.body) : null;
        if (gen !== generation) return;
        // the headers every hit replays, built once here rather than on each hit
        const kept = Object.fromEntries([...headers].filter(([k]) => !DROPPED.has(k)));
        if (gz && !/accept-encoding/i.test(String(kept.vary ?? '')))
          kept.vary = kept.vary ? `${kept.vary}, Accept-Encoding` : 'Accept-Encoding';
        const size = clean.body.length + (gz?.length ?? 0) + 1024;
        if (size <= maxBytes) store(key, { status: 200, headers: kept, body: clean.body, gz, at: started, size });
      } catch (err) {
        console.error(`response cache: not kept (${err instanceof Error ? err.message : String(err)})`);
      } finally {
        inflight.delete(key);
        done();
      }
    };
    res.once('finish', () => void finish());
    res.once('close', () => {
      if (!res.writableFinished) {
        failedRenders.delete(renderId);
        inflight.delete(key);
        done();
      }
    });
    return handle(req, res);
  }

  /** Wraps a node:http handler (Next's) with the cache. */
  function wrap(handle) {
    return async (req, res) => {
      const method = req.method ?? 'GET';
      if (method !== 'GET' && method !== 'HEAD' && method !== 'OPTIONS') {
        res.once('finish', () => {
          if (res.statusCode < 400) clear(`${method} ${(req.url ?? '').split('?')[0]}`);
        });
        return handle(req, res);
      }
      if (!isCacheableRequest(req, opts.paths) || !available()) {
        stats.passes++;
        return handle(req, res);
      }
      const key = cacheKey(req);
      let hit = lookup(key);
      if (!hit && inflight.has(key)) {
        // a render of this page is under way: its copy will do (bounded, then render anyway)
        await Promise.race([inflight.get(key), new Promise((r) => setTimeout(r, 5_000).unref())]);
        hit = lookup(key);
      }
      if (hit) return serve(req, res, hit);
      stats.misses++;
      if (method === 'HEAD' || inflight.has(key)) return handle(req, res);
      return renderAndKeep(req, res, handle, key);
    };
  }

  return {
    wrap,
    clear,
    /** The render with this id failed: its page is not kept. */
    renderFailed(id) {
      if (failedRenders.size < 10_000) failedRenders.add(id);
    },
    stats,
    /** Resolves once every render under way has been kept or let go (for tests). */
    idle: () => Promise.all([...inflight.values()]).then(() => undefined),
    get size() {
      return entries.size;
    },
    get bytes() {
      return bytes;
    },
  };
}

/** A name for this process on the shared channel, so it ignores its own messages. */
export const INSTANCE_ID = randomUUID();
