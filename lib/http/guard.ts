import { apiError, serverError } from './errors';
import { crossSiteRefusal } from './request-checks';
import { currentUser, type SessionUser } from '@/lib/auth/session';
import { can, POLICY, REFUSAL, type Action } from '@/lib/auth/policy';
import { ForumError } from '@/lib/forum/errors';
import { clientIp, limitMessage, spend, type LimitName } from '@/lib/auth/rate-limit';

/** Members younger than this are "new": fewer posts an hour and fewer links a post. */
export const NEW_MEMBER_DAYS = 7;
export const NEW_MEMBER_MAX_LINKS = 2;

/** Actions a suspended member cannot take. */
const WRITES = new Set<Action>(['calculation.save', 'question.ask', 'question.edit', 'answer.post', 'answer.edit', 'reply.post', 'reply.edit', 'post.markHelpful', 'question.markFixed', 'post.flag', 'photo.upload', 'expertApplication.submit', 'fieldLog.create', 'fieldLog.edit', 'fieldLog.import']);

export function isNewMember(user: SessionUser, now = Date.now()): boolean {
  return now - user.memberSince.getTime() < NEW_MEMBER_DAYS * 86_400_000;
}

/** Links in a Markdown text: bare URLs and [text](url). */
export function countLinks(text: string): number {
  return (text.match(/https?:\/\/[^\s)]+/g) ?? []).length;
}

/**
 * The common shape of a write: who is asking (401 when signed out), may their role
 * take this action at all (403 with the policy's words), then the work, with a
 * ForumError turned into its status and field. 'own' rules are checked again by the
 * work itself once it knows the owner.
 */
export async function guarded(
  request: Request,
  action: Action,
  work: (user: SessionUser) => Promise<Response>,
  options: { flood?: 'post' | 'flag' | 'upload' } = {},
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
  const rule = POLICY[action][user.role];
  if (!(rule === 'own' || can(user, action))) return apiError(403, REFUSAL[action], undefined, 'forbidden');
  if (WRITES.has(action) && user.suspendedUntil && user.suspendedUntil.getTime() > Date.now()) {
    return apiError(403, `Your account is suspended until ${user.suspendedUntil.toUTCString().slice(5, 16)}. See your notices in Settings for the reason.`, undefined, 'suspended');
  }
  if (options.flood) {
    const ip = clientIp(request.headers);
    const checks: Record<typeof options.flood, [LimitName, string][]> = {
      flag: [['flagIp', ip], ['flagAccount', String(user.id)]],
      upload: [['uploadIp', ip], ['uploadAccount', String(user.id)]],
      post: [['postIp', ip], [isNewMember(user) ? 'postNewAccount' : 'postAccount', String(user.id)]],
    };
    try {
      const limited = await spend(checks[options.flood]);
      if (!limited.ok) {
        const res = apiError(429, limitMessage(limited.retryAfterS), undefined, 'rate_limited');
        res.headers.set('Retry-After', String(limited.retryAfterS));
        return res;
      }
    } catch (err) {
      return serverError(err);
    }
  }
  try {
    return await work(user);
  } catch (err) {
    if (err instanceof ForumError) return apiError(err.status, err.message, err.field);
    return serverError(err);
  }
}

/** Reads a numeric route id, or undefined. */
export function idParam(raw: string): number | undefined {
  return /^\d{1,10}$/.test(raw) ? Number(raw) : undefined;
}
