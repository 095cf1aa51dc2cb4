import { apiError, serverError } from './errors';
import { currentUser, type SessionUser } from '@/lib/auth/session';
import { can, POLICY, REFUSAL, type Action } from '@/lib/auth/policy';
import { ForumError } from '@/lib/forum/errors';

/**
 * The common shape of a write: who is asking (401 when signed out), may their role
 * take this action at all (403 with the policy's words), then the work, with a
 * ForumError turned into its status and field. 'own' rules are checked again by the
 * work itself once it knows the owner.
 */
export async function guarded(request: Request, action: Action, work: (user: SessionUser) => Promise<Response>): Promise<Response> {
  let user: SessionUser | null;
  try {
    user = await currentUser(request);
  } catch (err) {
    return serverError(err);
  }
  if (!user) return apiError(401, REFUSAL[action], undefined, 'unauthenticated');
  const rule = POLICY[action][user.role];
  if (!(rule === 'own' || can(user, action))) return apiError(403, REFUSAL[action], undefined, 'forbidden');
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
