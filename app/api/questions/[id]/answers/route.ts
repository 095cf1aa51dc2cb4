import { NextResponse } from 'next/server';
import { apiError } from '@/lib/http/errors';
import { readJson } from '@/lib/http/body';
import { guarded, idParam } from '@/lib/http/guard';
import { postAnswer } from '@/lib/questions/posts';
import { answerSchema } from '@/lib/validation/question';

export const dynamic = 'force-dynamic';

/** POST /api/questions/:id/answers — an answer, optionally with a saved worked calculation. */
export async function POST(request: Request, { params }: { params: Promise<{ id: string }> }) {
  const id = idParam((await params).id);
  return guarded(
    request,
    'answer.post',
    async (user) => {
      if (!id) return apiError(400, 'id must be a question number', 'id');
      const body = await readJson(request, answerSchema);
      if ('response' in body) return body.response;
      const a = await postAnswer(user, id, body.data);
      return NextResponse.json({ id: a.id }, { status: 201 });
    },
    { flood: 'post' },
  );
}
