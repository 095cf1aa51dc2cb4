import { NextResponse } from 'next/server';
import { emailOnlySchema } from '@/lib/validation/account';
import { readJson } from '@/lib/http/body';
import { apiError, serverError } from '@/lib/http/errors';
import { clientIp, limitMessage, spend } from '@/lib/auth/rate-limit';
import { accountLimitKey } from '@/lib/auth/account-key';
import { requestPasswordReset } from '@/lib/accounts/service';

export const dynamic = 'force-dynamic';

const SENT = 'If that address has an account, a link to reset its password is on its way.';

/** POST /api/account/password-reset { email } — the same answer whether or not the account exists. */
export async function POST(request: Request) {
  const body = await readJson(request, emailOnlySchema);
  if ('response' in body) return body.response;
  try {
    const limited = await spend([
      ['resetIp', clientIp(request.headers)],
      ['resetAccount', await accountLimitKey(body.data.email)],
    ]);
    if (!limited.ok) return apiError(429, limitMessage(limited.retryAfterS), undefined, 'rate_limited');
    // answered before the look-up: the time taken says nothing about the account
    requestPasswordReset(body.data.email);
    return NextResponse.json({ message: SENT }, { status: 202 });
  } catch (err) {
    return serverError(err);
  }
}
