import { apiError, serverError } from './errors';
import { crossSiteRefusal } from './request-checks';
import { currentUser, type SessionUser } from '@/lib/auth/session';
import { refusedBySuspension, REFUSAL, roleMayTry, type Action } from '@/lib/auth/policy';
import { ForumError } from '@/lib/questions/errors';
import { clientIp, limitMessage, refund, spend, type LimitName } from '@/lib/auth/rate-limit';
import { isNewMember } from '@/lib/accounts/new-member';
import { formatDate } from '@/lib/dates';
import { hasPrimaryMarker, onPrimary, primaryMarkerCookie } from '@/lib/db/read-your-writes';
import { replicasConfigured } from '@/lib/db/config';
import { siteUrl } from '@/lib/site';

export type FloodKind = 'post' | 'flag' | 'upload' | 'calculation';

/**
 * The one way a route handler reaches a protected action: who is asking (401 when
 * signed out), may their role take this action at all and does a suspension leave
 * it to them (403 with the policy's words), then the work, with a ForumError turned
 * into its status and field. 'own' rules are checked again by the work itself once
 * it knows the owner. A flood allowance is spent before the work, so two requests
 * at once cannot both slip under it, and given back when the work refuses the
 * request: only accepted writes use it up.
 */
export async function guarded(
  request: Request,
  action: Action,
  work: (user: SessionUser) => Promise<Response>,
  options: { flood?: FloodKind } = {},
): Promise<Response> {
  if (!replicasConfigured()) return guardedWork(request, action, work, options);
  // With read replicas (DB_REPLICAS), read-your-writes is decided here because every
  // protected write passes through this one function: a write request reads what it is
  // about to change from the primary, its success marks the member's next few seconds of
  // requests (lib/db/read-your-writes.ts), and a request carrying that mark reads from the
  // primary too. A hook lower down (the session, the pool) cannot tell a write request from
  // a read or see the response the mark is set on.
  const writes = request.method !== 'GET' && request.method !== 'HEAD';
  const run = () => guardedWork(request, action, work, options);
  const res = writes || hasPrimaryMarker(request.headers.get('cookie')) ? await onPrimary(run) : await run();
  if (!writes || !res.ok) return res;
  const marker = primaryMarkerCookie(siteUrl().startsWith('https:'));
  try {
    res.headers.append('Set-Cookie', marker);
    return res;
  } catch {
    // a Response.redirect's headers are immutable: copy it
    const copy = new Response(res.body, res);
    copy.headers.append('Set-Cookie', marker);
    return copy;
  }
}

async function guardedWork(
  request: Request,
  action: Action,
  work: (user: SessionUser) => Promise<Response>,
  options: { flood?: FloodKind },
): Promise<Response> {
  const crossSite = crossSiteRefusal(request);
  if (crossSite) return crossSite;
  let user: SessionUser | null;
  try {
    user = await currentUser(request);
  } catch (err) {
    return serverError(err);
  }
  if (!user) return apiError(401, REFUSAL[action], undefined, 'unauthenticated');
  if (!roleMayTry(user, action)) return apiError(403, REFUSAL[action], undefined, 'forbidden');
  if (refusedBySuspension(user, action)) {
    return apiError(
      403,
      `Your account is suspended until ${formatDate(user.suspendedUntil!)}. See your notices in Settings for the reason.`,
      undefined,
      'suspended',
    );
  }
  let spent: [LimitName, string][] = [];
  if (options.flood) {
    const ip = clientIp(request.headers);
    const checks: Record<FloodKind, [LimitName, string][]> = {
      flag: [
        ['flagIp', ip],
        ['flagAccount', String(user.id)],
      ],
      upload: [
        ['uploadIp', ip],
        ['uploadAccount', String(user.id)],
      ],
      post: [
        ['postIp', ip],
        [isNewMember(user) ? 'postNewAccount' : 'postAccount', String(user.id)],
      ],
      calculation: [
        ['calculationIp', ip],
        ['calculationAccount', String(user.id)],
      ],
    };
    try {
      const limited = await spend(checks[options.flood]);
      if (!limited.ok) {
        const res = apiError(429, limitMessage(limited.retryAfterS), undefined, 'rate_limited');
        res.headers.set('Retry-After', String(limited.retryAfterS));
        return res;
      }
      spent = checks[options.flood];
    } catch (err) {
      return serverError(err);
    }
  }
  let res: Response;
  try {
    res = await work(user);
  } catch (err) {
    res = err instanceof ForumError ? apiError(err.status, err.message, err.field) : serverError(err);
  }
  if (!res.ok && spent.length) {
    try {
      await refund(spent);
    } catch (err) {
      // the refusal stands whatever the limiter's store says; a lost refund only costs the member one point
      console.error('could not give back a flood allowance', err);
    }
  }
  return res;
}

/** Reads a numeric route id, or undefined. */
export function idParam(raw: string): number | undefined {
  return /^\d{1,10}$/.test(raw) ? Number(raw) : undefined;
}
