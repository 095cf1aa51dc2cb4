import { NextResponse, type NextRequest } from 'next/server';
import { z } from 'zod';
import { POST_TYPES } from '@/lib/vocabulary';
import { apiError, queryObject, serverError, validationError } from '@/lib/http/errors';
import { idParam } from '@/lib/http/guard';
import { currentUser } from '@/lib/auth/session';
import { listRevisions } from '@/lib/questions/thread';
import { ForumError } from '@/lib/questions/errors';

export const dynamic = 'force-dynamic';
const schema = z.object({
  postType: z.enum(POST_TYPES, { error: 'postType must be question, answer or reply' }).default('question'),
  postId: z
    .string()
    .regex(/^\d{1,10}$/, 'postId must be a number')
    .transform(Number)
    .optional(),
});

/**
 * GET /api/questions/:id/revisions?postType=&postId= — every version of a post in this
 * thread, oldest first; a post the reader may not see in the thread is not found here either.
 */
export async function GET(request: NextRequest, { params }: { params: Promise<{ id: string }> }) {
  const id = idParam((await params).id);
  if (!id) return apiError(400, 'id must be a question number', 'id');
  const parsed = schema.safeParse(queryObject(request.nextUrl.searchParams));
  if (!parsed.success) return validationError(parsed.error);
  try {
    const postId = parsed.data.postType === 'question' ? id : parsed.data.postId;
    if (!postId) return apiError(400, 'postId is required for answers and replies', 'postId');
    const viewer = await currentUser(request);
    const revisions = await listRevisions(viewer, id, parsed.data.postType, postId);
    // a moderator's view of a hidden post must not be kept by a shared cache
    return NextResponse.json({ revisions }, { headers: { 'Cache-Control': 'private, no-store' } });
  } catch (err) {
    if (err instanceof ForumError) return apiError(err.status, err.message, err.field);
    return serverError(err);
  }
}
