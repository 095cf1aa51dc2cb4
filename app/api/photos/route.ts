import { NextResponse } from 'next/server';
import { apiError, serverError } from '@/lib/http/errors';
import { currentUser } from '@/lib/auth/session';
import { can, REFUSAL } from '@/lib/auth/policy';
import { spend } from '@/lib/auth/rate-limit';
import { ingestUpload, UploadRefused } from '@/lib/photos/ingest';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

/**
 * POST /api/photos — multipart field `photos` (up to 6 JPEG, PNG or WebP files) and
 * an optional `alt` per photo. Answers 201 with the stored photos, unattached: the
 * question or answer that uses them attaches them by id when it is saved.
 */
export async function POST(request: Request) {
  const user = await currentUser(request);
  if (!user) return apiError(401, REFUSAL['photo.upload'], undefined, 'unauthenticated');
  if (!can(user, 'photo.upload')) return apiError(403, REFUSAL['photo.upload'], undefined, 'forbidden');
  if (!/^multipart\/form-data;/i.test(request.headers.get('content-type') ?? '')) {
    return apiError(400, 'Send photos as multipart/form-data in the field “photos”.', 'photos', 'not_multipart');
  }

  const limit = await spend([['uploadAccount', String(user.id)]]);
  if (!limit.ok) {
    const mins = Math.ceil(limit.retryAfterS / 60);
    const res = apiError(429, `You have added many photos this hour. Please wait ${mins} minute${mins === 1 ? '' : 's'} and try again.`, 'photos', 'rate_limited');
    res.headers.set('Retry-After', String(limit.retryAfterS));
    return res;
  }

  try {
    const photos = await ingestUpload(request, user.id);
    return NextResponse.json({ photos }, { status: 201 });
  } catch (err) {
    if (err instanceof UploadRefused) return apiError(err.status, err.message, err.field, err.code);
    return serverError(err);
  }
}
