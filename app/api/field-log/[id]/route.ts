import { NextResponse, type NextRequest } from 'next/server';
import { apiError, serverError } from '@/lib/http/errors';
import { idParam } from '@/lib/http/guard';
import { currentUser } from '@/lib/auth/session';
import { getEntry, linksOf } from '@/lib/field-log/store';

export const dynamic = 'force-dynamic';
type Ctx = { params: Promise<{ id: string }> };

/** GET /api/field-log/:id — the entry, measured against predicted, and its before/after links. */
export async function GET(request: NextRequest, { params }: Ctx) {
  const id = idParam((await params).id);
  if (!id) return apiError(400, 'id must be a field log entry number', 'id');
  try {
    const entry = await getEntry(id, await currentUser(request));
    if (!entry) return apiError(404, 'no such field log entry', 'id');
    return NextResponse.json({ ...entry, links: await linksOf(id) });
  } catch (err) {
    return serverError(err);
  }
}
