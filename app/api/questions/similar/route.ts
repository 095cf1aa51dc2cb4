import { NextResponse, type NextRequest } from 'next/server';
import { z } from 'zod';
import { apiError, queryObject, serverError, validationError } from '@/lib/http/errors';
import { similarQuestions } from '@/lib/search/similar';
import { parseUnitPreference, UNITS_COOKIE } from '@/lib/units/preference';
import { SearchUnavailableError } from '@/lib/search';

export const dynamic = 'force-dynamic';
const schema = z.object({
  title: z.string().max(160, 'title: at most 160 characters').optional(),
  tags: z.string().max(300, 'tags: at most 300 characters').default(''),
  fall: z.string().max(40, 'fall: at most 40 characters').optional(),
  lift: z.string().max(40, 'lift: at most 40 characters').optional(),
});

/** GET /api/questions/similar?title=…&tags=a,b&fall=4+ft&lift=29+ft — threads like this one, from search. */
export async function GET(request: NextRequest) {
  const parsed = schema.safeParse(queryObject(request.nextUrl.searchParams));
  if (!parsed.success) return validationError(parsed.error);
  const tags = parsed.data.tags
    .split(',')
    .map((t) => t.trim())
    .filter((t) => /^[a-z0-9-]{2,40}$/.test(t));
  try {
    const units = parseUnitPreference(request.cookies.get(UNITS_COOKIE)?.value);
    return NextResponse.json({ items: await similarQuestions({ ...parsed.data, tags }, 5, units) });
  } catch (err) {
    if (err instanceof SearchUnavailableError) return apiError(503, err.message, undefined, 'search_unavailable');
    return serverError(err);
  }
}
