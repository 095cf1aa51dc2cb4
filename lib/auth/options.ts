import 'server-only';
import type { NextAuthOptions } from 'next-auth';
import CredentialsProvider from 'next-auth/providers/credentials';
import { initModels } from '@/models';
import EmailProvider from 'next-auth/providers/email';
import { getSequelize } from '@/lib/db';
import { mailFrom, sendMail } from '@/lib/mail/transport';
import { signInLinkMessage } from '@/lib/mail/account-messages';
import { clackwaterAdapter } from './adapter';
import { verifyPassword } from './password';
import { clientIp, forgive, limitMessage, refund, spend } from './rate-limit';
import { accountLimitKey, sameAddress } from './account-key';
import { authSecret } from './secret';
import { sameSiteRedirect } from './return-path';
import { tokenVersion } from './session-version';
import { authLogger, SessionRevoked } from './auth-logger';
import { inBackground } from '@/lib/accounts/background';
import { rememberUnits } from '@/lib/units/server';
import { parseUnitPreference } from '@/lib/units/preference';

import { SIGN_IN_ERRORS } from './sign-in-errors';

export { SIGN_IN_ERRORS };

type AuthedUser = { id: string; name: string; email: string; role: string; handle: string };

function toAuthed(u: { id: number; displayName: string; email: string; role: string; handle: string }): AuthedUser {
  return { id: String(u.id), name: u.displayName, email: u.email, role: u.role, handle: u.handle };
}

/**
 * Two ways in, both through next-auth: e-mail and password (argon2id, a credentials
 * provider), and a passwordless link (the e-mail provider, its tokens kept by the
 * Sequelize adapter in `verification_tokens`). Sessions are signed JWTs in an
 * httpOnly, SameSite=Lax cookie.
 */
export const authOptions: NextAuthOptions = {
  secret: authSecret(),
  adapter: clackwaterAdapter(getSequelize()),
  session: { strategy: 'jwt', maxAge: 30 * 24 * 3600 },
  pages: { signIn: '/sign-in', error: '/sign-in' },
  providers: [
    CredentialsProvider({
      id: 'password',
      name: 'E-mail and password',
      credentials: { email: { label: 'E-mail', type: 'email' }, password: { label: 'Password', type: 'password' } },
      async authorize(credentials, req) {
        const email = String(credentials?.email ?? '')
          .trim()
          .toLowerCase();
        const password = String(credentials?.password ?? '');
        const ip = clientIp((req?.headers ?? {}) as Record<string, string>);
        // every spelling the collation folds onto one account spends that account's tries
        const account = await accountLimitKey(email);
        const limited = await spend([
          ['signInIp', ip],
          ['signInAccount', account],
        ]);
        if (!limited.ok) throw new Error(limitMessage(limited.retryAfterS));
        const { User } = initModels();
        // the primary, with read replicas: a password just reset or an address just
        // confirmed counts at once, whatever a replica has applied so far
        const found = await User.unscoped().findOne({ where: { email }, useMaster: true });
        // Only the address as registered signs in, not one the collation merely folds onto it.
        const user = found && sameAddress(email, found.email) ? found : null;
        // Verify even when there is no such account, so timing does not tell.
        const good = await verifyPassword(user?.passwordHash ?? DUMMY_HASH, password);
        if (!user || !good) throw new Error(SIGN_IN_ERRORS.wrong);
        if (!user.emailVerifiedAt) throw new Error(SIGN_IN_ERRORS.unverified);
        await forgive('signInAccount', account);
        await refund([['signInIp', ip]]);
        return toAuthed(user);
      },
    }),
    EmailProvider({
      // The link is sent by our own code, and only to addresses that have an account:
      // everyone who asks gets the same answer, and a link never creates an account.
      server: { host: process.env.SMTP_HOST ?? '127.0.0.1', port: Number(process.env.SMTP_PORT ?? 1025) },
      from: mailFrom(),
      maxAge: 15 * 60,
      async sendVerificationRequest({ identifier, url }) {
        // Answered at once whether or not the address has an account: the look-up and
        // the SMTP wait happen after, so the time taken does not tell either.
        inBackground(`sign-in link for ${identifier}`, async () => {
          const { User } = initModels();
          const user = await User.findOne({ where: { email: identifier.trim().toLowerCase() } });
          if (!user || !sameAddress(identifier, user.email)) return;
          await sendMail(signInLinkMessage(user.email, user.displayName, url));
        });
      },
    }),
  ],
  logger: authLogger,
  callbacks: {
    async jwt({ token, user }) {
      const { User, Notice } = initModels();
      const unread = (userId: number) => Notice.count({ where: { userId, readAt: null } });
      if (user) {
        // A link sign-in hands us the adapter's view of the user; read role and handle from ours.
        const u = await User.findByPk(Number(user.id), {
          attributes: ['id', 'role', 'handle', 'sessionVersion', 'units'],
          // the session version a reset just raised, not a replica's older one
          useMaster: true,
        });
        if (u) {
          token.uid = u.id;
          token.role = u.role;
          token.handle = u.handle;
          token.sv = u.sessionVersion;
          token.units = u.units;
          token.unread = await unread(u.id);
          // a fresh browser's first page after signing in is drawn in the member's saved units
          await rememberUnits(u.units);
        }
        return token;
      }
      // Every later read of the session (the browser's /api/auth/session, getServerSession):
      // a token behind the account's session version is over, and next-auth clears its cookie.
      const uid = Number(token.uid);
      const u =
        Number.isInteger(uid) && uid > 0
          ? await User.findByPk(uid, { attributes: ['id', 'sessionVersion', 'units'] })
          : null;
      if (!u || u.sessionVersion !== tokenVersion(token)) throw new SessionRevoked();
      // the saved units as they are now, so a change made in another browser reaches this one
      token.units = u.units;
      // a moderator's notice reaches the header's badge at the next session read
      token.unread = await unread(u.id);
      return token;
    },
    redirect({ url, baseUrl }) {
      return sameSiteRedirect(url, baseUrl);
    },
    async session({ session, token }) {
      session.user = {
        ...session.user,
        id: Number(token.uid),
        role: String(token.role),
        handle: String(token.handle),
        units: parseUnitPreference(token.units),
        unreadNotices: Number(token.unread ?? 0),
      } as typeof session.user;
      return session;
    },
  },
};

/** A real argon2id hash of a random string, verified against when no account matches. */
const DUMMY_HASH = '$argon2id$v=19$m=19456,t=2,p=1$c2FsdHNhbHRzYWx0c2FsdA$JkqPvnfpWCk7hoAkDRrNvq+mlS/+uCe9+iBwOgV/NsI';
