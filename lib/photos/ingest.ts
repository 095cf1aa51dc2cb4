import { createHash, randomBytes } from 'node:crypto';
import { open, readFile, stat } from 'node:fs/promises';
import type { IncomingHttpHeaders } from 'node:http';
import { Readable } from 'node:stream';
import type { ReadableStream as NodeWebStream } from 'node:stream/web';
import formidable, { errors as formidableErrors, type File as FormidableFile } from 'formidable';
import { fileTypeFromBuffer } from 'file-type';
import sharp, { type Metadata } from 'sharp';
import { z } from 'zod';
import type { CreationAttributes } from 'sequelize';
import { initModels, type Photo } from '@/models';
import { once } from '@/lib/http/idempotency';
import { displayName, PHOTO_LIMITS, PHOTO_MESSAGES } from './limits';
import {
  isStorageUnavailable,
  makeRequestTmpDir,
  newPhotoId,
  photoUrl,
  removeDir,
  removeFiles,
  writeVariant,
} from './storage';

export { PHOTO_LIMITS };

const ACCEPTED: Record<string, 'jpeg' | 'png' | 'webp'> = {
  'image/jpeg': 'jpeg',
  'image/png': 'png',
  'image/webp': 'webp',
};

export class UploadRefused extends Error {
  constructor(
    readonly status: 400 | 413 | 415 | 507,
    message: string,
    readonly code: string,
    readonly field = 'photos',
  ) {
    super(message);
  }
}

export interface IngestedPhoto {
  id: string;
  width: number;
  height: number;
  url: string;
  thumbUrl: string;
}

export { displayName };

const ALT_TOO_LONG = `Describe each photo in ${PHOTO_LIMITS.maxAltChars} characters or fewer.`;
const altSchema = z.array(z.string().trim().max(PHOTO_LIMITS.maxAltChars, ALT_TOO_LONG));

/**
 * Reads a multipart upload (field `photos`, optional `alt` per photo, in order),
 * checks every file by its content, and stores two metadata-free WebP copies of
 * each with one `photos` row per photo. All or nothing: one refused file and
 * nothing is kept — no copies, no rows; temp files are always removed.
 *
 * With an idempotency key (a phone's outbox sending a photo kept offline) the rows are
 * written once per key: a repeat, after an answer lost on the way back, gets the photos
 * the first upload made, and the copies it just encoded are removed. The same key with
 * different files is refused (422), so a key cannot stand for two photos.
 */
export async function ingestUpload(request: Request, ownerId: number, key?: string): Promise<IngestedPhoto[]> {
  const contentType = request.headers.get('content-type') ?? '';
  if (!/^multipart\/form-data;/i.test(contentType) || !request.body) {
    throw new UploadRefused(400, 'Send photos as multipart/form-data in the field “photos”.', 'not_multipart');
  }
  const declared = Number(request.headers.get('content-length') ?? NaN);
  // room for the multipart framing and the alt texts around the file data
  if (Number.isFinite(declared) && declared > PHOTO_LIMITS.maxTotalBytes + 64 * 1024) {
    throw new UploadRefused(413, PHOTO_MESSAGES.uploadTooLarge(), 'too_large');
  }

  let tmpDir: string;
  try {
    tmpDir = await makeRequestTmpDir();
  } catch (err) {
    throw storageRefusal(err);
  }
  const written: string[] = [];
  try {
    const { files, alts } = await receive(request, tmpDir);
    if (files.length === 0) throw new UploadRefused(400, 'Choose at least one photo (JPEG, PNG or WebP).', 'no_file');
    const altParsed = altSchema.safeParse(alts);
    if (!altParsed.success)
      throw new UploadRefused(400, altParsed.error.issues[0]?.message ?? ALT_TOO_LONG, 'invalid_alt', 'alt');

    // Check every file before encoding any, so a refusal costs no decoding.
    for (const f of files) await inspect(f);

    const rows: CreationAttributes<Photo>[] = [];
    // what was sent, by content: the key's fingerprint (names and temp paths differ on a resend)
    const sent: string[] = [];
    for (const [i, f] of files.entries()) {
      if (key !== undefined)
        sent.push(
          createHash('sha256')
            .update(await readFile(f.filepath))
            .digest('hex'),
        );
      const copy = await encode(f);
      const publicId = newPhotoId();
      written.push(await writeVariant(publicId, 'web', copy.web.data));
      written.push(await writeVariant(publicId, 'thumb', copy.thumb));
      rows.push({
        publicId,
        ownerId,
        questionId: null,
        answerId: null,
        mime: 'image/webp',
        width: copy.web.info.width,
        height: copy.web.info.height,
        bytes: copy.web.data.length,
        alt: altParsed.data[i] || null,
      });
    }

    const made: IngestedPhoto[] = rows.map((r) => ({
      id: r.publicId,
      width: r.width,
      height: r.height,
      url: photoUrl(r.publicId),
      thumbUrl: photoUrl(r.publicId, 'thumb'),
    }));
    const { Photo } = initModels();
    const out = await once(ownerId, 'photo.upload', key, { sent, alts: altParsed.data }, async (transaction) => {
      await Photo.bulkCreate(rows, { transaction });
      return { status: 201, body: { photos: made } };
    });
    if (out.replayed) await removeFiles(written);
    return out.body.photos;
  } catch (err) {
    await removeFiles(written);
    throw storageRefusal(err);
  } finally {
    await removeDir(tmpDir);
  }
}

function storageRefusal(err: unknown): unknown {
  if (err instanceof UploadRefused || !isStorageUnavailable(err)) return err;
  console.error('photo storage unavailable', err);
  return new UploadRefused(
    507,
    'Clackwater could not store photos just now: the server’s storage is full or not writable. Nothing was saved; please try again later.',
    'storage_unavailable',
  );
}

/** Streams the body through formidable into `tmpDir` under random names (the sender's names never reach the disk). */
async function receive(request: Request, tmpDir: string): Promise<{ files: FormidableFile[]; alts: string[] }> {
  const headers: IncomingHttpHeaders = Object.fromEntries(request.headers.entries());
  // formidable treats a body with neither length nor transfer-encoding as empty
  if (!headers['content-length'] && !headers['transfer-encoding']) headers['transfer-encoding'] = 'chunked';
  const body = Object.assign(Readable.fromWeb(request.body as unknown as NodeWebStream<Uint8Array>), { headers });

  let current: string | null = null;
  const form = formidable({
    uploadDir: tmpDir,
    maxFiles: PHOTO_LIMITS.maxFiles,
    maxFileSize: PHOTO_LIMITS.maxFileBytes,
    maxTotalFileSize: PHOTO_LIMITS.maxTotalBytes,
    allowEmptyFiles: false,
    minFileSize: 1,
    maxFields: 2 * PHOTO_LIMITS.maxFiles,
    maxFieldsSize: 64 * 1024,
    keepExtensions: false,
    filename: () => randomBytes(12).toString('hex'),
    filter: (part) => part.name === 'photos',
  });
  // A temp file that cannot be written (disk full) errors on the file, and formidable
  // may still resolve the parse with what it had: the first such error wins.
  let writeError: unknown = null;
  form.on('fileBegin', (_name, file) => {
    current = file.originalFilename;
    (file as unknown as NodeJS.EventEmitter).on('error', (err: unknown) => {
      writeError ??= err;
    });
  });
  try {
    const [fields, files] = await form.parse(body as unknown as Parameters<typeof form.parse>[0]);
    const received = files.photos ?? [];
    // The write stream reports a full disk after its end callback, so the parse can
    // finish first: a temp file shorter than what arrived is a write that failed.
    for (const f of received) {
      if (writeError) break;
      const onDisk = (await stat(f.filepath)).size;
      if (onDisk < f.size)
        writeError = Object.assign(new Error(`ENOSPC: ${onDisk} of ${f.size} bytes written`), { code: 'ENOSPC' });
    }
    if (writeError) throw writeError;
    return { files: received, alts: fields.alt ?? [] };
  } catch (err) {
    body.destroy();
    throw formidableRefusal(err, current);
  }
}

function formidableRefusal(err: unknown, current: string | null): unknown {
  const code = (err as { code?: unknown }).code;
  if (typeof code !== 'number') return err; // a Node error (disk full, …), classified by the caller
  switch (code) {
    case formidableErrors.biggerThanMaxFileSize:
      return new UploadRefused(413, PHOTO_MESSAGES.fileTooLarge(current), 'too_large');
    case formidableErrors.biggerThanTotalMaxFileSize:
      return new UploadRefused(413, PHOTO_MESSAGES.uploadTooLarge(), 'too_large');
    case formidableErrors.maxFilesExceeded:
      return new UploadRefused(413, PHOTO_MESSAGES.tooMany(), 'too_many_files');
    case formidableErrors.noEmptyFiles:
    case formidableErrors.smallerThanMinFileSize:
      return new UploadRefused(400, `${displayName(current)} is empty.`, 'empty_file');
    case formidableErrors.maxFieldsExceeded:
    case formidableErrors.maxFieldsSizeExceeded:
      return new UploadRefused(413, 'Too many or too long fields beside the photos.', 'too_large', 'alt');
    default:
      return new UploadRefused(
        400,
        'The upload could not be read; please choose the photos again.',
        'malformed_upload',
      );
  }
}

/** Decides the type by the bytes, then reads only the header for the canvas size — before anything is decoded. */
async function inspect(f: FormidableFile): Promise<void> {
  const name = displayName(f.originalFilename);
  const head = Buffer.alloc(4100);
  const fh = await open(f.filepath, 'r');
  let n: number;
  try {
    ({ bytesRead: n } = await fh.read(head, 0, head.length, 0));
  } finally {
    await fh.close();
  }
  const type = await fileTypeFromBuffer(head.subarray(0, n));
  const format = type ? ACCEPTED[type.mime] : undefined;
  if (!format) throw new UploadRefused(415, `${name} is not a JPEG, PNG or WebP image.`, 'unsupported_type');

  let meta: Metadata;
  try {
    meta = await sharp(f.filepath, { limitInputPixels: PHOTO_LIMITS.maxPixels }).metadata();
  } catch (err) {
    if (/pixel limit/i.test((err as Error).message)) throw tooManyPixels(name);
    throw new UploadRefused(415, `${name} could not be read as an image.`, 'unreadable_image');
  }
  if (meta.format !== format || !meta.width || !meta.height)
    throw new UploadRefused(415, `${name} could not be read as an image.`, 'unreadable_image');
  if (
    meta.width * meta.height > PHOTO_LIMITS.maxPixels ||
    meta.width > PHOTO_LIMITS.maxSide ||
    meta.height > PHOTO_LIMITS.maxSide
  ) {
    throw tooManyPixels(name, meta.width, meta.height);
  }
}

function tooManyPixels(name: string, w?: number, h?: number) {
  const size = w && h ? ` (${w} × ${h} px)` : '';
  return new UploadRefused(
    413,
    `${name}${size} is too large an image: photos can be up to ${PHOTO_LIMITS.maxPixels / 1e6} megapixels and ${PHOTO_LIMITS.maxSide.toLocaleString('en')} px on a side.`,
    'too_many_pixels',
  );
}

/**
 * The two copies we keep. sharp writes no metadata unless asked, so EXIF (and GPS)
 * go; `rotate()` first applies the EXIF orientation so the picture stays upright.
 */
async function encode(f: FormidableFile) {
  const name = displayName(f.originalFilename);
  try {
    const input = sharp(f.filepath, { limitInputPixels: PHOTO_LIMITS.maxPixels }).rotate();
    const fit = (side: number) => ({ width: side, height: side, fit: 'inside' as const, withoutEnlargement: true });
    const web = await input
      .clone()
      .resize(fit(PHOTO_LIMITS.webSide))
      .webp({ quality: 82 })
      .toBuffer({ resolveWithObject: true });
    const thumb = await sharp(web.data).resize(fit(PHOTO_LIMITS.thumbSide)).webp({ quality: 75 }).toBuffer();
    return { web, thumb };
  } catch (err) {
    if (isStorageUnavailable(err)) throw err;
    throw new UploadRefused(415, `${name} could not be read as an image.`, 'unreadable_image');
  }
}
