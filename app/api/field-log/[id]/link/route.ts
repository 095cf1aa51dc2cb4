import { NextResponse } from 'next/server';
import { apiError } from '@/lib/http/errors';
import { readJson } from '@/lib/http/body';
import { guarded, idParam } from '@/lib/http/guard';
import { fieldLogLinkSchema } from '@/lib/validation/field-log';
import { linkEntries } from '@/lib/field-log/store';

export const dynamic = 'force-dynamic';
type Ctx = { params: Promise<{ id: string }> };

/** POST /api/field-log/:id/link — links this (the author's own) entry as the after of an earlier one on the same site. */
export async function POST(request: Request, { params }: Ctx) {
  const id = idParam((await params).id);
  return guarded(request, 'fieldLog.edit', async (user) => {
    if (!id) return apiError(400, 'id must be a field log entry number', 'id');
    const body = await readJson(request, fieldLogLinkSchema);
    if ('response' in body) return body.response;
    await linkEntries(user, id, body.data);
    return NextResponse.json(
      { beforeId: body.data.beforeId, afterId: id, url: `/field-log/compare/${body.data.beforeId}/${id}` },
      { status: 201 },
    );
  });
}
