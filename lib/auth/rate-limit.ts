import 'server-only';
import { RateLimiterMemory, RateLimiterRes } from 'rate-limiter-flexible';
import { getSequelize } from '@/lib/db';
import { redis } from '@/lib/redis';
import { RateLimiterMariaDB, rateLimiterOnRedis } from './rate-limit-store';

/** Limits on the account endpoints and on writing, per client address and per account. */
/**
 * With REDIS_URL the counts live in Redis, one count per key for every app instance;
 * else in this process's memory, or with RATE_LIMIT_STORE=mariadb in the database
 * (README, "Scaling out").
 */
function limiter(points: number, durationS: number, keyPrefix: string) {
  const client = redis();
  if (client) return rateLimiterOnRedis({ points, duration: durationS, keyPrefix, client });
  if (process.env.RATE_LIMIT_STORE === 'mariadb')
    return new RateLimiterMariaDB({ points, duration: durationS, keyPrefix, sequelize: getSequelize() });
  return new RateLimiterMemory({ points, duration: durationS, keyPrefix });
}

const g = globalThis as unknown as { __clackwaterLimits?: ReturnType<typeof makeLimits> };
function makeLimits() {
  return {
    signInIp: limiter(30, 15 * 60, 'signin-ip'),
    signInAccount: limiter(5, 15 * 60, 'signin-account'),
    signUpIp: limiter(10, 60 * 60, 'signup-ip'),
    resetIp: limiter(10, 60 * 60, 'reset-ip'),
    resetAccount: limiter(3, 60 * 60, 'reset-account'),
    linkIp: limiter(10, 60 * 60, 'link-ip'),
    linkAccount: limiter(3, 60 * 60, 'link-account'),
    confirmIp: limiter(10, 60 * 60, 'confirm-ip'),
    confirmAccount: limiter(3, 60 * 60, 'confirm-account'),
    // flood limits on writing: posts (new members get fewer), flags
    postAccount: limiter(30, 60 * 60, 'post-account'),
    postNewAccount: limiter(6, 60 * 60, 'post-new-account'),
    postIp: limiter(120, 60 * 60, 'post-ip'),
    flagAccount: limiter(20, 60 * 60, 'flag-account'),
    flagIp: limiter(60, 60 * 60, 'flag-ip'),
    uploadAccount: limiter(30, 60 * 60, 'upload-account'),
    uploadIp: limiter(90, 60 * 60, 'upload-ip'),
    // worked calculations: an answer's calculation is saved before the answer, so a separate allowance
    calculationAccount: limiter(60, 60 * 60, 'calculation-account'),
    calculationIp: limiter(240, 60 * 60, 'calculation-ip'),
  };
}
export function limits() {
  g.__clackwaterLimits ??= makeLimits();
  return g.__clackwaterLimits;
}
export type LimitName = keyof ReturnType<typeof makeLimits>;

export type LimitResult = { ok: true } | { ok: false; retryAfterS: number };

/** Spends one point from each named limiter; refused if any is spent out. */
export async function spend(checks: [LimitName, string][]): Promise<LimitResult> {
  for (const [name, key] of checks) {
    try {
      await limits()[name].consume(key.toLowerCase());
    } catch (err) {
      if (err instanceof RateLimiterRes)
        return { ok: false, retryAfterS: Math.max(1, Math.ceil(err.msBeforeNext / 1000)) };
      throw err;
    }
  }
  return { ok: true };
}

/**
 * Gives back the points `spend` took: a request the work then refused uses no
 * allowance, and a successful sign-in is not an attempt on anyone's password (many
 * members may share one address: a household, an office).
 */
export async function refund(checks: [LimitName, string][]): Promise<void> {
  for (const [name, key] of checks) await limits()[name].reward(key.toLowerCase(), 1);
}

/** Clears an account's sign-in count after a successful sign-in. */
export async function forgive(name: LimitName, key: string) {
  await limits()[name].delete(key.toLowerCase());
}

export function limitMessage(retryAfterS: number): string {
  const mins = Math.ceil(retryAfterS / 60);
  return `Too many attempts. Please wait ${mins} minute${mins === 1 ? '' : 's'} and try again.`;
}

/**
 * How many proxies in front of the app append to X-Forwarded-For (TRUST_PROXY_HOPS,
 * default 0). The app's own server (scripts/server.mjs) appends the socket's peer
 * address last, as a proxy does, so the list always ends with the address that really
 * connected; each trusted hop vouches for the entry before its own.
 */
export function trustedProxyHops(): number {
  const n = Number(process.env.TRUST_PROXY_HOPS ?? 0);
  return Number.isInteger(n) && n >= 0 && n <= 10 ? n : 0;
}

/**
 * The client's address for the per-address limits: counted from the right of
 * X-Forwarded-For, never the left, since anything left of the trusted hops is
 * whatever the client chose to write. IPv6 clients are keyed by their /64, which one
 * household or one server holds whole.
 */
export function clientIp(headers: Headers | Record<string, string | string[] | undefined>): string {
  const raw = headers instanceof Headers ? headers.get('x-forwarded-for') : headers['x-forwarded-for'];
  const list = (Array.isArray(raw) ? raw.join(',') : (raw ?? ''))
    .split(',')
    .map((s) => s.trim())
    .filter(Boolean);
  const client = list[Math.max(0, list.length - 1 - trustedProxyHops())];
  return client === undefined ? 'local' : addressKey(client);
}

function addressKey(address: string): string {
  const a = address.toLowerCase().replace(/^\[|\](:\d+)?$/g, '');
  const mapped = /^::ffff:(\d+\.\d+\.\d+\.\d+)$/.exec(a);
  if (mapped?.[1]) return mapped[1];
  if (!a.includes(':')) return a.replace(/:\d+$/, '');
  // expand "::" and keep the first four groups
  const [head, tail = ''] = a.split('::');
  const h = head ? head.split(':') : [];
  const t = a.includes('::') && tail ? tail.split(':') : [];
  const groups = a.includes('::') ? [...h, ...Array(Math.max(0, 8 - h.length - t.length)).fill('0'), ...t] : h;
  return `${groups
    .slice(0, 4)
    .map((g) => g.replace(/^0+(?=.)/, ''))
    .join(':')}::/64`;
}
