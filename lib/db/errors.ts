import 'server-only';
/**
 * Recognises "the database is not reachable" among the errors Sequelize and the
 * mariadb driver throw, so routes can answer 503 with a readable message instead of
 * a stack trace.
 */
const UNAVAILABLE_NAMES = new Set([
  'SequelizeConnectionError',
  'SequelizeConnectionRefusedError',
  'SequelizeHostNotFoundError',
  'SequelizeHostNotReachableError',
  'SequelizeConnectionTimedOutError',
  'SequelizeConnectionAcquireTimeoutError',
  'SequelizeAccessDeniedError',
  'SequelizeInvalidConnectionError',
]);
const UNAVAILABLE_CODES = new Set([
  'ECONNREFUSED',
  'ECONNRESET',
  'ETIMEDOUT',
  'EPIPE',
  'ER_GET_CONNECTION_TIMEOUT',
  'ER_CONNECTION_TIMEOUT',
  'ER_SOCKET_UNEXPECTED_CLOSE',
  'ER_CONNECTION_ALREADY_CLOSED',
  'ER_CLOSING_POOL',
  'ER_POOL_ALREADY_CLOSED',
  'ER_SERVER_SHUTDOWN',
]);

export const DB_UNAVAILABLE_MESSAGE =
  'The database is not answering right now. Nothing you sent was lost; please try again in a minute.';

export function isDatabaseUnavailable(err: unknown): boolean {
  let cur: unknown = err;
  for (let depth = 0; cur && depth < 5; depth++) {
    const e = cur as { name?: string; code?: string; parent?: unknown; original?: unknown; cause?: unknown };
    if (e.name && UNAVAILABLE_NAMES.has(e.name)) return true;
    if (e.code && UNAVAILABLE_CODES.has(e.code)) return true;
    cur = e.parent ?? e.original ?? e.cause;
  }
  return false;
}

/**
 * A deadlock or lock-wait timeout (MariaDB 1213 / 1205): InnoDB rolled the transaction
 * back and says to restart it. Work that is safe to repeat (a claim, a counter) retries.
 */
export function isLockConflict(err: unknown): boolean {
  let cur: unknown = err;
  for (let depth = 0; cur && depth < 5; depth++) {
    const e = cur as { errno?: number; parent?: unknown; original?: unknown; cause?: unknown };
    if (e.errno === 1213 || e.errno === 1205) return true;
    cur = e.parent ?? e.original ?? e.cause;
  }
  return false;
}
