import { execFileSync } from 'node:child_process';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { POST as askPOST } from '@/app/api/questions/route';
import { GET as listGET } from '@/app/api/questions/route';
import { DB_UNAVAILABLE_MESSAGE } from '@/lib/db/errors';
import { initModels } from '@/models';
import { freshDemoDatabase } from '../support/db';
import { NextRequest } from 'next/server';
import { sessionCookie } from '../support/act-as';

const ROOT = path.resolve(__dirname, '../..');
const db = (action: 'kill' | 'start' | 'status') =>
  execFileSync('bash', [path.join(ROOT, 'scripts/db.sh'), action], {
    env: { ...process.env, CLACKWATER_ENV: 'test' },
    stdio: 'pipe',
  });

const POSTERS = ['ferncombe_tamsin', 'highcrag_shepherd', 'sorrel_cabin', 'ironwheel_builds'];

describe('MariaDB killed during a burst of posting (real MariaDB, killed with SIGKILL)', () => {
  const acknowledged: { id: number; title: string }[] = [];
  const statuses: number[] = [];
  const messages = new Set<string>();
  let n = 0;

  // session cookies are made before the database goes (making one reads the member's row)
  const cookies = new Map<string, string>();
  let ip = 0;
  async function call(
    handler: (r: NextRequest) => Promise<Response>,
    method: string,
    url: string,
    who: string | null,
    body?: unknown,
  ) {
    const headers: Record<string, string> = {
      'content-type': 'application/json',
      'x-forwarded-for': `10.9.6.${++ip % 250}`,
    };
    if (who) headers.cookie = cookies.get(who)!;
    const res = await handler(
      new NextRequest(`http://localhost${url}`, {
        method,
        headers,
        body: body === undefined ? undefined : JSON.stringify(body),
      }),
    );
    return { status: res.status, body: await res.json() };
  }
  beforeAll(async () => {
    await freshDemoDatabase();
    for (const who of POSTERS) cookies.set(who, await sessionCookie(who));
  });
  afterAll(() => {
    // leave the server up for the files after this one
    db('start');
  });

  async function post(who: string) {
    const title = `Burst post ${++n} from ${who} during the outage test`;
    const res = await call(askPOST, 'POST', '/api/questions', who, {
      title,
      body: 'Posted while the database may be going down; it must be there after.',
      tags: ['survey'],
    });
    statuses.push(res.status);
    if (res.status === 201) acknowledged.push({ id: res.body.id, title });
    else messages.add(`${res.status} ${res.body?.error?.message}`);
    return res.status;
  }
  const burst = (rounds: number) =>
    Promise.all(
      POSTERS.map(async (who) => {
        for (let i = 0; i < rounds; i++) await post(who);
      }),
    );

  it('acknowledges posts, answers 503 while the database is gone, and reconnects by itself when it is back', async () => {
    await burst(2);
    expect(acknowledged.length).toBe(8);

    // kill mid-burst: posts in flight either land or are refused, never half-saved
    const during = burst(3);
    await new Promise((r) => setTimeout(r, 150));
    db('kill');
    await during;
    const outage = await Promise.all([
      post('ferncombe_tamsin'),
      call(listGET, 'GET', '/api/questions?page=1&perPage=5', null).then((r) => r.status),
    ]);
    expect(outage).toEqual([503, 503]);
    expect([...messages]).toContain(`503 ${DB_UNAVAILABLE_MESSAGE}`);
    expect(statuses.filter((s) => s !== 201 && s !== 503)).toEqual([]);

    db('start');
    // the same process, no restart: the pool makes new connections once the server answers
    let back = 0;
    for (let i = 0; i < 20 && back !== 201; i++) {
      back = await post('sorrel_cabin');
      if (back !== 201) await new Promise((r) => setTimeout(r, 500));
    }
    expect(back).toBe(201);
    expect((await call(listGET, 'GET', '/api/questions?page=1&perPage=5', null)).status).toBe(200);
  }, 120_000);

  it('every post acknowledged with 201 is in the database after the restart', async () => {
    const { Question } = initModels();
    const found = await Question.findAll({ where: { id: acknowledged.map((a) => a.id) }, attributes: ['id', 'title'] });
    expect(found.map((q) => ({ id: q.id, title: q.title })).sort((a, b) => a.id - b.id)).toEqual(
      [...acknowledged].sort((a, b) => a.id - b.id),
    );
  });
});
