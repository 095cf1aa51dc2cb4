import { NextResponse } from 'next/server';
import { apiError } from '@/lib/http/errors';
import { guarded } from '@/lib/http/guard';
import { ingestUpload, UploadRefused } from '@/lib/photos/ingest';
import { idempotencyKeyOf } from '@/lib/http/idempotency';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

/**
 * POST /api/photos — multipart field `photos` (up to 6 JPEG, PNG or WebP files) and
 * an optional `alt` per photo. Answers 201 with the stored photos, unattached: the
 * question or answer that uses them attaches them by id when it is saved.
 * Suspended members are refused; uploads are flood-limited per account and per address
 * (a request that is not multipart at all spends no upload allowance). An `Idempotency-Key`
 * (a phone's outbox sending a photo kept offline) makes a repeat answer with the photos
 * the first upload made instead of storing them again.
 */
export async function POST(request: Request) {
  const multipart = /^multipart\/form-data;/i.test(request.headers.get('content-type') ?? '');
  return guarded(
    request,
    'photo.upload',
    async (user) => {
      if (!multipart)
        return apiError(400, 'Send photos as multipart/form-data in the field “photos”.', 'photos', 'not_multipart');
      const key = idempotencyKeyOf(request);
      try {
        const photos = await ingestUpload(request, user.id, key);
        return NextResponse.json({ photos }, { status: 201 });
      } catch (err) {
        if (err instanceof UploadRefused) return apiError(err.status, err.message, err.field, err.code);
        throw err;
      }
    },
    multipart ? { flood: 'upload' } : {},
  );
}
