// Next's page cache (ISR: the thread pages) kept in Redis, shared by every app instance
// (`cacheHandler` in next.config.mjs, only when REDIS_URL is set; otherwise Next keeps
// it on each instance's disk). Next 16's interface (node_modules/next/dist/server/lib/
// incremental-cache/index.d.ts, `CacheHandler`): get, set, revalidateTag, resetRequestCache.
//
// Why: a write marks its thread stale with revalidatePath (instrumentation.ts), which Next
// turns into revalidateTag('_N_T_/questions/<id>'). Next's own handler records that mark in
// the process's memory, so the other instances kept serving the old page for up to the
// page's `revalidate` (60 s): a hidden post could still show there. Here the marks live in
// one Redis hash that every instance reads with each entry, so the next visit to any
// instance renders the page afresh.
//
// If Redis does not answer, get answers "not kept" (the page renders for that request)
// and set/revalidateTag are dropped after logging: slower, never stale. The mark is also
// kept in this process's memory so this instance stays right on its own.
import { createRequire } from 'node:module';
import Redis from 'ioredis';

const require = createRequire(import.meta.url);
// Next's own record of tag marks, which its IncrementalCache consults after get()
const { tagsManifest } = require('next/dist/server/lib/incremental-cache/tags-manifest.external.js');

const PREFIX = process.env.REDIS_CACHE_PREFIX ?? 'clackwater:next:';
const TAGS = `${PREFIX}tags`;
// an entry nobody asks for goes after a day; Next decides freshness from lastModified
const ENTRY_TTL_S = 24 * 60 * 60;
const CLIENT = Symbol.for('clackwater.nextCacheRedis');

function client() {
  const g = globalThis;
  if (!g[CLIENT]) {
    const redis = new Redis(process.env.REDIS_URL, {
      enableOfflineQueue: false,
      maxRetriesPerRequest: 1,
      commandTimeout: 1_000,
      retryStrategy: (n) => Math.min(n * 200, 2_000),
    });
    let said = false;
    redis.on('error', (err) => {
      if (!said) console.error(`page cache: Redis unavailable, pages render per request (${err.message})`);
      said = true;
    });
    // commands fail at once while Redis is away (no offline queue), but the first ones
    // wait for the first connection rather than count a starting server as an outage
    const first = new Promise((resolve) => {
      redis.once('ready', resolve);
      setTimeout(resolve, 1_000).unref();
    });
    redis.on('ready', () => (said = false));
    g[CLIENT] = { redis, first };
  }
  return g[CLIENT];
}

async function connected() {
  const { redis, first } = client();
  await first;
  return redis;
}

/** JSON that keeps Buffers (rscData, segments, route bodies) and Maps (segmentData). */
export function encode(value) {
  return JSON.stringify(value, function (key, v) {
    const raw = this[key];
    if (raw instanceof Uint8Array) return { __buf: Buffer.from(raw).toString('base64') };
    if (raw instanceof Map) return { __map: [...raw] };
    return v;
  });
}

export function decode(text) {
  return JSON.parse(text, (_key, v) => {
    if (v && typeof v === 'object' && typeof v.__buf === 'string') return Buffer.from(v.__buf, 'base64');
    if (v && typeof v === 'object' && Array.isArray(v.__map)) return new Map(v.__map);
    return v;
  });
}

/** The tags an entry answers to: a page's from its x-next-cache-tags header, a fetch's own. */
function tagsOf(value, ctx) {
  const header = value?.headers?.['x-next-cache-tags'];
  return [
    ...(typeof header === 'string' ? header.split(',') : []),
    ...(Array.isArray(value?.tags) ? value.tags : []),
    ...(ctx?.tags ?? []),
    ...(ctx?.softTags ?? []),
  ];
}

function failed(what, err) {
  if (process.env.NEXT_PRIVATE_DEBUG_CACHE) console.error(`page cache: ${what} failed (${err?.message ?? err})`);
}

export default class RedisCacheHandler {
  constructor(ctx) {
    this.ctx = ctx;
  }

  async get(key, ctx) {
    try {
      const redis = await connected();
      const raw = await redis.get(`${PREFIX}entry:${key}`);
      if (!raw) return null;
      const entry = decode(raw);
      const tags = [...new Set(tagsOf(entry.value, ctx))];
      if (tags.length) {
        const now = Date.now();
        const marks = await redis.hmget(TAGS, ...tags);
        for (const [i, m] of marks.entries()) {
          if (!m) continue;
          const mark = JSON.parse(m);
          // marked after this entry was made: a write since, so it is not served
          if (typeof mark.expired === 'number' && mark.expired <= now && mark.expired > entry.lastModified) return null;
          // a stale mark (revalidateTag with a profile) is left for Next to act on
          tagsManifest.set(tags[i], mark);
        }
      }
      return entry;
    } catch (err) {
      failed(`get ${key}`, err);
      return null;
    }
  }

  async set(key, data, ctx) {
    try {
      const entry = { lastModified: Date.now(), value: data, cacheControl: ctx?.cacheControl };
      await (await connected()).set(`${PREFIX}entry:${key}`, encode(entry), 'EX', ENTRY_TTL_S);
    } catch (err) {
      failed(`set ${key}`, err);
    }
  }

  /** As Next's own handler (file-system-cache.js): no durations marks expired now, a profile marks stale. */
  async revalidateTag(tags, durations) {
    const list = typeof tags === 'string' ? [tags] : tags;
    if (!list.length) return;
    const now = Date.now();
    const marks = {};
    for (const tag of list) {
      const prior = tagsManifest.get(tag) ?? {};
      const mark = durations
        ? {
            ...prior,
            stale: now,
            ...(durations.expire !== undefined ? { expired: now + durations.expire * 1000 } : {}),
          }
        : { ...prior, expired: now };
      tagsManifest.set(tag, mark);
      marks[tag] = JSON.stringify(mark);
    }
    try {
      await (await connected()).hset(TAGS, marks);
    } catch (err) {
      console.error(`page cache: could not mark ${list.join(', ')} stale for the other instances (${err.message})`);
    }
  }

  resetRequestCache() {}
}
