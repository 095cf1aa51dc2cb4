import { type NextRequest } from 'next/server';
import { apiError, queryObject, serverError, validationError } from '@/lib/http/errors';
import { currentUser } from '@/lib/auth/session';
import { ForumError } from '@/lib/forum/errors';
import { fieldLogFilterSchema } from '@/lib/validation/field-log';
import { filteredEntries, sortAndPage } from '@/lib/field-log/store';
import { exportCsv } from '@/lib/field-log/csv';

export const dynamic = 'force-dynamic';

/** GET /api/field-log/export?pumpSize=1&material=pvc&sort=… — every entry of the filtered view as CSV (not paged). */
export async function GET(request: NextRequest) {
  const parsed = fieldLogFilterSchema.safeParse(queryObject(request.nextUrl.searchParams));
  if (!parsed.success) return validationError(parsed.error);
  try {
    const all = await filteredEntries(parsed.data, await currentUser(request));
    const { items } = sortAndPage(all, { ...parsed.data, page: 1, perPage: Math.max(all.length, 1) });
    return new Response(exportCsv(items), {
      headers: { 'content-type': 'text/csv; charset=utf-8', 'content-disposition': 'attachment; filename="clackwater-field-log.csv"', 'cache-control': 'no-store' },
    });
  } catch (err) {
    if (err instanceof ForumError) return apiError(err.status, err.message, err.field);
    return serverError(err);
  }
}
