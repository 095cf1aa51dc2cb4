import { NextResponse } from 'next/server';
import { apiError } from '@/lib/http/errors';
import { guarded, idParam } from '@/lib/http/guard';
import { setFollow } from '@/lib/questions/posts';

export const dynamic = 'force-dynamic';
type Ctx = { params: Promise<{ id: string }> };

async function follow(request: Request, ctx: Ctx, on: boolean) {
  const id = idParam((await ctx.params).id);
  return guarded(request, 'question.follow', async (user) => {
    if (!id) return apiError(400, 'id must be a question number', 'id');
    return NextResponse.json({ following: await setFollow(user, id, on) });
  });
}

/** POST follows the question, DELETE stops following it. */
export const POST = (request: Request, ctx: Ctx) => follow(request, ctx, true);
export const DELETE = (request: Request, ctx: Ctx) => follow(request, ctx, false);
