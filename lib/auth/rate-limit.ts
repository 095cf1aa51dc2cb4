import 'server-only';
import { RateLimiterMemory, RateLimiterRes } from 'rate-limiter-flexible';
import { getSequelize } from '@/lib/db';
import { RateLimiterMariaDB } from './rate-limit-store';

/** Limits on the account endpoints and on writing, per client address and per account. */
/**
 * In this process's memory by default; with RATE_LIMIT_STORE=mariadb the counts live
 * in the database, so they hold across every app instance (README, "Scaling out").
 */
function limiter(points: number, durationS: number, keyPrefix: string) {
  if (process.env.RATE_LIMIT_STORE === 'mariadb') return new RateLimiterMariaDB({ points, duration: durationS, keyPrefix, sequelize: getSequelize() });
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
    // flood limits on writing: posts (new members get fewer), flags
    postAccount: limiter(30, 60 * 60, 'post-account'),
    postNewAccount: limiter(6, 60 * 60, 'post-new-account'),
    postIp: limiter(120, 60 * 60, 'post-ip'),
    flagAccount: limiter(20, 60 * 60, 'flag-account'),
    flagIp: limiter(60, 60 * 60, 'flag-ip'),
    uploadAccount: limiter(30, 60 * 60, 'upload-account'),
    uploadIp: limiter(90, 60 * 60, 'upload-ip'),
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
      if (err instanceof RateLimiterRes) return { ok: false, retryAfterS: Math.max(1, Math.ceil(err.msBeforeNext / 1000)) };
      throw err;
    }
  }
  return { ok: true };
}

/** Clears an account's sign-in count after a successful sign-in. */
export async function forgive(name: LimitName, key: string) {
  await limits()[name].delete(key.toLowerCase());
}

export function limitMessage(retryAfterS: number): string {
  const mins = Math.ceil(retryAfterS / 60);
  return `Too many attempts. Please wait ${mins} minute${mins === 1 ? '' : 's'} and try again.`;
}

/** The client's address as the proxy in front reports it, or the direct peer. */
export function clientIp(headers: Headers | Record<string, string | string[] | undefined>): string {
  const get = (n: string) => (headers instanceof Headers ? headers.get(n) : (headers[n] as string | undefined)) ?? undefined;
  const fwd = get('x-forwarded-for');
  return (fwd?.split(',')[0] ?? get('x-real-ip') ?? 'local').trim();
}
