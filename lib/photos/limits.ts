/* Plain numbers only: the photo picker imports these in the browser. */

/** The limits on one upload request; the API and the picker quote them. */
export const PHOTO_LIMITS = {
  maxFiles: 6,
  maxFileBytes: 8 * 1024 * 1024,
  maxTotalBytes: 24 * 1024 * 1024,
  /** decoded size: a small file can claim a huge canvas (an image bomb) */
  maxPixels: 40e6,
  maxSide: 12_000,
  /** longest side of the copies we keep */
  webSide: 1600,
  thumbSide: 320,
  maxAltChars: 200,
} as const;

const MB = 1024 * 1024;
/** "8 MB": the limits are whole mebibytes, written as people write file sizes. */
export const megabytes = (bytes: number) => `${Math.round(bytes / MB)} MB`;

/** A file's name fit to quote back in a message: no path, no control characters, bounded. */
export function displayName(original: string | null | undefined): string {
  const base = (original ?? '')
    .split(/[\\/]/)
    .pop()!
    .replace(/[\u0000-\u001f\u007f]/g, '')
    .trim();
  return base ? `“${base.length > 80 ? `${base.slice(0, 77)}…` : base}”` : 'a file with no name';
}

/**
 * The size refusals, worded once: the picker says them before uploading and the
 * server when a file gets past the picker, so a member reads the same rule either way.
 */
export const PHOTO_MESSAGES = {
  hint: (max: number = PHOTO_LIMITS.maxFiles) =>
    `JPEG, PNG or WebP, up to ${max} photos of ${megabytes(PHOTO_LIMITS.maxFileBytes)} each and ${megabytes(PHOTO_LIMITS.maxTotalBytes)} in all at one time. Location and camera details are removed.`,
  fileTooLarge: (name: string | null | undefined) =>
    `${displayName(name)} is larger than ${megabytes(PHOTO_LIMITS.maxFileBytes)}, the limit for one photo.`,
  uploadTooLarge: () =>
    `Photos can come to ${megabytes(PHOTO_LIMITS.maxTotalBytes)} at most in one upload: add them a few at a time.`,
  tooMany: () => `Send up to ${PHOTO_LIMITS.maxFiles} photos at a time.`,
} as const;
