import { NextResponse } from 'next/server';
import { signUpSchema } from '@/lib/validation/account';
import { readJson } from '@/lib/http/body';
import { apiError, serverError } from '@/lib/http/errors';
import { clientIp, limitMessage, spend } from '@/lib/auth/rate-limit';
import { signUp } from '@/lib/accounts/service';

export const dynamic = 'force-dynamic';

/** POST /api/account/sign-up — the same 202 whether or not the e-mail already has an account. */
export async function POST(request: Request) {
  const body = await readJson(request, signUpSchema);
  if ('response' in body) return body.response;
  const limited = await spend([['signUpIp', clientIp(request.headers)]]);
  if (!limited.ok) return apiError(429, limitMessage(limited.retryAfterS), undefined, 'rate_limited');
  try {
    const out = await signUp(body.data);
    if (!out.ok) return apiError(out.status, out.message, out.field);
    // the same words whether the address is new or taken; the mail goes out after this answer
    return NextResponse.json({ message: 'Check your e-mail for a link to confirm your address.' }, { status: 202 });
  } catch (err) {
    return serverError(err);
  }
}
