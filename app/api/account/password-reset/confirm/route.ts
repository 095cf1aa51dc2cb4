import { NextResponse } from 'next/server';
import { newPasswordSchema } from '@/lib/validation/account';
import { readJson } from '@/lib/http/body';
import { apiError, serverError } from '@/lib/http/errors';
import { resetPassword } from '@/lib/accounts/service';

export const dynamic = 'force-dynamic';

/** POST /api/account/password-reset/confirm { token, password } — single use, one hour. */
export async function POST(request: Request) {
  const body = await readJson(request, newPasswordSchema);
  if ('response' in body) return body.response;
  try {
    const out = await resetPassword(body.data.token, body.data.password);
    if (!out.ok) return apiError(out.field === 'token' ? 410 : 422, out.message, out.field);
    return NextResponse.json({ message: 'Your password is changed. Sign in with it now.' });
  } catch (err) {
    return serverError(err);
  }
}
