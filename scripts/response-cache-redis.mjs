// Tells every app instance to empty its response cache (response-cache.mjs) when one of
// them takes a write, over a Redis channel. Own connections (a subscriber cannot send
// other commands), not lib/redis.ts: this runs in scripts/server.mjs, outside Next's bundle.
//
// While the subscriber is not connected an instance could miss a clear, so the cache is
// then not used at all (every page rendered for its request, as without the cache) and
// it is emptied again when the subscription is back: a Redis outage costs speed, never
// shows a hidden post. A clear that cannot be published is logged; the other instances
// then drop their copy within the cache's max age (60 s).
import Redis from 'ioredis';

export const CHANNEL = 'clackwater:response-cache:clear';

/**
 * @param {string} url REDIS_URL
 * @param {string} self this instance's id (its own messages are ignored)
 * @param {(reason: string) => void} onRemoteClear empties the local cache
 */
export function redisInvalidation(url, self, onRemoteClear) {
  let subscribed = false;
  const sub = new Redis(url, {
    lazyConnect: false,
    maxRetriesPerRequest: null,
    retryStrategy: (n) => Math.min(n * 200, 2_000),
  });
  const pub = new Redis(url, {
    enableOfflineQueue: false,
    maxRetriesPerRequest: 1,
    retryStrategy: (n) => Math.min(n * 200, 2_000),
  });
  const quiet = () => {};
  pub.on('error', quiet);
  sub.on('error', quiet);
  const down = () => {
    if (subscribed) onRemoteClear('redis subscription lost');
    subscribed = false;
  };
  sub.on('close', down);
  sub.on('end', down);
  sub.on('ready', () => {
    // ioredis subscribes again after a reconnect; until it has, keep no pages
    sub.subscribe(CHANNEL).then(
      () => {
        onRemoteClear('redis subscription (re)started');
        subscribed = true;
      },
      () => {},
    );
  });
  sub.on('message', (channel, message) => {
    if (channel !== CHANNEL) return;
    const [from, ...reason] = message.split(' ');
    if (from !== self) onRemoteClear(`remote: ${reason.join(' ')}`);
  });
  return {
    /** Whether clears from other instances are reaching this one. */
    connected: () => subscribed && sub.status === 'ready',
    publish(reason) {
      pub.publish(CHANNEL, `${self} ${reason}`).catch((err) => {
        console.error(`response cache: could not tell the other instances to clear (${err.message})`);
      });
    },
    async close() {
      subscribed = false;
      sub.disconnect();
      pub.disconnect();
    },
  };
}
