import 'server-only';
import * as mariadb from 'mariadb';
import { readDbConfig } from './config';

/**
 * The health check's own connection, outside Sequelize's pool: when every pooled
 * connection is busy (a burst of exports, a slow query), /api/health must still say
 * whether the database answers, within a second, rather than wait in the pool's
 * queue. One connection per process, opened on first use and again after a failure;
 * concurrent checks share one ping in flight.
 */
const globalForHealth = globalThis as unknown as {
  __clackwaterHealth?: { conn?: mariadb.Connection; inFlight?: Promise<{ latencyMs: number }> };
};

function state() {
  if (!globalForHealth.__clackwaterHealth) globalForHealth.__clackwaterHealth = {};
  return globalForHealth.__clackwaterHealth;
}

const PING_TIMEOUT_MS = 2_000;

async function connection(): Promise<mariadb.Connection> {
  const s = state();
  if (s.conn && s.conn.isValid()) return s.conn;
  const cfg = readDbConfig();
  s.conn = await mariadb.createConnection({
    host: cfg.host,
    port: cfg.port,
    user: cfg.user,
    password: cfg.password,
    database: cfg.database,
    connectTimeout: PING_TIMEOUT_MS,
  });
  return s.conn;
}

async function ping(): Promise<{ latencyMs: number }> {
  const t0 = performance.now();
  try {
    const conn = await connection();
    let timer: ReturnType<typeof setTimeout> | undefined;
    const late = new Promise<never>((_, reject) => {
      timer = setTimeout(
        () => reject(new Error(`the database did not answer within ${PING_TIMEOUT_MS} ms`)),
        PING_TIMEOUT_MS,
      );
    });
    try {
      await Promise.race([conn.query('SELECT 1'), late]);
    } finally {
      clearTimeout(timer);
    }
  } catch (err) {
    const s = state();
    s.conn?.destroy();
    s.conn = undefined;
    throw err;
  }
  return { latencyMs: Math.round((performance.now() - t0) * 10) / 10 };
}

/** Round-trips SELECT 1 on the health connection; throws when the database does not answer. */
export function pingDatabaseDirect(): Promise<{ latencyMs: number }> {
  const s = state();
  if (!s.inFlight)
    s.inFlight = ping().finally(() => {
      s.inFlight = undefined;
    });
  return s.inFlight;
}

/** Closes the health connection (tests, shutdown). */
export async function closeHealthConnection(): Promise<void> {
  const s = state();
  const conn = s.conn;
  s.conn = undefined;
  await conn?.end().catch(() => conn.destroy());
}
