import { UniqueConstraintError } from 'sequelize';
import { getSequelize } from '@/lib/db';
import { initModels } from '@/models';
import { hashPassword, passwordProblem } from '@/lib/auth/password';
import { consumeToken, issueToken, TOKEN_PROBLEM } from '@/lib/auth/tokens';
import { sendMail, type Message } from '@/lib/mail/transport';
import { resetPasswordMessage, verifyEmailMessage } from '@/lib/mail/account-messages';

export type Outcome = { ok: true; mailed: boolean } | { ok: false; status: number; field?: string; message: string };

/** Sends after the transaction committed; a mail failure is reported, never loses the account. */
async function trySend(m: Message): Promise<boolean> {
  try {
    await sendMail(m);
    return true;
  } catch (err) {
    console.error(`mail to ${m.to} not sent: ${err instanceof Error ? err.message : String(err)}`);
    return false;
  }
}

/**
 * Creates an unverified member and e-mails a confirmation link. An address that
 * already has an account gets the same answer, and its owner a note, so the form
 * cannot be used to find out who is a member.
 */
export async function signUp(input: { email: string; password: string; handle: string; displayName: string }): Promise<Outcome> {
  const problem = passwordProblem(input.password, [input.email, input.handle, input.displayName]);
  if (problem) return { ok: false, status: 422, field: 'password', message: `password ${problem}` };
  const { User } = initModels();
  const existing = await User.findOne({ where: { email: input.email } });
  if (existing) {
    const mailed = await trySend({
      to: existing.email,
      subject: 'Someone tried to sign up with your e-mail',
      text: `Hello ${existing.displayName},\n\nSomeone tried to create a Clackwater account with this address, which already has one. If it was you, sign in or reset your password.\n\n— Clackwater`,
    });
    return { ok: true, mailed };
  }
  const passwordHash = await hashPassword(input.password);
  let token: string;
  let user;
  try {
    ({ user, token } = await getSequelize().transaction(async (transaction) => {
      const u = await User.create(
        { email: input.email, handle: input.handle, displayName: input.displayName, passwordHash, role: 'member', region: null, bio: null },
        { transaction },
      );
      return { user: u, token: await issueToken(u.id, 'verify-email', transaction) };
    }));
  } catch (err) {
    if (err instanceof UniqueConstraintError) {
      const field = err.errors.some((e) => e.path?.includes('handle')) ? 'handle' : 'email';
      if (field === 'handle') return { ok: false, status: 409, field, message: 'handle is taken; choose another' };
      return { ok: true, mailed: false };
    }
    throw err;
  }
  return { ok: true, mailed: await trySend(verifyEmailMessage(user.email, user.displayName, token)) };
}

export async function verifyEmail(token: string): Promise<{ ok: true } | { ok: false; message: string }> {
  const { User } = initModels();
  return getSequelize().transaction(async (transaction) => {
    const used = await consumeToken(token, 'verify-email', transaction);
    if (!used.ok) return { ok: false as const, message: TOKEN_PROBLEM[used.reason] };
    await User.update({ emailVerifiedAt: new Date() }, { where: { id: used.userId }, transaction });
    return { ok: true as const };
  });
}

/** E-mails a reset link when the address has an account; the answer is the same either way. */
export async function requestPasswordReset(email: string): Promise<void> {
  const { User } = initModels();
  const user = await User.findOne({ where: { email } });
  if (!user) return;
  const token = await getSequelize().transaction((t) => issueToken(user.id, 'reset-password', t));
  await trySend(resetPasswordMessage(user.email, user.displayName, token));
}

export async function resetPassword(token: string, password: string): Promise<{ ok: true } | { ok: false; field: string; message: string }> {
  const problem = passwordProblem(password);
  if (problem) return { ok: false, field: 'password', message: `password ${problem}` };
  const passwordHash = await hashPassword(password);
  const { User } = initModels();
  return getSequelize().transaction(async (transaction) => {
    const used = await consumeToken(token, 'reset-password', transaction);
    if (!used.ok) return { ok: false as const, field: 'token', message: TOKEN_PROBLEM[used.reason] };
    // A reset link reaches the inbox, so it also proves the address.
    await User.unscoped().update({ passwordHash, emailVerifiedAt: new Date() }, { where: { id: used.userId }, transaction });
    return { ok: true as const };
  });
}
