import { NextResponse } from 'next/server';
import { apiError } from '@/lib/http/errors';
import { readJson } from '@/lib/http/body';
import { guarded, idParam } from '@/lib/http/guard';
import { chooseFixed } from '@/lib/questions/posts';
import { fixedItSchema } from '@/lib/validation/question';

export const dynamic = 'force-dynamic';

/**
 * PUT /api/questions/:id/fixed { answerId, whatFixedIt } — the asker's "fixed it" choice
 * with their one line saying what the fix was; { answerId: null } takes it back.
 */
export async function PUT(request: Request, { params }: { params: Promise<{ id: string }> }) {
  const id = idParam((await params).id);
  return guarded(request, 'question.markFixed', async (user) => {
    if (!id) return apiError(400, 'id must be a question number', 'id');
    const body = await readJson(request, fixedItSchema);
    if ('response' in body) return body.response;
    const { answerId, whatFixedIt } = body.data;
    const choice = answerId === null ? null : { answerId, whatFixedIt: whatFixedIt! };
    await chooseFixed(user, id, choice);
    return NextResponse.json({ fixedAnswerId: answerId, whatFixedIt: choice?.whatFixedIt ?? null });
  });
}
