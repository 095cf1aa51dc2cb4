import 'server-only';
import { getToken } from 'next-auth/jwt';
import { getServerSession } from 'next-auth';
import type { NextRequest } from 'next/server';
import { initModels } from '@/models';
import { authOptions } from './options';
import { authSecret } from './secret';
import type { Actor } from './policy';

export type SessionUser = Actor & { handle: string; displayName: string; email: string; suspendedUntil: Date | null; memberSince: Date };

/**
 * The signed-in member, read fresh from the database so a role change or a
 * removed account takes effect on the next request, not at the next sign-in.
 */
async function loadActor(uid: unknown): Promise<SessionUser | null> {
  const id = Number(uid);
  if (!Number.isInteger(id) || id <= 0) return null;
  const { User } = initModels();
  const u = await User.findByPk(id, { attributes: ['id', 'role', 'handle', 'displayName', 'email', 'suspendedUntil', 'createdAt'] });
  return u ? { id: u.id, role: u.role, handle: u.handle, displayName: u.displayName, email: u.email, suspendedUntil: u.suspendedUntil ?? null, memberSince: u.createdAt } : null;
}

/** For route handlers: the session cookie on this request. */
export async function currentUser(request: Request | NextRequest): Promise<SessionUser | null> {
  const token = await getToken({ req: request as NextRequest, secret: authSecret() });
  return token ? loadActor(token.uid) : null;
}

/** For server components and pages. */
export async function currentUserInPage(): Promise<SessionUser | null> {
  const session = await getServerSession(authOptions);
  return session?.user ? loadActor(session.user.id) : null;
}
