import 'server-only';
import Redis, { type RedisOptions } from 'ioredis';

/**
 * The one Redis client of this process, from REDIS_URL (`redis://127.0.0.1:6379/0`), or
 * null when it is unset: a single instance needs no Redis, and every caller has a way
 * without it. Redis is a helper, never the record: when it is down a command fails at
 * once (no offline queue) and the caller falls back (rate limits to this process's
 * memory, search to this instance's own writes until it reconnects), so no request
 * waits on it or fails for it.
 */
const g = globalThis as unknown as { __clackwaterRedis?: { url: string; client: Redis } };

export function redisUrl(env: Record<string, string | undefined> = process.env): string | null {
  const url = env.REDIS_URL?.trim();
  return url ? url : null;
}

/** The address without a password, for messages. */
function shown(url: string): string {
  try {
    const u = new URL(url);
    if (u.password) u.password = '***';
    return u.toString();
  } catch {
    return 'REDIS_URL (not a URL)';
  }
}

function options(role: string): RedisOptions {
  return {
    connectionName: `clackwater-${role}`,
    // a request must not queue behind a Redis that is not there
    enableOfflineQueue: false,
    maxRetriesPerRequest: 1,
    connectTimeout: 2_000,
    // keep trying in the background, at most every 2 s
    retryStrategy: (times) => Math.min(100 * times, 2_000),
  };
}

/** One readable line per outage, not one per retry. */
function watch(client: Redis, url: string, role: string): Redis {
  let down = false;
  client.on('error', (err: Error) => {
    if (down) return;
    down = true;
    console.error(`redis: ${role} connection to ${shown(url)} failed: ${err.message} (retrying in the background)`);
  });
  client.on('ready', () => {
    if (down) console.log(`redis: ${role} connection to ${shown(url)} is back`);
    down = false;
  });
  return client;
}

/** The shared client for commands, or null without REDIS_URL. */
export function redis(): Redis | null {
  const url = redisUrl();
  if (!url) return null;
  if (g.__clackwaterRedis?.url !== url) {
    g.__clackwaterRedis?.client.disconnect();
    g.__clackwaterRedis = { url, client: watch(new Redis(url, options('commands')), url, 'commands') };
  }
  return g.__clackwaterRedis.client;
}

/**
 * A new connection for SUBSCRIBE (a subscribed connection takes no other commands).
 * Unlike the command client it queues its SUBSCRIBE until connected, and ioredis
 * subscribes again by itself after a reconnect.
 */
export function redisSubscriber(role: string): Redis | null {
  const url = redisUrl();
  if (!url) return null;
  return watch(new Redis(url, { ...options(role), enableOfflineQueue: true, maxRetriesPerRequest: null }), url, role);
}

/** Closes the shared client (scripts and tests, so the process can end). */
export async function closeRedis(): Promise<void> {
  const c = g.__clackwaterRedis;
  g.__clackwaterRedis = undefined;
  if (c) await c.client.quit().catch(() => c.client.disconnect());
}
