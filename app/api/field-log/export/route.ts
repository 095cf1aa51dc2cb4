import { type NextRequest } from 'next/server';
import { apiError, queryObject, serverError, validationError } from '@/lib/http/errors';
import { currentUser, type SessionUser } from '@/lib/auth/session';
import { ForumError } from '@/lib/questions/errors';
import { fieldLogFilterSchema } from '@/lib/validation/field-log';
import { EXPORT_CHUNK, entryViewsByIds, filteredIdsInOrder } from '@/lib/field-log/store';
import { exportCsvHeader, exportCsvRows } from '@/lib/field-log/csv';
import { exportSlot } from '@/lib/field-log/export-gate';

export const dynamic = 'force-dynamic';

/**
 * GET /api/field-log/export?pumpSize=1&material=pvc&sort=… — every entry of the
 * filtered view as CSV (not paged). Streamed: the order comes from one light query,
 * then the entries are read EXPORT_CHUNK at a time as the reader takes them, each
 * read a short query through a small gate, so a crowd of exports never holds the
 * pool's connections while writing and other pages keep theirs.
 */
export async function GET(request: NextRequest) {
  const parsed = fieldLogFilterSchema.safeParse(queryObject(request.nextUrl.searchParams));
  if (!parsed.success) return validationError(parsed.error);
  let viewer: SessionUser | null = null;
  let ids: number[];
  const read = (chunk: number[]) => exportSlot(() => entryViewsByIds(chunk, viewer));
  try {
    viewer = await currentUser(request);
    ids = await filteredIdsInOrder(parsed.data, viewer, read, exportSlot);
  } catch (err) {
    if (err instanceof ForumError) return apiError(err.status, err.message, err.field);
    return serverError(err);
  }
  const encoder = new TextEncoder();
  let next = 0;
  const body = new ReadableStream<Uint8Array>({
    start(controller) {
      controller.enqueue(encoder.encode(exportCsvHeader()));
    },
    async pull(controller) {
      if (next >= ids.length) return controller.close();
      const chunk = ids.slice(next, next + EXPORT_CHUNK);
      next += EXPORT_CHUNK;
      try {
        controller.enqueue(encoder.encode(exportCsvRows(await read(chunk))));
      } catch (err) {
        // the status line is sent; all that is left is to end the file short and log why
        console.error('field log export stopped:', err);
        controller.error(err);
      }
    },
  });
  return new Response(body, {
    headers: {
      'content-type': 'text/csv; charset=utf-8',
      'content-disposition': 'attachment; filename="clackwater-field-log.csv"',
      'cache-control': 'no-store',
    },
  });
}
