import { NextResponse, type NextRequest } from 'next/server';
import { apiError, serverError } from '@/lib/http/errors';
import { readJson } from '@/lib/http/body';
import { guarded, idParam } from '@/lib/http/guard';
import { currentUser } from '@/lib/auth/session';
import { loadThread } from '@/lib/questions/thread';
import { editQuestion } from '@/lib/questions/posts';
import { ForumError } from '@/lib/questions/errors';
import { editQuestionSchema } from '@/lib/validation/question';

export const dynamic = 'force-dynamic';
type Ctx = { params: Promise<{ id: string }> };

/** GET /api/questions/:id — the whole thread, with the viewer's own marks. */
export async function GET(request: NextRequest, { params }: Ctx) {
  const id = idParam((await params).id);
  if (!id) return apiError(400, 'id must be a question number', 'id');
  try {
    const viewer = await currentUser(request);
    // the reader's own marks, and for moderators hidden posts: never for a shared cache
    return NextResponse.json(await loadThread(id, viewer), { headers: { 'Cache-Control': 'private, no-store' } });
  } catch (err) {
    if (err instanceof ForumError) return apiError(err.status, err.message, err.field);
    return serverError(err);
  }
}

/** PUT /api/questions/:id — the asker edits; the old text stays in the revision history. */
export async function PUT(request: Request, { params }: Ctx) {
  const id = idParam((await params).id);
  return guarded(request, 'question.edit', async (user) => {
    if (!id) return apiError(400, 'id must be a question number', 'id');
    const body = await readJson(request, editQuestionSchema);
    if ('response' in body) return body.response;
    await editQuestion(user, id, body.data);
    return NextResponse.json({ id });
  });
}
