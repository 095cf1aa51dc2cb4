import 'server-only';
import type { Transaction } from 'sequelize';
import { getSequelize } from '@/lib/db';
import { initModels } from '@/models';

/**
 * Ends every session the member has: each session token carries the account's
 * session version (`sv`) from sign-in, and currentUser()/currentUserInPage() and
 * next-auth's own session read refuse a token whose version is behind. Called by a
 * password reset, "sign out everywhere", a suspension and a role change, inside
 * their own transaction so the bump stands or falls with the change.
 */
export async function bumpSessionVersion(userId: number, transaction: Transaction): Promise<void> {
  const { User } = initModels();
  await User.increment('sessionVersion', { by: 1, where: { id: userId }, transaction });
}

/** The version a token carries; tokens from before versions existed carry none and count as 0. */
export function tokenVersion(token: { sv?: unknown } | null | undefined): number {
  const v = Number(token?.sv ?? 0);
  return Number.isInteger(v) && v >= 0 ? v : -1;
}

/** "Sign out everywhere": every browser and every copied cookie of this account signs out. */
export async function endAllSessions(userId: number): Promise<void> {
  await getSequelize().transaction((transaction) => bumpSessionVersion(userId, transaction));
}
