import { NextResponse, type NextRequest } from 'next/server';
import { apiError, queryObject, serverError, validationError } from '@/lib/http/errors';
import { searchQuerySchema } from '@/lib/validation/search';
import { search, SearchUnavailableError } from '@/lib/search';
import { currentUser } from '@/lib/auth/session';
import { can } from '@/lib/auth/policy';
import { parseUnitPreference, UNITS_COOKIE } from '@/lib/units/preference';

export const dynamic = 'force-dynamic';

/**
 * GET /api/search?q=…&kind=question,guide&tag=…&solved=true&level=…&limit=10&offset=0
 * Guides, questions, answers, replies and field log entries; hidden and deleted
 * posts only for moderators.
 */
export async function GET(request: NextRequest) {
  const parsed = searchQuerySchema.safeParse(queryObject(request.nextUrl.searchParams));
  if (!parsed.success) return validationError(parsed.error);
  try {
    const viewer = await currentUser(request);
    const { q, kind, ...rest } = parsed.data;
    const units = parseUnitPreference(request.cookies.get(UNITS_COOKIE)?.value);
    const result = await search({ q, kinds: kind, ...rest }, { seeHidden: can(viewer, 'moderation.seeHidden'), units });
    return NextResponse.json(result, { headers: { 'Cache-Control': 'private, no-store' } });
  } catch (err) {
    if (err instanceof SearchUnavailableError) return apiError(503, err.message, undefined, 'search_unavailable');
    return serverError(err);
  }
}
