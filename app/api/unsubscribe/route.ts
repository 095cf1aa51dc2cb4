import { NextResponse } from 'next/server';
import { apiError, serverError } from '@/lib/http/errors';
import { applyUnsubscribe } from '@/lib/mail/unsubscribe-apply';

export const dynamic = 'force-dynamic';

function linkParams(request: Request) {
  const q = new URL(request.url).searchParams;
  return { u: q.get('u'), s: q.get('s'), t: q.get('t') };
}

/**
 * POST /api/unsubscribe?u=…&s=…&t=… — the one-click unsubscribe of RFC 8058 (mail
 * programs POST "List-Unsubscribe=One-Click" here from the List-Unsubscribe header),
 * and the button on /unsubscribe. Needs no session: the signature is the proof.
 */
export async function POST(request: Request) {
  try {
    const out = await applyUnsubscribe(linkParams(request));
    if (!out.ok)
      return apiError(out.status, out.message, out.field, out.status === 403 ? 'bad_signature' : 'invalid_link');
    return NextResponse.json({ ok: true, scope: out.scope, message: out.message });
  } catch (err) {
    return serverError(err);
  }
}

/** GET on the header's address (a reader who pastes it into a browser) shows the page, which asks first. */
export async function GET(request: Request) {
  const url = new URL(request.url);
  return NextResponse.redirect(new URL(`/unsubscribe${url.search}`, url), 303);
}
