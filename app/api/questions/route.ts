import { NextResponse, type NextRequest } from 'next/server';
import { paginationSchema } from '@/lib/validation/pagination';
import { queryObject, serverError, validationError } from '@/lib/http/errors';
import { listQuestions } from '@/lib/questions/list';

export const dynamic = 'force-dynamic';

/** GET /api/questions?page=1&perPage=20 — newest first, with the total. */
export async function GET(request: NextRequest) {
  const parsed = paginationSchema.safeParse(queryObject(request.nextUrl.searchParams));
  if (!parsed.success) return validationError(parsed.error);
  try {
    return NextResponse.json(await listQuestions(parsed.data));
  } catch (err) {
    return serverError(err);
  }
}
