import { UniqueConstraintError } from 'sequelize';
import { getSequelize } from '@/lib/db';
import { initModels } from '@/models';
import { hashPassword, passwordProblem } from '@/lib/auth/password';
import { consumeToken, issueToken, TOKEN_PROBLEM } from '@/lib/auth/tokens';
import { sameAddress } from '@/lib/auth/account-key';
import { bumpSessionVersion } from '@/lib/auth/session-version';
import { inBackground } from './background';
import { sendMail, type Message } from '@/lib/mail/transport';
import { resetPasswordMessage, verifyEmailMessage } from '@/lib/mail/account-messages';

export type Outcome = { ok: true } | { ok: false; status: number; field?: string; message: string };

/** Sends after the answer went out; a mail failure is logged, never loses the account. */
function sendLater(what: string, message: () => Promise<Message | null>): void {
  inBackground(what, async () => {
    const m = await message();
    if (m) await sendMail(m);
  });
}

/**
 * Creates an unverified member and e-mails a confirmation link. An address that
 * already has an account gets the same answer, and its owner a note, so the form
 * cannot be used to find out who is a member: the handle is checked first (handles
 * are public, on every post), the password is hashed either way, and the mail goes
 * out after the answer.
 */
export async function signUp(input: {
  email: string;
  password: string;
  handle: string;
  displayName: string;
}): Promise<Outcome> {
  const problem = passwordProblem(input.password, [input.email, input.handle, input.displayName]);
  if (problem) return { ok: false, status: 422, field: 'password', message: `password ${problem}` };
  const { User } = initModels();
  if (await User.findOne({ where: { handle: input.handle }, attributes: ['id'] })) return HANDLE_TAKEN;
  const passwordHash = await hashPassword(input.password);
  // the collation's match: an address that only differs in case, accents or width is the same account
  const existing = await User.findOne({ where: { email: input.email } });
  if (existing) {
    sendLater(`sign-up note to account ${existing.id}`, async () => ({
      to: existing.email,
      subject: 'Someone tried to sign up with your e-mail',
      text: `Hello ${existing.displayName},\n\nSomeone tried to create a Clackwater account with this address, which already has one. If it was you, sign in or reset your password.\n\n— Clackwater`,
    }));
    return { ok: true };
  }
  let token: string;
  let user;
  try {
    ({ user, token } = await getSequelize().transaction(async (transaction) => {
      const u = await User.create(
        {
          email: input.email,
          handle: input.handle,
          displayName: input.displayName,
          passwordHash,
          role: 'member',
          region: null,
          bio: null,
        },
        { transaction },
      );
      return { user: u, token: await issueToken(u.id, 'verify-email', transaction) };
    }));
  } catch (err) {
    if (err instanceof UniqueConstraintError) {
      // a race with another sign-up: the handle is public, the e-mail is not
      if (err.errors.some((e) => e.path?.includes('handle'))) return HANDLE_TAKEN;
      return { ok: true };
    }
    throw err;
  }
  sendLater(`confirmation for account ${user.id}`, async () => verifyEmailMessage(user.email, user.displayName, token));
  return { ok: true };
}

const HANDLE_TAKEN = { ok: false, status: 409, field: 'handle', message: 'handle is taken; choose another' } as const;

export async function verifyEmail(token: string): Promise<{ ok: true } | { ok: false; message: string }> {
  const { User } = initModels();
  return getSequelize().transaction(async (transaction) => {
    const used = await consumeToken(token, 'verify-email', transaction);
    if (!used.ok) return { ok: false as const, message: TOKEN_PROBLEM[used.reason] };
    await User.update({ emailVerifiedAt: new Date() }, { where: { id: used.userId }, transaction });
    return { ok: true as const };
  });
}

/**
 * E-mails a new confirmation link when the address has an account still waiting
 * for one (the first link lost, or past its 48 hours). Like a reset, it answers
 * before looking, so neither the answer nor its timing says whether the account
 * exists or is already confirmed.
 */
export function requestConfirmationAgain(email: string): void {
  sendLater('confirmation sent again', async () => {
    const { User } = initModels();
    const user = await User.findOne({ where: { email } });
    if (!user || user.emailVerifiedAt || !sameAddress(email, user.email)) return null;
    const token = await getSequelize().transaction((t) => issueToken(user.id, 'verify-email', t));
    return verifyEmailMessage(user.email, user.displayName, token);
  });
}

/**
 * E-mails a reset link when the address has an account. Returns at once, before
 * even looking: the look-up, the token and the SMTP wait run after the answer, so
 * neither the answer nor its timing says whether the account exists.
 */
export function requestPasswordReset(email: string): void {
  sendLater('password reset', async () => {
    const { User } = initModels();
    const user = await User.findOne({ where: { email } });
    if (!user || !sameAddress(email, user.email)) return null;
    const token = await getSequelize().transaction((t) => issueToken(user.id, 'reset-password', t));
    return resetPasswordMessage(user.email, user.displayName, token);
  });
}

export async function resetPassword(
  token: string,
  password: string,
): Promise<{ ok: true } | { ok: false; field: string; message: string }> {
  const problem = passwordProblem(password);
  if (problem) return { ok: false, field: 'password', message: `password ${problem}` };
  const passwordHash = await hashPassword(password);
  const { User } = initModels();
  return getSequelize().transaction(async (transaction) => {
    const used = await consumeToken(token, 'reset-password', transaction);
    if (!used.ok) return { ok: false as const, field: 'token', message: TOKEN_PROBLEM[used.reason] };
    // A reset link reaches the inbox, so it also proves the address.
    await User.unscoped().update(
      { passwordHash, emailVerifiedAt: new Date() },
      { where: { id: used.userId }, transaction },
    );
    // whoever knew the old password is signed out everywhere
    await bumpSessionVersion(used.userId, transaction);
    return { ok: true as const };
  });
}
