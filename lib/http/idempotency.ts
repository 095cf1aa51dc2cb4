import 'server-only';
import { createHash } from 'node:crypto';
import { UniqueConstraintError, type Transaction } from 'sequelize';
import { getSequelize } from '@/lib/db';
import { initModels } from '@/models';
import { ForumError } from '@/lib/questions/errors';

/** The request header a device names its record with (as in the IETF httpapi draft of that name). */
export const IDEMPOTENCY_HEADER = 'Idempotency-Key';
const KEY = /^[A-Za-z0-9_-]{8,64}$/;

/** A key that cannot be used (malformed, or already used for a different record): a 4xx naming the header. */
export class IdempotencyError extends ForumError {
  constructor(status: 400 | 422, message: string) {
    super(status, message, IDEMPOTENCY_HEADER);
  }
}

/** The key a request carries; undefined when it carries none. */
export function idempotencyKeyOf(request: Request): string | undefined {
  const key = request.headers.get(IDEMPOTENCY_HEADER);
  if (key === null) return undefined;
  if (!KEY.test(key))
    throw new IdempotencyError(400, `${IDEMPOTENCY_HEADER}: 8 to 64 letters, digits, "-" or "_" (a UUID will do).`);
  return key;
}

export interface Once<T> {
  status: number;
  body: T;
  /** true when this is the answer an earlier request with the same key got */
  replayed: boolean;
}

/**
 * Writes a record once per member, scope and key: the first request runs `write` and keeps
 * its answer with the key in the same transaction; a repeat (the phone lost the answer and
 * sent again) gets that answer and writes nothing. Two requests with one key at the same
 * moment queue on the key's unique index: the second waits for the first to commit, then
 * replays it (or, if the first failed, writes). Without a key, `write` simply runs.
 */
export async function once<T>(
  userId: number,
  scope: string,
  key: string | undefined,
  sent: unknown,
  write: (transaction: Transaction) => Promise<{ status: number; body: T }>,
): Promise<Once<T>> {
  if (key === undefined) return { ...(await getSequelize().transaction(write)), replayed: false };
  const fingerprint = createHash('sha256').update(JSON.stringify(sent)).digest('hex');
  const { IdempotencyKey } = initModels();
  return getSequelize().transaction(async (transaction) => {
    let row;
    try {
      row = await IdempotencyKey.create(
        { userId, scope, idemKey: key, fingerprint, status: 0, response: {} },
        { transaction },
      );
    } catch (err) {
      if (!(err instanceof UniqueConstraintError)) throw err;
      const prior = await IdempotencyKey.findOne({ where: { userId, scope, idemKey: key }, transaction });
      if (!prior) throw err;
      if (prior.fingerprint !== fingerprint)
        throw new IdempotencyError(422, `${IDEMPOTENCY_HEADER}: this key was already used for a different record.`);
      return { status: prior.status, body: prior.response as T, replayed: true };
    }
    const out = await write(transaction);
    row.status = out.status;
    row.response = out.body;
    await row.save({ transaction });
    return { ...out, replayed: false };
  });
}
