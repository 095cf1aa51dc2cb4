import 'server-only';
import { getToken, type JWT } from 'next-auth/jwt';
import { cookies, headers } from 'next/headers';
import type { NextRequest } from 'next/server';
import { initModels } from '@/models';
import { authSecret } from './secret';
import { tokenVersion } from './session-version';
import type { Actor } from './policy';

export type SessionUser = Actor & {
  handle: string;
  displayName: string;
  email: string;
  suspendedUntil: Date | null;
  memberSince: Date;
};

/**
 * The signed-in member, read fresh from the database so a role change or a
 * removed account takes effect on the next request, not at the next sign-in; a
 * token older than the account's session version (a reset, "sign out everywhere",
 * a suspension, a role change since) is signed out.
 */
async function loadActor(token: JWT | null): Promise<SessionUser | null> {
  if (!token) return null;
  const id = Number(token.uid);
  if (!Number.isInteger(id) || id <= 0) return null;
  const { User } = initModels();
  const u = await User.findByPk(id, {
    attributes: ['id', 'role', 'handle', 'displayName', 'email', 'suspendedUntil', 'createdAt', 'sessionVersion'],
  });
  if (!u || u.sessionVersion !== tokenVersion(token)) return null;
  return {
    id: u.id,
    role: u.role,
    handle: u.handle,
    displayName: u.displayName,
    email: u.email,
    suspendedUntil: u.suspendedUntil ?? null,
    memberSince: u.createdAt,
  };
}

/**
 * For route handlers: the session cookie on this request. A cookie that does not
 * verify (junk, forged, another secret) reads as signed out, silently: getToken
 * swallows the decode error.
 */
export async function currentUser(request: Request | NextRequest): Promise<SessionUser | null> {
  return loadActor(await getToken({ req: request as NextRequest, secret: authSecret() }));
}

/** For server components and pages: the same check on the request's cookies. */
export async function currentUserInPage(): Promise<SessionUser | null> {
  const req = { cookies: await cookies(), headers: await headers() };
  return loadActor(await getToken({ req: req as unknown as NextRequest, secret: authSecret() }));
}
