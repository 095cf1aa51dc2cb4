import { apiError, serverError } from '@/lib/http/errors';
import { currentUser } from '@/lib/auth/session';
import { can } from '@/lib/auth/policy';
import { initModels } from '@/models';
import { isPhotoId, readVariant, type PhotoVariant } from './storage';

/**
 * Caches may keep a photo an hour, not a year: a moderator must be able to take a
 * photo down and have it gone from readers' caches within that time.
 */
export const PHOTO_CACHE_CONTROL = 'public, max-age=3600';

/**
 * One stored copy as a response. The id is checked against our id format before
 * any path is built; the bytes are always our own WebP re-encode, and nosniff keeps
 * a browser from guessing otherwise. A hidden or deleted photo is served only to
 * moderators, and never cached; to anyone else it does not exist.
 */
export async function servePhoto(request: Request, id: string, variant: PhotoVariant): Promise<Response> {
  if (!isPhotoId(id)) return apiError(404, 'no photo with that id', 'id', 'not_found');
  try {
    const { Photo } = initModels();
    const row = await Photo.findOne({ where: { publicId: id }, attributes: ['id', 'hiddenAt', 'deletedAt'] });
    if (!row) return apiError(404, 'no photo with that id', 'id', 'not_found');
    const takenDown = !!(row.hiddenAt || row.deletedAt);
    if (takenDown && !can(await currentUser(request), 'moderation.seeHidden')) return apiError(404, 'no photo with that id', 'id', 'not_found');
    const data = await readVariant(id, variant);
    if (!data) return apiError(404, 'no photo with that id', 'id', 'not_found');
    return new Response(new Uint8Array(data), {
      status: 200,
      headers: {
        'Content-Type': 'image/webp',
        'Content-Length': String(data.length),
        'X-Content-Type-Options': 'nosniff',
        'Cache-Control': takenDown ? 'private, no-store' : PHOTO_CACHE_CONTROL,
        'Content-Disposition': `inline; filename="${id}${variant === 'thumb' ? '-thumb' : ''}.webp"`,
      },
    });
  } catch (err) {
    return serverError(err);
  }
}
