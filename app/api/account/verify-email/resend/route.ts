import { NextResponse } from 'next/server';
import { emailOnlySchema } from '@/lib/validation/account';
import { readJson } from '@/lib/http/body';
import { apiError, serverError } from '@/lib/http/errors';
import { clientIp, limitMessage, spend } from '@/lib/auth/rate-limit';
import { accountLimitKey } from '@/lib/auth/account-key';
import { requestConfirmationAgain } from '@/lib/accounts/service';

export const dynamic = 'force-dynamic';

const CONFIRMATION_SENT =
  'If that address has an account waiting to be confirmed, a new link is on its way. It works once and lasts 48 hours.';

/** POST /api/account/verify-email/resend { email } — the same answer whether or not the account exists. */
export async function POST(request: Request) {
  const body = await readJson(request, emailOnlySchema);
  if ('response' in body) return body.response;
  try {
    const limited = await spend([
      ['confirmIp', clientIp(request.headers)],
      ['confirmAccount', await accountLimitKey(body.data.email)],
    ]);
    if (!limited.ok) return apiError(429, limitMessage(limited.retryAfterS), undefined, 'rate_limited');
    // answered before the look-up: the time taken says nothing about the account
    requestConfirmationAgain(body.data.email);
    return NextResponse.json({ message: CONFIRMATION_SENT }, { status: 202 });
  } catch (err) {
    return serverError(err);
  }
}
