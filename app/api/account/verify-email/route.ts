import { NextResponse } from 'next/server';
import { tokenSchema } from '@/lib/validation/account';
import { readJson } from '@/lib/http/body';
import { apiError, serverError } from '@/lib/http/errors';
import { verifyEmail } from '@/lib/accounts/service';

export const dynamic = 'force-dynamic';

/** POST /api/account/verify-email { token } — confirms the address; the link works once. */
export async function POST(request: Request) {
  const body = await readJson(request, tokenSchema);
  if ('response' in body) return body.response;
  try {
    const out = await verifyEmail(body.data.token);
    return out.ok
      ? NextResponse.json({ message: 'Your e-mail is confirmed. You can sign in.' })
      : apiError(410, out.message, 'token', 'token_invalid');
  } catch (err) {
    return serverError(err);
  }
}
