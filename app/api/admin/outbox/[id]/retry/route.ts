import { NextResponse } from 'next/server';
import { apiError, serverError } from '@/lib/http/errors';
import { currentUser } from '@/lib/auth/session';
import { can, REFUSAL } from '@/lib/auth/policy';
import { retryFailed } from '@/lib/mail/outbox';

export const dynamic = 'force-dynamic';

/** POST /api/admin/outbox/[id]/retry — puts a failed message back in the queue (admins). */
export async function POST(request: Request, { params }: { params: Promise<{ id: string }> }) {
  try {
    const user = await currentUser(request);
    if (!user) return apiError(401, 'Sign in to see the e-mail outbox.', undefined, 'unauthenticated');
    if (!can(user, 'mail.outbox')) return apiError(403, REFUSAL['mail.outbox'], undefined, 'forbidden');
    const raw = (await params).id;
    const id = /^\d{1,10}$/.test(raw) ? Number(raw) : null;
    if (id === null || !(await retryFailed(id))) return apiError(404, 'There is no failed message with that number.', 'id', 'not_found');
    return NextResponse.json({ id, status: 'pending' });
  } catch (err) {
    return serverError(err);
  }
}
