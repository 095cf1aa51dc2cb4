import { NextResponse, type NextRequest } from 'next/server';
import { listPageSchema } from '@/lib/validation/list-page';
import { queryObject, serverError, validationError } from '@/lib/http/errors';
import { listQuestions } from '@/lib/questions/list';
import { askQuestionSchema } from '@/lib/validation/question';
import { readJson } from '@/lib/http/body';
import { guarded } from '@/lib/http/guard';
import { askQuestion } from '@/lib/questions/posts';

export const dynamic = 'force-dynamic';

/** GET /api/questions?page=1&perPage=20 (or ?after= / ?before= a place the list gave) — newest first, with the total. */
export async function GET(request: NextRequest) {
  const parsed = listPageSchema.safeParse(queryObject(request.nextUrl.searchParams));
  if (!parsed.success) return validationError(parsed.error);
  try {
    return NextResponse.json(await listQuestions(parsed.data));
  } catch (err) {
    return serverError(err);
  }
}

/** POST /api/questions — ask, with a site sheet (checked by the engine) and photos; one transaction. */
export async function POST(request: Request) {
  return guarded(
    request,
    'question.ask',
    async (user) => {
      const body = await readJson(request, askQuestionSchema);
      if ('response' in body) return body.response;
      const q = await askQuestion(user, body.data);
      return NextResponse.json({ id: q.id, url: `/questions/${q.id}` }, { status: 201 });
    },
    { flood: 'post' },
  );
}
