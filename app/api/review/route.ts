import { NextResponse, type NextRequest } from 'next/server';
import { queryObject, validationError } from '@/lib/http/errors';
import { guarded } from '@/lib/http/guard';
import { reviewFilterSchema } from '@/lib/validation/moderation';
import { reviewQueue } from '@/lib/moderation/queue';

export const dynamic = 'force-dynamic';

/** GET /api/review?reason=&olderThanHours= — the review queue (moderators). */
export async function GET(request: NextRequest) {
  return guarded(request, 'moderation.act', async () => {
    const parsed = reviewFilterSchema.safeParse(queryObject(request.nextUrl.searchParams));
    if (!parsed.success) return validationError(parsed.error);
    return NextResponse.json(await reviewQueue(parsed.data));
  });
}
