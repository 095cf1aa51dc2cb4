import { NextResponse } from 'next/server';
import { apiError } from '@/lib/http/errors';
import { guarded, idParam } from '@/lib/http/guard';
import { retryFailed } from '@/lib/mail/outbox';

export const dynamic = 'force-dynamic';

/** POST /api/admin/outbox/[id]/retry — puts a failed message back in the queue (admins). */
export async function POST(request: Request, { params }: { params: Promise<{ id: string }> }) {
  return guarded(request, 'mail.outbox', async () => {
    const id = idParam((await params).id);
    if (id === undefined || !(await retryFailed(id)))
      return apiError(404, 'There is no failed message with that number.', 'id', 'not_found');
    return NextResponse.json({ id, status: 'pending' });
  });
}
