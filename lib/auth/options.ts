import type { NextAuthOptions } from 'next-auth';
import CredentialsProvider from 'next-auth/providers/credentials';
import { initModels } from '@/models';
import { getSequelize } from '@/lib/db';
import { verifyPassword } from './password';
import { consumeToken, TOKEN_PROBLEM } from './tokens';
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
 * Two ways in, both through next-auth: e-mail and password (argon2id), and a
 * passwordless link whose single-use token we issue and e-mail ourselves
 * (lib/auth/tokens.ts), so unknown addresses get the same answer as known ones.
 * Sessions are signed JWTs in an httpOnly, SameSite=Lax cookie.
 */
export const authOptions: NextAuthOptions = {
  secret: authSecret(),
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
    CredentialsProvider({
      id: 'link',
      name: 'Sign-in link',
      credentials: { token: { label: 'Token', type: 'text' } },
      async authorize(credentials) {
        const raw = String(credentials?.token ?? '');
        const sequelize = getSequelize();
        const { User } = initModels();
        const result = await sequelize.transaction(async (transaction) => {
          const used = await consumeToken(raw, 'sign-in-link', transaction);
          if (!used.ok) return used;
          const user = await User.findByPk(used.userId, { transaction });
          if (!user) return { ok: false as const, reason: 'unknown' as const };
          // Following the link proves the address.
          if (!user.emailVerifiedAt) await user.update({ emailVerifiedAt: new Date() }, { transaction });
          return { ok: true as const, user };
        });
        if (!result.ok) throw new Error(TOKEN_PROBLEM[result.reason]);
        return toAuthed(result.user);
      },
    }),
  ],
  callbacks: {
    async jwt({ token, user }) {
      if (user) {
        const u = user as AuthedUser;
        token.uid = Number(u.id);
        token.role = u.role;
        token.handle = u.handle;
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
