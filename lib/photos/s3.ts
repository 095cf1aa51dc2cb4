import {
  DeleteObjectCommand,
  GetObjectCommand,
  PutObjectCommand,
  S3Client,
  S3ServiceException,
} from '@aws-sdk/client-s3';

/**
 * Photos on S3-compatible object storage (AWS S3, MinIO, Ceph, …) when S3_BUCKET is
 * set: every app instance then serves the same photos, and none keeps any on its own
 * disk beyond a request's scratch files. Credentials come the SDK's usual way
 * (AWS_ACCESS_KEY_ID / AWS_SECRET_ACCESS_KEY, or the machine's role).
 */
export function s3Configured(): boolean {
  return Boolean(process.env.S3_BUCKET);
}

const g = globalThis as unknown as { __clackwaterS3?: { key: string; client: S3Client } };

function client(): S3Client {
  const key = `${process.env.S3_ENDPOINT ?? ''}|${process.env.S3_REGION ?? ''}`;
  if (g.__clackwaterS3?.key !== key) {
    g.__clackwaterS3 = {
      key,
      client: new S3Client({
        region: process.env.S3_REGION ?? 'us-east-1',
        endpoint: process.env.S3_ENDPOINT || undefined,
        // most S3-compatible servers want bucket/key paths rather than bucket.host names
        forcePathStyle: process.env.S3_PATH_STYLE !== '0',
        requestChecksumCalculation: 'WHEN_REQUIRED',
        responseChecksumValidation: 'WHEN_REQUIRED',
        maxAttempts: 3,
      }),
    };
  }
  return g.__clackwaterS3.client;
}

const bucket = () => process.env.S3_BUCKET as string;
const prefix = () => (process.env.S3_PREFIX ?? 'photos/').replace(/^\/+/, '');

/** Marks an object handle among the "files" a request wrote, for cleanup. */
export const S3_HANDLE = 's3:';

export async function putObject(name: string, data: Buffer): Promise<string> {
  await client().send(
    new PutObjectCommand({
      Bucket: bucket(),
      Key: prefix() + name,
      Body: data,
      ContentType: 'image/webp',
      IfNoneMatch: '*',
      CacheControl: 'private, max-age=31536000, immutable',
    }),
  );
  return S3_HANDLE + name;
}

export async function getObject(name: string): Promise<Buffer | null> {
  try {
    const out = await client().send(new GetObjectCommand({ Bucket: bucket(), Key: prefix() + name }));
    return Buffer.from(await out.Body!.transformToByteArray());
  } catch (err) {
    if (err instanceof S3ServiceException && (err.name === 'NoSuchKey' || err.$metadata?.httpStatusCode === 404))
      return null;
    throw err;
  }
}

export async function deleteObject(handle: string): Promise<void> {
  await client().send(new DeleteObjectCommand({ Bucket: bucket(), Key: prefix() + handle.slice(S3_HANDLE.length) }));
}

/** The object store refused or could not be reached: answered like a full disk (507), not 500. */
export function isObjectStoreUnavailable(err: unknown): boolean {
  if (err instanceof S3ServiceException)
    return (err.$metadata?.httpStatusCode ?? 500) >= 500 || err.name === 'AccessDenied' || err.name === 'QuotaExceeded';
  const code = (err as { code?: string } | null)?.code;
  return code === 'ECONNREFUSED' || code === 'ECONNRESET' || code === 'ETIMEDOUT' || code === 'ENOTFOUND';
}
