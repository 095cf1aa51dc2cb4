import { NextResponse } from 'next/server';
import { z } from 'zod';
import { apiError } from '@/lib/http/errors';
import { readJson } from '@/lib/http/body';
import { guarded, idParam } from '@/lib/http/guard';
import { chooseFixed } from '@/lib/questions/posts';

export const dynamic = 'force-dynamic';
const schema = z.object({
  answerId: z.number({ error: 'answerId must be a number or null' }).int().positive().nullable(),
});

/** PUT /api/questions/:id/fixed { answerId | null } — the asker's "fixed it" choice. */
export async function PUT(request: Request, { params }: { params: Promise<{ id: string }> }) {
  const id = idParam((await params).id);
  return guarded(request, 'question.markFixed', async (user) => {
    if (!id) return apiError(400, 'id must be a question number', 'id');
    const body = await readJson(request, schema);
    if ('response' in body) return body.response;
    await chooseFixed(user, id, body.data.answerId);
    return NextResponse.json({ fixedAnswerId: body.data.answerId });
  });
}
