import mariadb, { type Connection } from 'mariadb';

/**
 * What the outbox holds for an address, read straight from the test database: put
 * into a browser test's failure message, it tells a message that was never queued
 * from one waiting on a retry or one claimed by a worker that did not finish.
 */
export async function outboxFor(address: string): Promise<string> {
  let conn: Connection | null = null;
  try {
    conn = await mariadb.createConnection({
      host: process.env.DB_HOST ?? '127.0.0.1',
      port: Number(process.env.DB_PORT ?? 3408),
      user: process.env.DB_USER ?? 'clackwater',
      password: process.env.DB_PASSWORD ?? 'clackwater',
      database: process.env.DB_NAME ?? 'clackwater_test',
    });
    const rows: Record<string, unknown>[] = await conn.query(
      `SELECT id, kind, subject, status, attempts, next_attempt_at, locked_until, created_at, sent_at, last_error, NOW(3) AS db_now
         FROM mail_outbox WHERE to_address = ? ORDER BY id`,
      [address],
    );
    return rows.length ? rows.map((r) => JSON.stringify(r)).join('\n') : `nothing queued for ${address}`;
  } catch (err) {
    return `could not read the outbox: ${err instanceof Error ? err.message : String(err)}`;
  } finally {
    await conn?.end().catch(() => {});
  }
}
