import { spawnSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import mariadb from 'mariadb';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { sessionCookie } from '../support/act-as';
import { SmtpCatcher } from '../support/smtp-catcher';
import { getSequelize } from '@/lib/db';
import { DEMO_PASSWORD } from '@/migrations/seed/demo-data';
import { BALANCER, CLUSTER, ports } from './ports';

/**
 * Issue 23: Clackwater as a host runs it on several instances, started by the repo's own
 * script (scripts/cluster.sh): HAProxy in front of two app instances on one build, Redis,
 * a MariaDB primary and its replica, all Debian's servers on 127.0.0.1.
 */
const ROOT = path.resolve(__dirname, '../..');
const A = `http://127.0.0.1:${ports.appA}`;
const B = `http://127.0.0.1:${ports.appB}`;
const DIR = path.join(ROOT, '.data/cluster');
const catcher = new SmtpCatcher(ports.smtp);

function cluster(action: 'start' | 'stop', extra: Record<string, string> = {}) {
  const r = spawnSync('bash', [path.join(ROOT, 'scripts/cluster.sh'), action], {
    env: { ...process.env, ...CLUSTER, ...extra },
    encoding: 'utf8',
    timeout: 240_000,
  });
  if (r.status !== 0) throw new Error(`cluster.sh ${action} failed:\n${r.stdout}\n${r.stderr}`);
  return r.stdout;
}

let ip = 0;
/** Each request from its own client address (HAProxy and the instances count the last hop: TRUST_PROXY_HOPS=1). */
async function send(base: string, p: string, init: { method?: string; who?: string; body?: unknown } = {}) {
  const headers: Record<string, string> = { 'x-forwarded-for': `10.23.${Math.floor(++ip / 250)}.${ip % 250}` };
  if (init.who) headers.cookie = await sessionCookie(init.who);
  if (init.body !== undefined) {
    headers['content-type'] = 'application/json';
    headers.origin = BALANCER;
  }
  const res = await fetch(`${base}${p}`, {
    method: init.method ?? (init.body === undefined ? 'GET' : 'POST'),
    headers,
    body: init.body === undefined ? undefined : JSON.stringify(init.body),
    redirect: 'manual',
  });
  const text = await res.text();
  return { status: res.status, text, json: () => JSON.parse(text) };
}

/**
 * Polls until `check` holds; returns when the check that held was sent, counted from the
 * start. Fails when a check sent after `ms` still does not hold: "within a second" is what a
 * request made a second after the write sees, however long that request then takes.
 */
async function within(ms: number, check: () => Promise<boolean>, what: string): Promise<number> {
  const t0 = Date.now();
  for (;;) {
    const sent = Date.now() - t0;
    if (await check()) return sent;
    if (sent > ms) throw new Error(`${what}: not within ${ms} ms`);
    await new Promise((r) => setTimeout(r, 50));
  }
}

async function comSelect(port: number): Promise<number> {
  const conn = await mariadb.createConnection({
    host: '127.0.0.1',
    port,
    user: process.env.DB_USER ?? 'clackwater',
    password: process.env.DB_PASSWORD ?? 'clackwater',
  });
  try {
    const rows: { Value: string }[] = await conn.query("SHOW GLOBAL STATUS LIKE 'Com_select'");
    return Number(rows[0]?.Value ?? NaN);
  } finally {
    await conn.end();
  }
}

const pidOf = (file: string) => Number(readFileSync(file, 'utf8').trim());
const replicaRunning = () => CLUSTER.REPLICA_READY === '1';

describe('several instances on the engines a host would use (npm run cluster)', () => {
  beforeAll(async () => {
    await catcher.start();
    cluster('stop');
    const out = cluster('start', { CLUSTER_FRESH: '1' });
    CLUSTER.REPLICA_READY = /running without a replica/.test(out) ? '0' : '1';
  }, 300_000);
  afterAll(async () => {
    try {
      cluster('stop');
    } finally {
      await catcher.stop();
      await getSequelize().close();
    }
  }, 120_000);

  let qid = 0;
  let threadUrl = '';
  const title = 'Cluster check Brackenfold ram skips beats at dusk';

  it('1. a question asked on instance A is read through instance B', async () => {
    const asked = await send(A, '/api/questions', {
      who: 'ferncombe_tamsin',
      body: {
        title,
        body: 'The beat falters every evening as the brook cools; the waste valve seems to stick.',
        tags: ['tuning'],
      },
    });
    expect(asked.status, asked.text).toBe(201);
    qid = asked.json().id;
    threadUrl = asked.json().url;
    const page = await send(B, threadUrl);
    expect(page.status).toBe(200);
    expect(page.text).toContain(title);
    expect((await send(B, '/questions')).text).toContain(title);
  });

  it('6. a post made on A is found by /api/search on B within a second', async () => {
    // B's search route loaded once, so the second measures the index change, not the route's first load
    for (const q of ['ram', 'waste valve'])
      expect((await send(B, `/api/search?q=${encodeURIComponent(q)}`)).status).toBe(200);
    const answered = await send(A, `/api/questions/${qid}/answers`, {
      who: 'ironwheel_builds',
      body: { body: 'Check the clapper for a film of Glenmorrow algae: it makes the valve sticky as the water cools.' },
    });
    expect(answered.status, answered.text).toBe(201);
    const aid = answered.json().id;
    const found = async () => {
      const res = await send(B, `/api/search?q=${encodeURIComponent('glenmorrow algae')}`);
      return res.status === 200 && res.json().items.some((h: { id: string }) => h.id === `answer-${aid}`);
    };
    // within a second of the write (issue 23's target for search across instances)
    expect(await within(1_000, found, 'the answer found on B')).toBeLessThanOrEqual(1_000);
  });

  it('8. the notification e-mail for that answer is sent once, with the outbox worker on every instance', async () => {
    const to = 'tamsin@ferncombe.example';
    const subject = `New answer: ${title}`;
    const count = () => catcher.messages.filter((m) => m.to.includes(to) && m.subject === subject).length;
    await within(30_000, async () => count() >= 1, 'the answer notification');
    // both workers flush every 2 s here (MAIL_FLUSH_CRON in ./ports.ts): give each several turns
    await new Promise((r) => setTimeout(r, 6_000));
    expect(count()).toBe(1);
  });

  it('5. sign-in failures spread across A and B reach the limit at the same total as on one instance', async () => {
    const email = 'cabin@sorrelcreek.example';
    const attempt = async (base: string) => {
      const csrf = await fetch(`${base}/api/auth/csrf`);
      const cookie = csrf.headers
        .getSetCookie()
        .map((c) => c.split(';')[0])
        .join('; ');
      const { csrfToken } = (await csrf.json()) as { csrfToken: string };
      const res = await fetch(`${base}/api/auth/callback/password`, {
        method: 'POST',
        headers: {
          cookie,
          'content-type': 'application/x-www-form-urlencoded',
          // a new address each time: only the per-account count can refuse
          'x-forwarded-for': `198.51.100.${++ip % 250}`,
        },
        body: new URLSearchParams({ csrfToken, email, password: `${DEMO_PASSWORD}-wrong`, json: 'true' }),
        redirect: 'manual',
      });
      const { url } = (await res.json()) as { url: string };
      return new URL(url).searchParams.get('error') ?? '(none)';
    };
    const errors: string[] = [];
    for (let i = 0; i < 6; i++) errors.push(await attempt(i % 2 === 0 ? A : B));
    // 5 tries per account a quarter hour (lib/auth/rate-limit.ts signInAccount; common practice, no source)
    expect(
      errors.slice(0, 5).every((e) => /do not match an account/.test(e)),
      errors.join(' | '),
    ).toBe(true);
    expect(errors[5]).toMatch(/Too many attempts/);
    expect(await attempt(B)).toMatch(/Too many attempts/);
    expect(await attempt(A)).toMatch(/Too many attempts/);
  });

  /** 2b's result, watched at the same time as 2a's list: each has the same second from the hide */
  let pageGone: Promise<unknown> = Promise.resolve('not watched');
  it('2a. a moderator hiding the question on A takes it off the questions list on B within a second', async () => {
    // B has the thread page in its cache from test 1
    expect((await send(B, threadUrl)).text).toContain(title);
    const hidden = await send(A, '/api/review/actions', {
      who: 'moss_moderator',
      body: { action: 'hide', postType: 'question', postId: qid, reason: 'cluster check' },
    });
    expect(hidden.status, hidden.text).toBe(200);
    // within a second (issue 23's target for a moderator's hide on every instance)
    pageGone = within(
      1_000,
      async () => {
        const page = await send(B, threadUrl);
        return page.status === 404 && !page.text.includes(title);
      },
      'the hidden question gone from B’s thread page',
    ).catch((err: Error) => err);
    await within(
      1_000,
      async () => !(await send(B, '/questions')).text.includes(title),
      'the hidden question gone from B’s list',
    );
  });

  it('2b. … and off B’s thread page within a second (a page cache shared by the instances)', async () => {
    const gone = await pageGone;
    if (gone instanceof Error) throw gone;
    expect(typeof gone).toBe('number');
  });

  it('3. the replica serves the lists: its Com_select grows with list loads, the primary’s does not', async () => {
    expect(replicaRunning(), 'scripts/db-replica.sh is missing: no replica to read from').toBe(true);
    // twenty pages not asked for before (a response cache in front would have none of them)
    const loads = Array.from({ length: 20 }, (_, i) => `/questions?page=1&perPage=${i + 1}`);
    const [primary0, replica0] = [await comSelect(ports.db), await comSelect(ports.replica)];
    const t0 = Date.now();
    for (const p of loads) expect((await send(BALANCER, p)).status).toBe(200);
    const took = Date.now() - t0;
    const [primary1, replica1] = [await comSelect(ports.db), await comSelect(ports.replica)];
    // the primary's own traffic meanwhile (the balancer's health checks, the outbox workers), measured
    // over as long a time with no list loads
    await new Promise((r) => setTimeout(r, took));
    const idle = (await comSelect(ports.db)) - primary1;
    // each list load reads its page with at least one SELECT (lib/questions/list.ts)
    expect(replica1 - replica0).toBeGreaterThanOrEqual(loads.length);
    expect(primary1 - primary0 - idle, `primary ${primary1 - primary0} during the loads, ${idle} idle`).toBeLessThan(
      loads.length,
    );
  });

  it('4. SIGTERM to one instance under a steady stream through the balancer loses no request', async () => {
    const results = { ok: 0, okAfterStop: 0, bad: [] as string[] };
    let stopAt = Infinity;
    let stoppedAt = Infinity;
    const worker = async () => {
      while (Date.now() < stopAt) {
        const sent = Date.now();
        try {
          const res = await fetch(`${BALANCER}/questions`, { headers: { 'x-forwarded-for': '10.24.0.1' } });
          await res.arrayBuffer();
          if (res.status >= 200 && res.status < 300) {
            results.ok++;
            if (sent > stoppedAt) results.okAfterStop++;
          } else results.bad.push(`HTTP ${res.status}`);
        } catch (err) {
          results.bad.push(err instanceof Error ? err.message : String(err));
        }
      }
    };
    stopAt = Date.now() + 10_000;
    const workers = Array.from({ length: 4 }, worker);
    await new Promise((r) => setTimeout(r, 2_000));
    process.kill(pidOf(path.join(DIR, `app-${ports.appA}.pid`)), 'SIGTERM');
    stoppedAt = Date.now();
    await Promise.all(workers);
    // none lost: the instance finishes what it has in flight and HAProxy resends refused connections
    expect(results.bad, results.bad.slice(0, 5).join(' | ')).toEqual([]);
    // the stream ran on across the stop: each of the four workers was answered after it (common practice, no source)
    expect(results.okAfterStop, `${results.ok} answered in all`).toBeGreaterThanOrEqual(4);
    await within(10_000, async () => (await fetch(`${A}/api/health`).catch(() => null)) === null, 'A stopped');
  });

  it('7. with the replica killed (SIGKILL), reads go to the primary without errors', async () => {
    expect(replicaRunning(), 'scripts/db-replica.sh is missing: no replica to kill').toBe(true);
    process.kill(pidOf(path.join(DIR, 'mariadb-replica/pid')), 'SIGKILL');
    const primary0 = await comSelect(ports.db);
    const statuses: number[] = [];
    // ten more pages not asked for before (the demo has more than twenty questions)
    for (let perPage = 1; perPage <= 10; perPage++)
      statuses.push((await send(BALANCER, `/questions?page=2&perPage=${perPage}`)).status);
    expect(
      statuses.every((s) => s === 200),
      statuses.join(','),
    ).toBe(true);
    expect((await comSelect(ports.db)) - primary0).toBeGreaterThanOrEqual(10);
  });
});
