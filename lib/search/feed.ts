import 'server-only';
import { randomUUID } from 'node:crypto';
import type Redis from 'ioredis';
import { redis, redisSubscriber } from '@/lib/redis';
import type { SearchDoc } from './documents';

/**
 * Index changes passed between app instances over Redis pub/sub (REDIS_URL), so each
 * instance's in-process index holds every instance's writes: the instance that took a
 * write indexes it at once and publishes the documents it indexed; every other
 * instance applies the same documents, without reading the database again (its
 * replica could still be behind the write).
 *
 * Pub/sub keeps nothing for a subscriber that is away, so a subscriber that lost its
 * connection cannot know what it missed: on getting it back it calls `onGap`, and the
 * index rebuilds from the database on its next search. A publish that fails (Redis down)
 * is only logged: the others lost their connection too and rebuild when it is back.
 */
export interface IndexChange {
  upsert?: SearchDoc[];
  remove?: string[];
}

interface Message extends IndexChange {
  from: string;
}

export const SEARCH_CHANNEL = 'clackwater:search:changes';

/** How long the first subscription may take before building the index without it. */
const FIRST_SUBSCRIBE_MS = 2_000;

export class IndexFeed {
  /** this process's name on the channel: its own messages are not applied twice */
  readonly id = randomUUID();
  private sub: Redis | null = null;
  private ready: Promise<void> | null = null;
  private subscribedOnce = false;

  constructor(
    private readonly apply: (change: IndexChange) => Promise<void>,
    private readonly onGap: () => void,
    private readonly channel = SEARCH_CHANNEL,
    private readonly client: () => Redis | null = redis,
    private readonly subscriber: (role: string) => Redis | null = redisSubscriber,
  ) {}

  /**
   * Subscribes (once); resolves when the subscription is in place, or after a short wait
   * when Redis does not answer, so a missing Redis never holds up search.
   */
  start(): Promise<void> {
    this.ready ??= new Promise<void>((resolve) => {
      const sub = this.subscriber('search-feed');
      this.sub = sub;
      if (!sub) return resolve();
      const timer = setTimeout(resolve, FIRST_SUBSCRIBE_MS);
      timer.unref?.();
      sub.on('message', (channel: string, text: string) => {
        if (channel === this.channel) void this.receive(text);
      });
      // ioredis subscribes again by itself after a reconnect; each time, something may have been missed
      sub.on('ready', () => {
        if (this.subscribedOnce) this.onGap();
      });
      sub.subscribe(this.channel).then(
        () => {
          this.subscribedOnce = true;
          clearTimeout(timer);
          resolve();
        },
        (err: Error) => console.error(`search: could not subscribe to index changes: ${err.message}`),
      );
    });
    return this.ready;
  }

  private async receive(text: string) {
    let msg: Message;
    try {
      msg = JSON.parse(text) as Message;
    } catch {
      console.error('search: an index change that is not JSON was ignored');
      return;
    }
    if (msg.from === this.id) return;
    try {
      await this.apply({ upsert: msg.upsert, remove: msg.remove });
    } catch (err) {
      console.error(`search: could not apply an index change: ${err instanceof Error ? err.message : err}`);
      this.onGap();
    }
  }

  /** Tells the other instances; never throws (the write stands, and the index repairs as above). */
  async publish(change: IndexChange): Promise<void> {
    const client = this.client();
    if (!client || (!change.upsert?.length && !change.remove?.length)) return;
    try {
      await client.publish(this.channel, JSON.stringify({ from: this.id, ...change } satisfies Message));
    } catch (err) {
      console.error(`search: could not publish an index change: ${err instanceof Error ? err.message : err}`);
    }
  }

  stop() {
    this.sub?.disconnect();
    this.sub = null;
    this.ready = null;
    this.subscribedOnce = false;
  }
}
