import { NextResponse } from 'next/server';
import { apiError } from '@/lib/http/errors';
import { readJson } from '@/lib/http/body';
import { guarded, idParam } from '@/lib/http/guard';
import { editPostBody } from '@/lib/questions/posts';
import { editBodySchema } from '@/lib/validation/question';

export const dynamic = 'force-dynamic';

/** PUT /api/answers/:id — its author edits; the old text stays in the history. */
export async function PUT(request: Request, { params }: { params: Promise<{ id: string }> }) {
  const id = idParam((await params).id);
  return guarded(request, 'answer.edit', async (user) => {
    if (!id) return apiError(400, 'id must be an answer number', 'id');
    const body = await readJson(request, editBodySchema);
    if ('response' in body) return body.response;
    await editPostBody(user, 'answer', id, body.data.body);
    return NextResponse.json({ id });
  });
}
