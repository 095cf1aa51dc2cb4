import { randomBytes } from 'node:crypto';
import { mkdir, mkdtemp, readFile, rm, unlink, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { deleteObject, getObject, isObjectStoreUnavailable, putObject, S3_HANDLE, s3Configured } from './s3';

/**
 * Where photos live on disk: `UPLOAD_DIR` (default `<cwd>/.data/uploads`, ignored by
 * git), never under public/, so every byte a visitor receives goes through the
 * route handlers that set the content type and nosniff. Two re-encoded WebP files
 * per photo, both named by the photo's random public id; the original upload is
 * never kept (it may carry EXIF/GPS). With S3_BUCKET set the two copies go to
 * S3-compatible object storage instead (lib/photos/s3.ts); scratch files stay local.
 */
export function uploadRoot(): string {
  return path.resolve(
    /* turbopackIgnore: true */ process.env.UPLOAD_DIR ||
      path.join(/* turbopackIgnore: true */ process.cwd(), '.data', 'uploads'),
  );
}

/** Scratch space for the incoming files of requests in flight; each request gets its own directory inside. */
export function tmpRoot(): string {
  return path.join(uploadRoot(), 'tmp');
}

export type PhotoVariant = 'web' | 'thumb';

const BASE62 = '0123456789ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz';
export const PUBLIC_ID_LENGTH = 16;
const PUBLIC_ID = /^[0-9A-Za-z]{16}$/;

/**
 * 16 base62 characters (~95 bits) from crypto.randomBytes. Bytes ≥ 248 are skipped so
 * every character is equally likely (248 = 4 × 62).
 */
export function newPhotoId(): string {
  let out = '';
  while (out.length < PUBLIC_ID_LENGTH) {
    for (const b of randomBytes(PUBLIC_ID_LENGTH * 2)) {
      if (b < 248 && out.length < PUBLIC_ID_LENGTH) out += BASE62[b % 62];
    }
  }
  return out;
}

/** True only for a string shaped like our ids: checked before any path is built from it. */
export function isPhotoId(id: unknown): id is string {
  return typeof id === 'string' && PUBLIC_ID.test(id);
}

/** The file for one variant of one photo; refuses anything that is not one of our ids. */
function photoName(publicId: string, variant: PhotoVariant): string {
  if (!isPhotoId(publicId)) throw new Error('not a photo id');
  return variant === 'thumb' ? `${publicId}-thumb.webp` : `${publicId}.webp`;
}

export function photoPath(publicId: string, variant: PhotoVariant): string {
  return path.join(/* turbopackIgnore: true */ uploadRoot(), photoName(publicId, variant));
}

export function photoUrl(publicId: string, variant: PhotoVariant = 'web'): string {
  return variant === 'thumb' ? `/api/photos/${publicId}/thumb` : `/api/photos/${publicId}`;
}

/** A fresh private directory for one request's temp files; the caller removes it with `removeDir`. */
export async function makeRequestTmpDir(): Promise<string> {
  await mkdir(tmpRoot(), { recursive: true });
  return mkdtemp(path.join(tmpRoot(), 'req-'));
}

export async function removeDir(dir: string): Promise<void> {
  await rm(dir, { recursive: true, force: true, maxRetries: 3 });
}

/** Writes one variant; 'wx' so a (vanishingly unlikely) id collision fails instead of overwriting. */
export async function writeVariant(publicId: string, variant: PhotoVariant, data: Buffer): Promise<string> {
  if (s3Configured()) return putObject(photoName(publicId, variant), data);
  await mkdir(uploadRoot(), { recursive: true });
  const file = photoPath(publicId, variant);
  await writeFile(file, data, { flag: 'wx' });
  return file;
}

/** Best-effort removal of files written for a request that did not complete. */
export async function removeFiles(files: string[]): Promise<void> {
  await Promise.all(files.map((f) => (f.startsWith(S3_HANDLE) ? deleteObject(f) : unlink(f)).catch(() => undefined)));
}

/** The stored bytes of one variant, or null when there is no such photo. */
export async function readVariant(publicId: string, variant: PhotoVariant): Promise<Buffer | null> {
  if (!isPhotoId(publicId)) return null;
  if (s3Configured()) return getObject(photoName(publicId, variant));
  try {
    return await readFile(/* turbopackIgnore: true */ photoPath(publicId, variant));
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code === 'ENOENT') return null;
    throw err;
  }
}

/** Errors that mean the disk is full, read-only or not ours to write: answered 507, not 500. */
const STORAGE_CODES = new Set(['ENOSPC', 'EDQUOT', 'EACCES', 'EPERM', 'EROFS']);
export function isStorageUnavailable(err: unknown): boolean {
  const code = (err as NodeJS.ErrnoException | null)?.code;
  return (typeof code === 'string' && STORAGE_CODES.has(code)) || isObjectStoreUnavailable(err);
}
