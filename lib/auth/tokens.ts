import 'server-only';
import { createHash, randomBytes } from 'node:crypto';
import { Op, type Transaction } from 'sequelize';
import { initModels } from '@/models';
import type { TokenPurpose } from '@/models/AuthToken';

/** How long each kind of e-mailed token lasts. */
export const TOKEN_TTL_MS: Record<TokenPurpose, number> = {
  'verify-email': 48 * 3_600_000,
  'reset-password': 60 * 60_000,
  'sign-in-link': 15 * 60_000,
};

const sha256 = (s: string) => createHash('sha256').update(s).digest('hex');

/** Issues a token for an e-mail link; returns the raw token (only its hash is stored). */
export async function issueToken(
  userId: number,
  purpose: TokenPurpose,
  transaction?: Transaction,
  now = new Date(),
): Promise<string> {
  const { AuthToken } = initModels();
  const raw = randomBytes(32).toString('base64url');
  await AuthToken.create(
    {
      userId,
      purpose,
      tokenHash: sha256(raw),
      expiresAt: new Date(now.getTime() + TOKEN_TTL_MS[purpose]),
      usedAt: null,
    },
    { transaction },
  );
  return raw;
}

export type ConsumeResult = { ok: true; userId: number } | { ok: false; reason: 'unknown' | 'used' | 'expired' };

/**
 * Uses a token once. The row is locked and marked used inside the caller's
 * transaction, so two clicks on the same link cannot both succeed.
 */
export async function consumeToken(
  raw: string,
  purpose: TokenPurpose,
  transaction: Transaction,
  now = new Date(),
): Promise<ConsumeResult> {
  const { AuthToken } = initModels();
  if (!/^[A-Za-z0-9_-]{20,100}$/.test(raw)) return { ok: false, reason: 'unknown' };
  const row = await AuthToken.findOne({
    where: { tokenHash: sha256(raw), purpose },
    transaction,
    lock: transaction.LOCK.UPDATE,
  });
  if (!row) return { ok: false, reason: 'unknown' };
  if (row.usedAt) return { ok: false, reason: 'used' };
  if (row.expiresAt.getTime() <= now.getTime()) return { ok: false, reason: 'expired' };
  row.usedAt = now;
  await row.save({ transaction });
  // Other live tokens of the same kind for this member die with it (an older reset link, say).
  await AuthToken.update(
    { usedAt: now },
    { where: { userId: row.userId, purpose, usedAt: { [Op.is]: null } }, transaction },
  );
  return { ok: true, userId: row.userId };
}

export const TOKEN_PROBLEM: Record<'unknown' | 'used' | 'expired', string> = {
  unknown: 'This link is not valid. It may have been copied incompletely.',
  used: 'This link has already been used. Links work once; ask for a new one.',
  expired: 'This link has expired. Ask for a new one.',
};
