import { NextResponse, type NextRequest } from 'next/server';
import { apiError, queryObject, serverError, validationError } from '@/lib/http/errors';
import { readJson } from '@/lib/http/body';
import { guarded } from '@/lib/http/guard';
import { currentUser } from '@/lib/auth/session';
import { ForumError } from '@/lib/questions/errors';
import { fieldLogEntrySchema, fieldLogFilterSchema } from '@/lib/validation/field-log';
import { createEntry, filteredEntries, sortAndPage } from '@/lib/field-log/store';
import { indexFieldLog } from '@/lib/search';
import { idempotencyKeyOf, once } from '@/lib/http/idempotency';

export const dynamic = 'force-dynamic';

/** GET /api/field-log?pumpSize=1&material=pvc&sort=efficiency&dir=desc&page=1 — a page of entries with the total. */
export async function GET(request: NextRequest) {
  const parsed = fieldLogFilterSchema.safeParse(queryObject(request.nextUrl.searchParams));
  if (!parsed.success) return validationError(parsed.error);
  try {
    const viewer = await currentUser(request);
    return NextResponse.json(sortAndPage(await filteredEntries(parsed.data, viewer), parsed.data));
  } catch (err) {
    if (err instanceof ForumError) return apiError(err.status, err.message, err.field);
    return serverError(err);
  }
}

/** POST /api/field-log — record one test with its bucket trials; the engine checks the numbers. */
export async function POST(request: Request) {
  return guarded(
    request,
    'fieldLog.create',
    async (user) => {
      const key = idempotencyKeyOf(request);
      const body = await readJson(request, fieldLogEntrySchema);
      if ('response' in body) return body.response;
      // a phone that lost the answer sends again with the same key and gets the same entry
      const out = await once(user.id, 'field-log.create', key, body.data, async (transaction) => {
        const e = await createEntry(user, body.data, transaction);
        return { status: 201, body: { id: e.id, url: `/field-log/${e.id}` } };
      });
      if (!out.replayed) await indexFieldLog([out.body.id]);
      return NextResponse.json(out.body, { status: out.status });
    },
    { flood: 'post' },
  );
}
