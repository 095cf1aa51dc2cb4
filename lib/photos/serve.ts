import { apiError, serverError } from '@/lib/http/errors';
import { currentUser } from '@/lib/auth/session';
import { can } from '@/lib/auth/policy';
import { isTakenDown } from '@/lib/questions/visibility';
import { initModels } from '@/models';
import type { Photo } from '@/models/Photo';
import { isPhotoId, readVariant, type PhotoVariant } from './storage';

/**
 * Caches may keep a photo an hour, not a year: a moderator must be able to take a
 * photo down and have it gone from readers' caches within that time.
 */
export const PHOTO_CACHE_CONTROL = 'public, max-age=3600';
/** Whatever is not a public photo: not-found answers (a restore may bring it back) and moderators' views. */
const UNCACHED = 'private, no-store';

/**
 * Is the photo, or what it is shown with, gone for readers? A photo follows its post:
 * hidden or deleted itself, on a hidden or deleted answer, question (an answer's own
 * thread included) or field log entry, or on one that no longer exists. An unattached
 * photo (just uploaded, not yet saved with a post) has nothing to follow.
 */
async function takenDown(photo: Photo): Promise<boolean> {
  if (isTakenDown(photo)) return true;
  const { Question, Answer, FieldLogEntry } = initModels();
  const attributes = ['id', 'hiddenAt', 'deletedAt'];
  const questionIds = new Set<number>();
  if (photo.questionId) questionIds.add(photo.questionId);
  if (photo.answerId) {
    const answer = await Answer.findByPk(photo.answerId, { attributes: [...attributes, 'questionId'] });
    if (!answer || isTakenDown(answer)) return true;
    questionIds.add(answer.questionId as number);
  }
  for (const id of questionIds) {
    const question = await Question.findByPk(id, { attributes });
    if (!question || isTakenDown(question)) return true;
  }
  if (photo.fieldLogEntryId) {
    const entry = await FieldLogEntry.findByPk(photo.fieldLogEntryId, { attributes });
    if (!entry || isTakenDown(entry)) return true;
  }
  return false;
}

function notFound(): Response {
  const res = apiError(404, 'no photo with that id', 'id', 'not_found');
  res.headers.set('Cache-Control', UNCACHED);
  return res;
}

/**
 * One stored copy as a response. The id is checked against our id format before
 * any path is built; the bytes are always our own WebP re-encode, and nosniff keeps
 * a browser from guessing otherwise. A photo taken down (itself or with its post) is
 * served only to moderators, and never cached; to anyone else it does not exist.
 */
export async function servePhoto(request: Request, id: string, variant: PhotoVariant): Promise<Response> {
  if (!isPhotoId(id)) return notFound();
  try {
    const { Photo } = initModels();
    const row = await Photo.findOne({
      where: { publicId: id },
      attributes: ['id', 'questionId', 'answerId', 'fieldLogEntryId', 'hiddenAt', 'deletedAt'],
    });
    if (!row) return notFound();
    const hidden = await takenDown(row);
    if (hidden && !can(await currentUser(request), 'moderation.seeHidden')) return notFound();
    const data = await readVariant(id, variant);
    if (!data) return notFound();
    return new Response(new Uint8Array(data), {
      status: 200,
      headers: {
        'Content-Type': 'image/webp',
        'Content-Length': String(data.length),
        'X-Content-Type-Options': 'nosniff',
        'Cache-Control': hidden ? UNCACHED : PHOTO_CACHE_CONTROL,
        'Content-Disposition': `inline; filename="${id}${variant === 'thumb' ? '-thumb' : ''}.webp"`,
      },
    });
  } catch (err) {
    return serverError(err);
  }
}
