import { NextResponse } from 'next/server';
import { guarded } from '@/lib/http/guard';
import { listSuspended } from '@/lib/moderation/suspensions';

export const dynamic = 'force-dynamic';

/** GET /api/review/suspensions — the accounts suspended now, with the reason (moderators). */
export async function GET(request: Request) {
  return guarded(request, 'moderation.act', async () => NextResponse.json({ items: await listSuspended() }));
}
