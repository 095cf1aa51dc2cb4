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
import { clientIp, forgive, limitMessage, spend } from './rate-limit';
import { authSecret } from './secret';

/** Errors sign-in forms show; next-auth passes the message through as `error`. */
export const SIGN_IN_ERRORS = {
  wrong: 'That e-mail and password do not match an account.',
  unverified: 'Confirm your e-mail first: follow the link we sent when you signed up.',
} as const;

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
        const email = String(credentials?.email ?? '').trim().toLowerCase();
        const password = String(credentials?.password ?? '');
        const ip = clientIp((req?.headers ?? {}) as Record<string, string>);
        const limited = await spend([
          ['signInIp', ip],
          ['signInAccount', email || '(none)'],
        ]);
        if (!limited.ok) throw new Error(limitMessage(limited.retryAfterS));
        const { User } = initModels();
        const user = await User.unscoped().findOne({ where: { email } });
        // Verify even when there is no such account, so timing does not tell.
        const good = await verifyPassword(user?.passwordHash ?? DUMMY_HASH, password);
        if (!user || !good) throw new Error(SIGN_IN_ERRORS.wrong);
        if (!user.emailVerifiedAt) throw new Error(SIGN_IN_ERRORS.unverified);
        await forgive('signInAccount', email);
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
        const { User } = initModels();
        const user = await User.findOne({ where: { email: identifier.trim().toLowerCase() } });
        if (!user) return;
        try {
          await sendMail(signInLinkMessage(user.email, user.displayName, url));
        } catch (err) {
          // The same answer either way; the failure is for the server log.
          console.error(`sign-in link to ${user.email} not sent: ${err instanceof Error ? err.message : String(err)}`);
        }
      },
    }),
  ],
  callbacks: {
    async jwt({ token, user }) {
      if (user) {
        // A link sign-in hands us the adapter's view of the user; read role and handle from ours.
        const { User } = initModels();
        const u = await User.findByPk(Number(user.id), { attributes: ['id', 'role', 'handle'] });
        if (u) {
          token.uid = u.id;
          token.role = u.role;
          token.handle = u.handle;
        }
      }
      return token;
    },
    async session({ session, token }) {
      session.user = { ...session.user, id: Number(token.uid), role: String(token.role), handle: String(token.handle) } as typeof session.user;
      return session;
    },
  },
};

/** A real argon2id hash of a random string, verified against when no account matches. */
const DUMMY_HASH = '$argon2id$v=19$m=19456,t=2,p=1$c2FsdHNhbHRzYWx0c2FsdA$JkqPvnfpWCk7hoAkDRrNvq+mlS/+uCe9+iBwOgV/NsI';
