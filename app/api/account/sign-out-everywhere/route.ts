import { NextResponse } from 'next/server';
import { guarded } from '@/lib/http/guard';
import { endAllSessions } from '@/lib/auth/session-version';

export const dynamic = 'force-dynamic';

const SESSION_COOKIES = ['next-auth.session-token', '__Secure-next-auth.session-token'];

/**
 * POST /api/account/sign-out-everywhere — ends every session of the caller's own
 * account, this one included: each browser, and any copy of a session cookie,
 * is signed out on its next request.
 */
export async function POST(request: Request) {
  return guarded(request, 'session.revokeAll', async (user) => {
    await endAllSessions(user.id);
    const res = NextResponse.json({ message: 'Signed out everywhere. Sign in again on each device you use.' });
    for (const name of SESSION_COOKIES)
      res.cookies.set(name, '', {
        path: '/',
        maxAge: 0,
        httpOnly: true,
        sameSite: 'lax',
        secure: name.startsWith('__Secure-'),
      });
    return res;
  });
}
