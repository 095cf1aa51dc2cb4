import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { POST as askPOST } from '@/app/api/questions/route';
import { POST as actionPOST } from '@/app/api/review/actions/route';
import { GET as searchGET } from '@/app/api/search/route';
import { ensureIndex, setSearchEngine, stopIndexFeed } from '@/lib/search';
import type { SearchDoc } from '@/lib/search/documents';
import { FlexEngine } from '@/lib/search/flex-engine';
import { IndexFeed } from '@/lib/search/feed';
import { queryTerms } from '@/lib/search/normalize';
import { closeRedis } from '@/lib/redis';
import { freshDemoDatabase } from '../support/db';
import { actAs } from '../support/act-as';
import { TestRedis } from '../support/redis-server';

/**
 * Two app instances' search indexes in one process: "A" is this process's own index
 * (lib/search, written through the API handlers as a request would), "B" another
 * instance's in-process engine fed only by what comes over Redis.
 */
const { call } = actAs('10.8.1');
const server = new TestRedis();
const b = new FlexEngine();
let gapsOnB = 0;
const feedB = new IndexFeed(
  async (c) => {
    if (c.upsert) await b.upsert(c.upsert);
    if (c.remove) await b.remove(c.remove);
  },
  () => gapsOnB++,
);
const state = () =>
  (globalThis as unknown as { __clackwaterSearch?: { built: Promise<void> | null } }).__clackwaterSearch;

const onB = async (q: string) => (await b.search(queryTerms(q), { includeHidden: false }, 20, 0)).docs.map((d) => d.id);
const onA = async (q: string) => {
  const res = await call(searchGET, 'GET', `/api/search?q=${encodeURIComponent(q)}`, null);
  expect(res.status).toBe(200);
  return (res.body.items as { id: string }[]).map((h) => h.id);
};
/** Polls until `check` holds; the time it took, or fails after `ms`. */
async function within(ms: number, check: () => Promise<boolean>): Promise<number> {
  const t0 = Date.now();
  while (!(await check())) {
    if (Date.now() - t0 > ms) throw new Error(`not within ${ms} ms`);
    await new Promise((r) => setTimeout(r, 20));
  }
  return Date.now() - t0;
}

describe('in-process search indexes follow each other through Redis (REDIS_URL)', () => {
  beforeAll(async () => {
    await server.start();
    process.env.REDIS_URL = server.url;
    await freshDemoDatabase();
    setSearchEngine(new FlexEngine());
    await ensureIndex();
    await feedB.start();
  });
  afterAll(async () => {
    try {
      feedB.stop();
      stopIndexFeed();
      delete process.env.REDIS_URL;
      setSearchEngine(new FlexEngine());
      await closeRedis();
    } finally {
      await server.stop();
    }
  });

  let qid = 0;
  it('a question asked on A is found on B within a second', async () => {
    const res = await call(askPOST, 'POST', '/api/questions', 'ferncombe_tamsin', {
      title: 'Tarnbeck ram loses its prime overnight',
      body: 'Every morning the waste valve sits open and the drive pipe has drained back to the intake.',
      tags: ['drive-pipe'],
    });
    expect(res.status).toBe(201);
    qid = res.body.id;
    expect(await onA('tarnbeck')).toContain(`question-${qid}`);
    // within a second of the write (issue 23's target for search across instances)
    expect(await within(1_000, async () => (await onB('tarnbeck')).includes(`question-${qid}`))).toBeLessThan(1_000);
  });

  it('a moderator hiding it on A hides it on B', async () => {
    const hide = await call(actionPOST, 'POST', '/api/review/actions', 'moss_moderator', {
      action: 'hide',
      postType: 'question',
      postId: qid,
      reason: 'checking search on two instances',
    });
    expect(hide.status).toBe(200);
    expect(await onA('tarnbeck')).not.toContain(`question-${qid}`);
    await within(1_000, async () => !(await onB('tarnbeck')).includes(`question-${qid}`));
  });

  it("B's changes reach A, and removals too", async () => {
    const doc: SearchDoc = {
      id: 'question-990001',
      kind: 'question',
      title: 'Hollinsgarth ram on the far paddock',
      head: 'Hollinsgarth ram on the far paddock',
      url: '/questions/990001',
      text: 'A second instance indexed this.',
      tags: [],
      solved: false,
      level: null,
      hidden: false,
      date: new Date().toISOString(),
      threadId: 990001,
    };
    await feedB.publish({ upsert: [doc] });
    await within(1_000, async () => (await onA('hollinsgarth')).includes(doc.id));
    await feedB.publish({ remove: [doc.id] });
    await within(1_000, async () => !(await onA('hollinsgarth')).includes(doc.id));
  });

  it('after losing Redis, an instance rebuilds from the database (it cannot know what it missed)', async () => {
    expect(state()?.built).not.toBeNull();
    await server.stop();
    await server.start();
    // ioredis retries at most every 2 s (lib/redis.ts), then subscribes again
    await within(6_000, async () => state()?.built === null && gapsOnB > 0);
    // and it hears changes again
    const res = await call(askPOST, 'POST', '/api/questions', 'ferncombe_tamsin', {
      title: 'Skelwith ram stalls when the brook is in spate',
      body: 'High water backs up over the waste valve and the beat stops until it drops.',
      tags: ['drive-pipe'],
    });
    expect(res.status).toBe(201);
    await within(3_000, async () => (await onB('skelwith')).includes(`question-${res.body.id}`));
    expect(await onA('skelwith')).toContain(`question-${res.body.id}`);
  });
});
