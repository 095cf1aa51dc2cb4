import 'server-only';
import { QueryTypes, type Sequelize } from 'sequelize';
import type Redis from 'ioredis';
import { RateLimiterMemory, RateLimiterMySQL, RateLimiterRedis } from 'rate-limiter-flexible';

/**
 * rate-limiter-flexible's MySQL limiter, kept as the library wrote it (ranking,
 * blocking, insurance), with its four store calls done through our Sequelize pool on
 * the `rate_limits` table (migration 010): the library's own store code speaks the
 * `mysql` driver's callback API and `??` placeholders, which the mariadb driver does
 * not. Every app instance on the same database then shares one count per key.
 */
type Row = { points: number; expire: number | null };

/** What a shared store falls back to when it does not answer: this process's own count. */
function insurance(points: number, duration: number, keyPrefix: string) {
  return new RateLimiterMemory({ points, duration, keyPrefix: `${keyPrefix}-insurance` });
}

/**
 * rate-limiter-flexible's Redis limiter on our ioredis client (REDIS_URL): one atomic
 * INCR-with-expiry per attempt, shared by every instance. Redis down or reconnecting
 * sends the attempt to this process's memory at once (`rejectIfRedisNotReady`), so a
 * sign-in never waits on Redis and a flood is still counted, per instance, meanwhile.
 */
export function rateLimiterOnRedis(opts: { points: number; duration: number; keyPrefix: string; client: Redis }) {
  return new RateLimiterRedis({
    storeClient: opts.client,
    // ioredis, not node-redis: the library's own switch for the client's call style
    useRedisPackage: false,
    rejectIfRedisNotReady: true,
    points: opts.points,
    duration: opts.duration,
    keyPrefix: `cw-rl:${opts.keyPrefix}`,
    insuranceLimiter: insurance(opts.points, opts.duration, opts.keyPrefix),
  });
}

export class RateLimiterMariaDB extends RateLimiterMySQL {
  private db: Sequelize;

  constructor(opts: { points: number; duration: number; keyPrefix: string; sequelize: Sequelize }) {
    super({
      points: opts.points,
      duration: opts.duration,
      keyPrefix: opts.keyPrefix,
      storeClient: opts.sequelize,
      storeType: 'sequelize',
      tableName: 'rate_limits',
      tableCreated: true,
      // the database not answering must not lock everyone out, nor let floods through
      insuranceLimiter: insurance(opts.points, opts.duration, opts.keyPrefix),
    });
    this.db = opts.sequelize;
  }

  async _upsert(key: string, points: number, msDuration: number, forceExpire = false): Promise<Row[]> {
    const now = Date.now();
    const expire = msDuration > 0 ? now + msDuration : null;
    return this.db.transaction(async (transaction) => {
      if (forceExpire) {
        await this.db.query(
          'INSERT INTO rate_limits (`key`, points, expire) VALUES (?, ?, ?) ON DUPLICATE KEY UPDATE points = ?, expire = ?',
          { replacements: [key, points, expire, points, expire], transaction },
        );
      } else {
        await this.db.query(
          'INSERT INTO rate_limits (`key`, points, expire) VALUES (?, ?, ?) ON DUPLICATE KEY UPDATE points = IF(expire <= ?, ?, points + (?)), expire = IF(expire <= ?, ?, expire)',
          { replacements: [key, points, expire, now, points, points, now, expire], transaction },
        );
      }
      const rows = await this.db.query<Row>('SELECT points, expire FROM rate_limits WHERE `key` = ?', {
        replacements: [key],
        type: QueryTypes.SELECT,
        transaction,
      });
      return rows.map((r) => ({ points: Number(r.points), expire: r.expire === null ? null : Number(r.expire) }));
    });
  }

  async _get(key: string): Promise<Row[] | null> {
    const rows = await this.db.query<Row>(
      'SELECT points, expire FROM rate_limits WHERE `key` = ? AND (expire > ? OR expire IS NULL)',
      { replacements: [key, Date.now()], type: QueryTypes.SELECT },
    );
    return rows.length
      ? rows.map((r) => ({ points: Number(r.points), expire: r.expire === null ? null : Number(r.expire) }))
      : null;
  }

  /**
   * The library's own cleanup (every 5 minutes) speaks the `mysql` callback API: with the
   * mariadb driver its callback never runs, so each call kept one pooled connection for
   * good and after a few minutes the pool was empty and every page answered 503.
   */
  async clearExpired(expire: number): Promise<void> {
    await this.db.query('DELETE FROM rate_limits WHERE expire < ?', { replacements: [expire] }).catch(() => undefined);
  }

  async _delete(key: string): Promise<boolean> {
    const [, meta] = (await this.db.query('DELETE FROM rate_limits WHERE `key` = ?', { replacements: [key] })) as [
      unknown,
      { affectedRows?: number },
    ];
    return (meta?.affectedRows ?? 0) > 0;
  }
}
