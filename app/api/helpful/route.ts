import { NextResponse } from 'next/server';
import { readJson } from '@/lib/http/body';
import { guarded } from '@/lib/http/guard';
import { markHelpful } from '@/lib/questions/posts';
import { helpfulSchema } from '@/lib/validation/question';

export const dynamic = 'force-dynamic';

async function mark(request: Request, on: boolean) {
  return guarded(request, 'post.markHelpful', async (user) => {
    const body = await readJson(request, helpfulSchema);
    if ('response' in body) return body.response;
    const count = await markHelpful(user, body.data.postType, body.data.postId, on);
    return NextResponse.json({ helpfulCount: count, marked: on }, { status: on ? 201 : 200 });
  });
}

/** POST marks a post helpful (one per member, never one's own); DELETE takes the mark back. */
export const POST = (request: Request) => mark(request, true);
export const DELETE = (request: Request) => mark(request, false);
