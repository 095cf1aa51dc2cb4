import { NextResponse } from 'next/server';
import { emailOnlySchema } from '@/lib/validation/account';
import { readJson } from '@/lib/http/body';
import { apiError, serverError } from '@/lib/http/errors';
import { clientIp, limitMessage, spend } from '@/lib/auth/rate-limit';
import { requestSignInLink } from '@/lib/accounts/service';

export const dynamic = 'force-dynamic';

/** POST /api/account/sign-in-link { email } — e-mails a one-time link; the same answer for any address. */
export async function POST(request: Request) {
  const body = await readJson(request, emailOnlySchema);
  if ('response' in body) return body.response;
  const limited = await spend([
    ['linkIp', clientIp(request.headers)],
    ['linkAccount', body.data.email],
  ]);
  if (!limited.ok) return apiError(429, limitMessage(limited.retryAfterS), undefined, 'rate_limited');
  try {
    await requestSignInLink(body.data.email);
    return NextResponse.json({ message: 'If that address has an account, a sign-in link is on its way.' }, { status: 202 });
  } catch (err) {
    return serverError(err);
  }
}
