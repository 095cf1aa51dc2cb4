import { NextResponse } from 'next/server';
import { apiError } from '@/lib/http/errors';
import { readJson } from '@/lib/http/body';
import { guarded, idParam } from '@/lib/http/guard';
import { postReply } from '@/lib/questions/posts';
import { replySchema } from '@/lib/validation/question';

export const dynamic = 'force-dynamic';

/** POST /api/questions/:id/replies — a reply under the question, an answer or another reply. */
export async function POST(request: Request, { params }: { params: Promise<{ id: string }> }) {
  const id = idParam((await params).id);
  return guarded(
    request,
    'reply.post',
    async (user) => {
      if (!id) return apiError(400, 'id must be a question number', 'id');
      const body = await readJson(request, replySchema);
      if ('response' in body) return body.response;
      const r = await postReply(user, id, body.data);
      return NextResponse.json({ id: r.id, depth: r.depth }, { status: 201 });
    },
    { flood: 'post' },
  );
}
