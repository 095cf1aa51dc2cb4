import NextAuth from 'next-auth';
import { NextResponse } from 'next/server';
import { authOptions } from '@/lib/auth/options';
import { clientIp, limitMessage, spend } from '@/lib/auth/rate-limit';
import { accountLimitKey } from '@/lib/auth/account-key';

const handler = NextAuth(authOptions);
type Ctx = { params: Promise<{ nextauth: string[] }> };

/**
 * next-auth's own endpoints. Requests for an e-mailed sign-in link are rate-limited
 * per address and per account before next-auth sees them (password sign-in is
 * limited inside its authorize step).
 */
async function POST(request: Request, ctx: Ctx) {
  const { nextauth } = await ctx.params;
  if (nextauth.join('/') === 'signin/email') {
    const form = await request
      .clone()
      .formData()
      .catch(() => null);
    const email = String(form?.get('email') ?? '')
      .trim()
      .toLowerCase();
    const limited = await spend([
      ['linkIp', clientIp(request.headers)],
      // one count per account however the address is spelt (lib/auth/account-key.ts)
      ['linkAccount', await accountLimitKey(email)],
    ]);
    if (!limited.ok) {
      // next-auth's client reads `error` from the returned url's query
      const url = new URL(
        `/sign-in?error=${encodeURIComponent(limitMessage(limited.retryAfterS))}`,
        request.url,
      ).toString();
      return NextResponse.json({ url }, { status: 429 });
    }
  }
  return handler(request, ctx);
}

export { handler as GET, POST };
