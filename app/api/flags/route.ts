import { NextResponse } from 'next/server';
import { readJson } from '@/lib/http/body';
import { guarded } from '@/lib/http/guard';
import { flagSchema } from '@/lib/validation/moderation';
import { flagPost } from '@/lib/moderation/flags';

export const dynamic = 'force-dynamic';

/** POST /api/flags — a member flags a post for the review queue. */
export async function POST(request: Request) {
  return guarded(
    request,
    'post.flag',
    async (user) => {
      const body = await readJson(request, flagSchema);
      if ('response' in body) return body.response;
      return NextResponse.json(await flagPost(user, body.data), { status: 201 });
    },
    { flood: 'flag' },
  );
}
