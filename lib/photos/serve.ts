import { apiError, serverError } from '@/lib/http/errors';
import { isPhotoId, readVariant, type PhotoVariant } from './storage';

/**
 * One stored copy as a response. The id is checked against our id format before
 * any path is built; the bytes are always our own WebP re-encode, and nosniff keeps
 * a browser from guessing otherwise. Ids never change content, so caches keep it a year.
 */
export async function servePhoto(id: string, variant: PhotoVariant): Promise<Response> {
  if (!isPhotoId(id)) return apiError(404, 'no photo with that id', 'id', 'not_found');
  try {
    const data = await readVariant(id, variant);
    if (!data) return apiError(404, 'no photo with that id', 'id', 'not_found');
    return new Response(new Uint8Array(data), {
      status: 200,
      headers: {
        'Content-Type': 'image/webp',
        'Content-Length': String(data.length),
        'X-Content-Type-Options': 'nosniff',
        'Cache-Control': 'public, max-age=31536000, immutable',
        'Content-Disposition': `inline; filename="${id}${variant === 'thumb' ? '-thumb' : ''}.webp"`,
      },
    });
  } catch (err) {
    return serverError(err);
  }
}
