/**
 * Photos kept on the phone with an outbox record: the file itself (a Blob in IndexedDB,
 * inside the record), uploaded first when the record is sent and then named in it.
 * Each photo carries its own idempotency key from the moment it is chosen, so an upload
 * whose answer is lost and is sent again is one photo on the server (POST /api/photos
 * answers a repeated key with the photo it made), and the id it got is kept with the
 * photo so a later send (after the entry was refused and put right) does not upload it
 * again. Browser code with no framework in it, like outbox.ts.
 */
import { megabytes, PHOTO_LIMITS } from '@/lib/photos/limits';

export interface KeptPhoto {
  /** the upload's idempotency key, made when the photo was chosen */
  key: string;
  /** the file as chosen, kept whole: the server removes camera details when it arrives */
  blob: Blob;
  name: string;
  /** the photo's id once the server has it */
  uploadedId?: string;
}

/**
 * How much a phone keeps. A photo is kept whole until it can be sent, so the bounds are
 * the server's own for one photo (a bigger one would only be refused later, at the
 * water's edge no longer) and a few a test, with a ceiling for everything waiting on
 * the phone so a week without signal cannot fill its storage.
 */
export const KEPT_PHOTO_LIMITS = {
  perRecord: 3,
  maxFileBytes: PHOTO_LIMITS.maxFileBytes,
  maxDeviceBytes: 40 * 1024 * 1024,
} as const;

const ACCEPTED = ['image/jpeg', 'image/png', 'image/webp'];

/** The words under the form's photo control: the bounds, said once. */
export const keptPhotoHint = () =>
  `JPEG, PNG or WebP, up to ${KEPT_PHOTO_LIMITS.perRecord} photos of ${megabytes(KEPT_PHOTO_LIMITS.maxFileBytes)} each. With no signal they are kept on this phone (${megabytes(KEPT_PHOTO_LIMITS.maxDeviceBytes)} in all) and sent with the test. Location and camera details are removed when they arrive.`;

/**
 * Whether the chosen files may be kept with a record: null when they may, else the reason
 * in the member's words. `onRecord` are the photos already with this record, `onDevice`
 * the bytes of every photo waiting on the phone (other records' included).
 */
export function keepRefusal(
  chosen: readonly { name: string; size: number; type: string }[],
  onRecord: number,
  onDevice: number,
): string | null {
  const room = KEPT_PHOTO_LIMITS.perRecord - onRecord;
  if (chosen.length > room)
    return room <= 0
      ? `A test keeps ${KEPT_PHOTO_LIMITS.perRecord} photos at most.`
      : `You can add ${room} more photo${room === 1 ? '' : 's'} (${KEPT_PHOTO_LIMITS.perRecord} at most).`;
  for (const f of chosen) {
    if (!ACCEPTED.includes(f.type)) return `“${f.name}” is not a JPEG, PNG or WebP photo.`;
    if (f.size > KEPT_PHOTO_LIMITS.maxFileBytes)
      return `“${f.name}” is larger than ${megabytes(KEPT_PHOTO_LIMITS.maxFileBytes)}, the limit for one photo.`;
  }
  const adding = chosen.reduce((sum, f) => sum + f.size, 0);
  if (onDevice + adding > KEPT_PHOTO_LIMITS.maxDeviceBytes)
    return `This phone already keeps ${megabytes(onDevice)} of photos waiting to send; ${megabytes(KEPT_PHOTO_LIMITS.maxDeviceBytes)} is the most it keeps. Send what waits first, or choose fewer.`;
  return null;
}

export type PhotoSendOutcome =
  | { outcome: 'sent'; photos: KeptPhoto[] }
  | { outcome: 'refused'; photos: KeptPhoto[]; error: { message: string; field: string; status: number } }
  | { outcome: 'stopped'; photos: KeptPhoto[] };

/**
 * Uploads each photo not yet on the server, one request a photo under its own key, in
 * order. `progress` is told after each one lands, so the id is kept even if the next is
 * cut off. A refusal (not an image, too large) stops with the server's reason and the
 * photo still kept; a network failure or a 5xx stops, to try again later.
 */
export async function sendKeptPhotos(
  photos: KeptPhoto[],
  send: typeof fetch = fetch,
  progress: (photos: KeptPhoto[]) => Promise<void> = async () => {},
): Promise<PhotoSendOutcome> {
  let now = photos;
  for (const [i, photo] of photos.entries()) {
    if (photo.uploadedId) continue;
    const form = new FormData();
    form.append('photos', photo.blob, photo.name);
    let res: Response;
    try {
      res = await send('/api/photos', {
        method: 'POST',
        headers: { 'Idempotency-Key': photo.key },
        body: form,
        credentials: 'same-origin',
      });
    } catch {
      return { outcome: 'stopped', photos: now };
    }
    const body = (await res.json().catch(() => null)) as {
      photos?: { id: string }[];
      error?: { message?: string };
    } | null;
    const id = body?.photos?.[0]?.id;
    if (res.ok && id) {
      now = now.map((p, j) => (j === i ? { ...p, uploadedId: id } : p));
      await progress(now);
    } else if (refusedForGood(res.status)) {
      const reason = body?.error?.message ?? `Refused (${res.status}).`;
      return {
        outcome: 'refused',
        photos: now,
        error: {
          message: `The photo “${photo.name}” was not accepted: ${reason}`,
          field: 'photos',
          status: res.status,
        },
      };
    } else return { outcome: 'stopped', photos: now };
  }
  return { outcome: 'sent', photos: now };
}

/** A 4xx other than 408 and 429 (which mean "later"): the server will not take it as it is. */
export const refusedForGood = (status: number) => status >= 400 && status < 500 && status !== 408 && status !== 429;

/** The record's body as sent: its photos named by the ids the server gave them. */
export function withPhotoIds(body: unknown, photos: readonly KeptPhoto[] | undefined): unknown {
  if (!photos?.length) return body;
  const own = ((body as { photoIds?: string[] }).photoIds ?? []).filter((x) => typeof x === 'string');
  return { ...(body as object), photoIds: [...own, ...photos.flatMap((p) => (p.uploadedId ? [p.uploadedId] : []))] };
}

/** The bytes of the photos in these records, for the device's ceiling. */
export const keptBytes = (records: readonly { photos?: readonly KeptPhoto[] }[]) =>
  records.reduce((sum, r) => sum + (r.photos ?? []).reduce((s, p) => s + p.blob.size, 0), 0);
