import { NextResponse, type NextRequest } from 'next/server';
import { listPageSchema } from '@/lib/validation/list-page';
import { queryObject, serverError, validationError } from '@/lib/http/errors';
import { listQuestions } from '@/lib/questions/list';
import { askQuestionSchema } from '@/lib/validation/question';
import { readJson } from '@/lib/http/body';
import { guarded } from '@/lib/http/guard';
import { askQuestion, questionAsked } from '@/lib/questions/posts';
import { idempotencyKeyOf, once } from '@/lib/http/idempotency';

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
      const key = idempotencyKeyOf(request);
      const body = await readJson(request, askQuestionSchema);
      if ('response' in body) return body.response;
      // a question posted with no signal and sent again after a lost answer is one thread
      const out = await once(user.id, 'question.ask', key, body.data, async (transaction) => {
        const q = await askQuestion(user, body.data, transaction);
        return { status: 201, body: { id: q.id, url: `/questions/${q.id}` } };
      });
      if (!out.replayed) await questionAsked(out.body.id);
      return NextResponse.json(out.body, { status: out.status });
    },
    { flood: 'post' },
  );
}
