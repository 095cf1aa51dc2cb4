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
