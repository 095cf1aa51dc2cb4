import { NextResponse } from 'next/server';
import { readJson } from '@/lib/http/body';
import { apiError } from '@/lib/http/errors';
import { guarded, idParam } from '@/lib/http/guard';
import { liftSuspensionSchema } from '@/lib/validation/moderation';
import { liftSuspension } from '@/lib/moderation/suspensions';

export const dynamic = 'force-dynamic';

/** POST /api/review/suspensions/:id/lift — ends a member's suspension now, with a reason the member is told. */
export async function POST(request: Request, { params }: { params: Promise<{ id: string }> }) {
  return guarded(request, 'moderation.act', async (user) => {
    const id = idParam((await params).id);
    if (id === undefined) return apiError(404, 'There is no such member.', 'id', 'not_found');
    const body = await readJson(request, liftSuspensionSchema);
    if ('response' in body) return body.response;
    return NextResponse.json(await liftSuspension(user, id, body.data.reason));
  });
}
