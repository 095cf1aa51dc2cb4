// first, as in Next's own server: gives Next's request stores a real AsyncLocalStorage
import 'next/dist/server/node-environment-baseline';
import { execFileSync, spawnSync } from 'node:child_process';
import { rmSync } from 'node:fs';
import path from 'node:path';
import * as mariadb from 'mariadb';
import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { GET as listGET } from '@/app/api/questions/route';
import { GET as settingsGET, PUT as settingsPUT } from '@/app/api/account/settings/route';
import { getSequelize } from '@/lib/db';
import { onPrimary, wantPrimaryWhen } from '@/lib/db/read-your-writes';
import { renderWantsPrimary } from '@/lib/http/read-your-writes';
import { workUnitAsyncStorage } from 'next/dist/server/app-render/work-unit-async-storage.external';
import { RequestCookies } from 'next/dist/server/web/spec-extension/cookies';
import { replicaHealth } from '@/lib/db/replication';
import { authOptions } from '@/lib/auth/options';
import { hashPassword } from '@/lib/auth/password';
import { initModels } from '@/models';
import { freshDemoDatabase } from '../support/db';
import { actAs, sessionCookie } from '../support/act-as';

/**
 * A real primary with a binary log and a real replica fed by MariaDB's replication, both
 * started here on their own ports and data directories (never the suite's test server on
 * 3408, which runs without a binary log): REPLICATION_PRIMARY_PORT / REPLICATION_REPLICA_PORT.
 */
const ROOT = path.resolve(__dirname, '../..');
const PRIMARY_DIR = path.join(ROOT, '.data/replication-primary');
const REPLICA_DIR = path.join(ROOT, '.data/replication-replica');
// before the imports run: some of them (the auth options) make the app's Sequelize instance
const { PRIMARY_PORT, REPLICA_PORT, savedEnv } = vi.hoisted(() => {
  const PRIMARY_PORT = process.env.REPLICATION_PRIMARY_PORT ?? '3420';
  const REPLICA_PORT = process.env.REPLICATION_REPLICA_PORT ?? '3421';
  const savedEnv = {
    DB_PORT: process.env.DB_PORT,
    DB_REPLICAS: process.env.DB_REPLICAS,
    DB_REPLICA_RETRY_S: process.env.DB_REPLICA_RETRY_S,
    DATABASE_URL: process.env.DATABASE_URL,
  };
  // this file's own servers even where the suite runs against another MariaDB
  delete process.env.DATABASE_URL;
  process.env.DB_PORT = PRIMARY_PORT;
  process.env.DB_REPLICAS = `127.0.0.1:${REPLICA_PORT}`;
  // the replicas are tried again a second after a failure, so the test need not wait long
  process.env.DB_REPLICA_RETRY_S = '1';
  return { PRIMARY_PORT, REPLICA_PORT, savedEnv };
});

const HAS_MARIADBD = spawnSync('bash', ['-c', 'command -v mariadbd || test -x /usr/sbin/mariadbd']).status === 0;
if (!HAS_MARIADBD)
  console.warn('replication test skipped: mariadbd is not installed (scripts/ensure-system.sh installs it)');

const scriptEnv = {
  ...process.env,
  CLACKWATER_ENV: 'test',
  DB_PORT: PRIMARY_PORT,
  DB_DATA_DIR: PRIMARY_DIR,
  DB_BINLOG: '1',
  DB_BUFFER_POOL: '64M',
  REPLICA_PORT,
  REPLICA_DATA_DIR: REPLICA_DIR,
};
const sh = (script: 'db.sh' | 'db-replica.sh', action: string) =>
  execFileSync('bash', [path.join(ROOT, 'scripts', script), action], { env: scriptEnv, stdio: 'pipe' });

/** A root connection over the server's own socket, beside the app's pools. */
async function asRoot<T>(dir: string, sql: string, values?: unknown[]): Promise<T[]> {
  const conn = await mariadb.createConnection({ socketPath: path.join(dir, 'sock'), user: 'root' });
  try {
    return (await conn.query(sql, values)) as T[];
  } finally {
    await conn.end();
  }
}
const comSelect = async (dir: string) =>
  Number((await asRoot<{ Value: string }>(dir, "SHOW GLOBAL STATUS LIKE 'Com_select'"))[0]!.Value);

async function caughtUp() {
  const [{ pos }] = await asRoot<{ pos: string }>(PRIMARY_DIR, 'SELECT @@GLOBAL.gtid_binlog_pos AS pos');
  const [{ w }] = await asRoot<{ w: number }>(REPLICA_DIR, 'SELECT MASTER_GTID_WAIT(?, 30) AS w', [pos]);
  expect(Number(w), `replica reaches GTID ${pos}`).toBe(0);
}

/** Which server answered a read made the way the app makes them (a SELECT outside a transaction). */
async function serverOfRead(): Promise<number> {
  const [row] = await getSequelize().query<{ sid: number }>('SELECT @@server_id AS sid', { type: QueryTypes.SELECT });
  return Number(row!.sid);
}

describe.skipIf(!HAS_MARIADBD)('read replica: MariaDB replication with Sequelize read replication', () => {
  const { raw } = actAs('10.7.63');
  const MEMBER = 'sorrel_cabin';
  const settingsBody = (region: string) => ({ displayName: 'Sorrel Cabin', region, bio: '', units: 'US' });
  const markerOf = (res: Response) => /cw_rw=[^;]+/.exec(res.headers.get('set-cookie') ?? '')?.[0];

  beforeAll(async () => {
    sh('db-replica.sh', 'kill');
    rmSync(REPLICA_DIR, { recursive: true, force: true });
    sh('db.sh', 'start');
    sh('db-replica.sh', 'start');
    // the migrations read what they just wrote: the primary, as scripts/migrate does
    await onPrimary(() => freshDemoDatabase());
    await caughtUp();
  }, 180_000);

  afterAll(async () => {
    await getSequelize().close();
    // no later file in this process may find the closed instance or these settings
    delete (globalThis as { __clackwaterSequelize?: unknown }).__clackwaterSequelize;
    for (const [k, v] of Object.entries(savedEnv)) {
      if (v === undefined) delete process.env[k];
      else process.env[k] = v;
    }
    sh('db-replica.sh', 'stop');
    sh('db.sh', 'stop');
  }, 120_000);

  it('a write on the primary is read from the replica once it has caught up', async () => {
    const put = await raw(settingsPUT, 'PUT', '/api/account/settings', MEMBER, settingsBody('Upper Wendle'));
    expect(put.status).toBe(200);
    await caughtUp();
    const before = await comSelect(REPLICA_DIR);
    // no marker cookie: an ordinary read
    const got = await raw(settingsGET, 'GET', '/api/account/settings', MEMBER);
    expect((await got.json()).region).toBe('Upper Wendle');
    expect(await comSelect(REPLICA_DIR)).toBeGreaterThan(before);
    expect(await serverOfRead()).toBe(2);
  });

  it('the public lists are read from the replica, not the primary', async () => {
    const primaryBefore = await comSelect(PRIMARY_DIR);
    const replicaBefore = await comSelect(REPLICA_DIR);
    const res = await raw(listGET, 'GET', '/api/questions?page=1&perPage=10', null);
    expect(res.status).toBe(200);
    expect((await res.json()).items.length).toBeGreaterThan(0);
    expect(await comSelect(REPLICA_DIR)).toBeGreaterThan(replicaBefore);
    expect(await comSelect(PRIMARY_DIR)).toBe(primaryBefore);
  });

  it("a member's own read right after their write comes from the primary, even while the replica lags", async () => {
    // hold the replica back so "read from the replica" and "read from the primary" differ
    await asRoot(REPLICA_DIR, 'STOP SLAVE SQL_THREAD');
    try {
      const put = await raw(settingsPUT, 'PUT', '/api/account/settings', MEMBER, settingsBody('Lower Wendle'));
      expect(put.status).toBe(200);
      const marker = markerOf(put);
      expect(marker, 'a write response sets the read-your-writes marker').toBeDefined();

      const own = await raw(settingsGET, 'GET', '/api/account/settings', MEMBER);
      // without the marker the replica's older copy is what anyone would get: the lag is real
      expect((await own.json()).region).toBe('Upper Wendle');

      const cookie = `${await sessionCookie(MEMBER)}; ${marker}`;
      const mine = await raw(settingsGET, 'GET', '/api/account/settings', null, undefined, {}, { cookie });
      expect(mine.status).toBe(200);
      expect((await mine.json()).region).toBe('Lower Wendle');

      // a page or public handler (not through guarded) on a request with the marker, as
      // instrumentation.ts registers it; Next's request store is stood in for here
      wantPrimaryWhen(renderWantsPrimary);
      const store = (cookie: string) =>
        ({ type: 'request', cookies: new RequestCookies(new Headers({ cookie })) }) as unknown as Parameters<
          typeof workUnitAsyncStorage.run
        >[0];
      expect(await workUnitAsyncStorage.run(store(marker!), serverOfRead)).toBe(1);
      expect(await workUnitAsyncStorage.run(store('cw_units=US'), serverOfRead)).toBe(2);
    } finally {
      wantPrimaryWhen(() => false);
      await asRoot(REPLICA_DIR, 'START SLAVE SQL_THREAD');
    }
    await caughtUp();
  });

  it('a password just changed signs in at once, whatever the replica has applied', async () => {
    const { User } = initModels();
    const member = (await User.findOne({ where: { handle: MEMBER } }))!;
    const authorize = (
      authOptions.providers.find(
        (x) => (x as unknown as { options?: { id?: string } }).options?.id === 'password',
      ) as unknown as { options: { authorize: (c: Record<string, string>, r: unknown) => Promise<unknown> } }
    ).options.authorize;
    await asRoot(REPLICA_DIR, 'STOP SLAVE SQL_THREAD');
    try {
      const password = 'a new password for the ram shed';
      await User.update({ passwordHash: await hashPassword(password) }, { where: { id: member.id } });
      const user = await authorize(
        { email: member.email, password },
        { headers: { 'x-forwarded-for': '10.7.63.200' } },
      );
      expect(user).toMatchObject({ id: String(member.id) });
    } finally {
      await asRoot(REPLICA_DIR, 'START SLAVE SQL_THREAD');
    }
    await caughtUp();
  });

  it('with the replica killed (SIGKILL), reads are answered by the primary without an error, and return to it when it is back', async () => {
    const warn = vi.spyOn(console, 'warn').mockImplementation(() => {});
    try {
      expect(await serverOfRead()).toBe(2);
      // a read already running on the replica when it dies is answered again by the primary
      const inFlight = getSequelize().query<{ sid: number }>('SELECT SLEEP(1) AS s, @@server_id AS sid', {
        type: QueryTypes.SELECT,
      });
      await new Promise((r) => setTimeout(r, 300));
      sh('db-replica.sh', 'kill');
      expect(Number((await inFlight)[0]!.sid)).toBe(1);
      for (let i = 0; i < 5; i++) {
        const res = await raw(listGET, 'GET', '/api/questions?page=1&perPage=10', null);
        expect(res.status).toBe(200);
        expect((await res.json()).items.length).toBeGreaterThan(0);
        const got = await raw(settingsGET, 'GET', '/api/account/settings', MEMBER);
        expect(got.status).toBe(200);
        expect((await got.json()).region).toBe('Lower Wendle');
        expect(await serverOfRead()).toBe(1);
      }
      expect(replicaHealth(getSequelize())!.fallbacks).toBeGreaterThan(0);
      const downs = warn.mock.calls.filter((c) => String(c[0]).includes('read replicas not answering'));
      expect(downs, 'the outage is logged once, not per read').toHaveLength(1);

      sh('db-replica.sh', 'start');
      await caughtUp();
      // the replicas are tried again DB_REPLICA_RETRY_S (1 s) after the last failure
      const deadline = Date.now() + 15_000;
      let sid = await serverOfRead();
      while (sid !== 2 && Date.now() < deadline) {
        await new Promise((r) => setTimeout(r, 250));
        sid = await serverOfRead();
      }
      expect(sid).toBe(2);
      expect(warn.mock.calls.some((c) => String(c[0]).includes('answering again'))).toBe(true);
    } finally {
      warn.mockRestore();
    }
  }, 120_000);
});
