import { beforeAll, describe, expect, it } from 'vitest';
import { NextRequest } from 'next/server';
import { encode } from 'next-auth/jwt';
import { authSecret } from '@/lib/auth/secret';
import { initModels } from '@/models';
import { POST as askPOST } from '@/app/api/questions/route';
import { GET as threadGET, PUT as questionPUT } from '@/app/api/questions/[id]/route';
import { POST as answerPOST } from '@/app/api/questions/[id]/answers/route';
import { POST as replyPOST } from '@/app/api/questions/[id]/replies/route';
import { PUT as fixedPUT } from '@/app/api/questions/[id]/fixed/route';
import { GET as revisionsGET } from '@/app/api/questions/[id]/revisions/route';
import { GET as similarGET } from '@/app/api/questions/similar/route';
import { PUT as answerPUT } from '@/app/api/answers/[id]/route';
import { POST as helpfulPOST, DELETE as helpfulDELETE } from '@/app/api/helpful/route';
import { MAX_REPLY_DEPTH } from '@/lib/questions/posts';
import { freshDemoDatabase } from '../support/db';

// eslint-disable-next-line @typescript-eslint/no-explicit-any -- route handlers differ in their request and context types
type Handler = (r: any, ctx: any) => Promise<Response>;
const cookies = new Map<string, string>();
async function as(handle: string) {
  if (!cookies.has(handle)) {
    const u = (await initModels().User.findOne({ where: { handle } }))!;
    cookies.set(
      handle,
      `next-auth.session-token=${await encode({ token: { uid: u.id, role: u.role, handle }, secret: authSecret() })}`,
    );
  }
  return cookies.get(handle)!;
}
async function call(
  handler: Handler,
  method: string,
  url: string,
  who: string | null,
  body?: unknown,
  params: Record<string, string> = {},
) {
  const headers: Record<string, string> = { 'content-type': 'application/json' };
  if (who) headers.cookie = await as(who);
  const res = await handler(
    new NextRequest(`http://localhost${url}`, {
      method,
      headers,
      body: body === undefined ? undefined : JSON.stringify(body),
    }),
    { params: Promise.resolve(params) },
  );
  return { status: res.status, body: await res.json() };
}

const ask = {
  title: 'Pump stops after a few beats when the brook drops',
  body: 'Half-inch pump, 4 ft of fall, 12 ft drive pipe. It beats a dozen times and stops shut.',
  tags: ['stall', 'drive-pipe'],
  siteSheet: {
    fall: '4 ft',
    lift: '29 ft',
    driveLength: '12 ft',
    driveSize: '3/4',
    driveMaterial: 'pvc-sch40',
    pumpSize: '1/2',
    pumps: '1',
    symptoms: 'stops-after-some-beats',
  },
};

describe('questions, answers, replies, marks and fixed it (real MariaDB)', () => {
  let qid: number;
  let aid: number;
  beforeAll(freshDemoDatabase);

  it('asks with a site sheet; the asker follows it and the first version is kept', async () => {
    const res = await call(askPOST, 'POST', '/api/questions', 'ferncombe_tamsin', ask);
    expect(res.status).toBe(201);
    qid = res.body.id;
    const t = await call(threadGET, 'GET', `/api/questions/${qid}`, 'ferncombe_tamsin', undefined, { id: String(qid) });
    expect(t.body).toMatchObject({ title: ask.title, siteSheet: ask.siteSheet, followedByViewer: true, answers: [] });
    expect(t.body.tags.map((x: { slug: string }) => x.slug).sort()).toEqual(['drive-pipe', 'stall']);
  });

  it('refuses impossible site sheets and bad fields by name, saving nothing', async () => {
    const { Question } = initModels();
    const before = await Question.count();
    const lowLift = await call(askPOST, 'POST', '/api/questions', 'ferncombe_tamsin', {
      ...ask,
      siteSheet: { ...ask.siteSheet, lift: '3 ft' },
    });
    expect(lowLift.status).toBe(422);
    expect(lowLift.body.error.field).toBe('siteSheet.lift');
    const negative = await call(askPOST, 'POST', '/api/questions', 'ferncombe_tamsin', {
      ...ask,
      siteSheet: { ...ask.siteSheet, sourceFlow: '-2 gal/min' },
    });
    expect(negative.status).toBe(422);
    expect(negative.body.error.field).toBe('siteSheet.sourceFlow');
    const unknownTag = await call(askPOST, 'POST', '/api/questions', 'ferncombe_tamsin', {
      ...ask,
      tags: ['stall', 'no-such-tag'],
    });
    expect(unknownTag.status).toBe(422);
    expect(unknownTag.body.error.field).toBe('tags');
    const empty = await call(askPOST, 'POST', '/api/questions', 'ferncombe_tamsin', { ...ask, title: '' });
    expect(empty.status).toBe(400);
    expect(empty.body.error.field).toBe('title');
    const huge = await call(askPOST, 'POST', '/api/questions', 'ferncombe_tamsin', { ...ask, title: 'x'.repeat(161) });
    expect(huge.body.error.field).toBe('title');
    expect(await Question.count()).toBe(before);
    expect((await call(askPOST, 'POST', '/api/questions', null, ask)).status).toBe(401);
  });

  it('keeps a script in the body as text (it is rendered sanitised, never run)', async () => {
    const res = await call(askPOST, 'POST', '/api/questions', 'sorrel_cabin', {
      ...ask,
      body: 'Tried this: <script>alert(1)</script> and it still stops.',
    });
    expect(res.status).toBe(201);
    const t = await call(threadGET, 'GET', `/api/questions/${res.body.id}`, null, undefined, {
      id: String(res.body.id),
    });
    expect(t.body.body).toContain('<script>alert(1)</script>');
  });

  it('answers, and edits keep a revision history', async () => {
    const res = await call(
      answerPOST,
      'POST',
      `/api/questions/${qid}/answers`,
      'ironwheel_builds',
      { body: 'Twelve feet is short for four feet of fall; try about three times longer.' },
      { id: String(qid) },
    );
    expect(res.status).toBe(201);
    aid = res.body.id;
    const other = await call(
      answerPUT,
      'PUT',
      `/api/answers/${aid}`,
      'quarry_lane_valves',
      { body: 'Not mine to change.' },
      { id: String(aid) },
    );
    expect(other.status).toBe(403);
    const edit = await call(
      answerPUT,
      'PUT',
      `/api/answers/${aid}`,
      'ironwheel_builds',
      { body: 'Twelve feet is short for four feet of fall; try about 24 ft, rigid and straight.' },
      { id: String(aid) },
    );
    expect(edit.status).toBe(200);
    const revs = await call(
      revisionsGET,
      'GET',
      `/api/questions/${qid}/revisions?postType=answer&postId=${aid}`,
      null,
      undefined,
      { id: String(qid) },
    );
    expect(revs.body.revisions.map((r: { body: string }) => r.body)).toEqual([
      'Twelve feet is short for four feet of fall; try about three times longer.',
      'Twelve feet is short for four feet of fall; try about 24 ft, rigid and straight.',
    ]);
    const q = await call(
      questionPUT,
      'PUT',
      `/api/questions/${qid}`,
      'ferncombe_tamsin',
      { ...ask, body: `${ask.body} Edited: the intake screen was clear.` },
      { id: String(qid) },
    );
    expect(q.status).toBe(200);
    const notAsker = await call(questionPUT, 'PUT', `/api/questions/${qid}`, 'highcrag_shepherd', ask, {
      id: String(qid),
    });
    expect(notAsker.status).toBe(403);
  });

  it('nests replies up to the cap, then flattens', async () => {
    let replyTo: number | undefined;
    const depths: number[] = [];
    for (let i = 0; i < MAX_REPLY_DEPTH + 3; i++) {
      const r = await call(
        replyPOST,
        'POST',
        `/api/questions/${qid}/replies`,
        i % 2 ? 'ferncombe_tamsin' : 'ironwheel_builds',
        { body: `reply ${i}`, answerId: aid, ...(replyTo ? { replyToId: replyTo } : {}) },
        { id: String(qid) },
      );
      expect(r.status).toBe(201);
      depths.push(r.body.depth);
      replyTo = r.body.id;
    }
    // depth 0 under the answer, then one deeper each time until the cap, then level
    expect(depths).toEqual([0, 1, 2, 3, 3, 3].slice(0, MAX_REPLY_DEPTH + 3));
  });

  it('marks helpful once per member, never on one’s own post', async () => {
    const self = await call(helpfulPOST, 'POST', '/api/helpful', 'ironwheel_builds', {
      postType: 'answer',
      postId: aid,
    });
    expect(self.status).toBe(403);
    const first = await call(helpfulPOST, 'POST', '/api/helpful', 'ferncombe_tamsin', {
      postType: 'answer',
      postId: aid,
    });
    expect(first.body.helpfulCount).toBe(1);
    const twice = await call(helpfulPOST, 'POST', '/api/helpful', 'ferncombe_tamsin', {
      postType: 'answer',
      postId: aid,
    });
    expect(twice.status).toBe(409);
    await call(helpfulPOST, 'POST', '/api/helpful', 'highcrag_shepherd', { postType: 'answer', postId: aid });
    const back = await call(helpfulDELETE, 'DELETE', '/api/helpful', 'highcrag_shepherd', {
      postType: 'answer',
      postId: aid,
    });
    expect(back.body.helpfulCount).toBe(1);
  });

  it('lets only the asker choose the answer that fixed it, and puts it first', async () => {
    const second = await call(
      answerPOST,
      'POST',
      `/api/questions/${qid}/answers`,
      'quarry_lane_valves',
      { body: 'Check the delivery valve seat for grit as well.' },
      { id: String(qid) },
    );
    expect(
      (
        await call(
          fixedPUT,
          'PUT',
          `/api/questions/${qid}/fixed`,
          'ironwheel_builds',
          { answerId: second.body.id, whatFixedIt: 'Cleaned grit off the delivery valve seat' },
          { id: String(qid) },
        )
      ).status,
    ).toBe(403);
    expect(
      (
        await call(
          fixedPUT,
          'PUT',
          `/api/questions/${qid}/fixed`,
          'ferncombe_tamsin',
          { answerId: second.body.id, whatFixedIt: 'Cleaned grit off the delivery valve seat' },
          { id: String(qid) },
        )
      ).status,
    ).toBe(200);
    const t = await call(threadGET, 'GET', `/api/questions/${qid}`, null, undefined, { id: String(qid) });
    // fixed it first, then helpful marks, then age
    expect(t.body.answers.map((a: { id: number; fixed: boolean }) => [a.id, a.fixed])).toEqual([
      [second.body.id, true],
      [aid, false],
    ]);
    const wrongThread = await call(
      fixedPUT,
      'PUT',
      `/api/questions/${qid}/fixed`,
      'ferncombe_tamsin',
      { answerId: 1, whatFixedIt: 'Cleaned grit off the delivery valve seat' },
      { id: String(qid) },
    );
    expect(wrongThread.status).toBe(422);
  });

  it('attaches a saved worked calculation to an answer', async () => {
    const res = await call(
      answerPOST,
      'POST',
      `/api/questions/${qid}/answers`,
      'ironwheel_builds',
      { body: 'Here are the numbers for your site, worked.', calculationId: 'FerncombeY1' },
      { id: String(qid) },
    );
    expect(res.status).toBe(201);
    const t = await call(threadGET, 'GET', `/api/questions/${qid}`, null, undefined, { id: String(qid) });
    const withCalc = t.body.answers.find((a: { id: number }) => a.id === res.body.id);
    expect(withCalc.calculation).toMatchObject({ id: 'FerncombeY1', tool: 'yield-estimate', inputs: { fall: '4 ft' } });
    const bad = await call(
      answerPOST,
      'POST',
      `/api/questions/${qid}/answers`,
      'ironwheel_builds',
      { body: 'Numbers that do not exist, attached.', calculationId: 'NoSuchCalc' },
      { id: String(qid) },
    );
    expect(bad.status).toBe(422);
  });

  it('finds similar questions by title, tag, fall and lift (from search), marking the fixed ones', async () => {
    const res = await call(
      similarGET,
      'GET',
      '/api/questions/similar?title=Stops+after+a+few+beats+when+the+brook+is+low&tags=stall&fall=4+ft&lift=29+ft',
      null,
    );
    expect(res.status).toBe(200);
    expect(res.body.items[0]).toEqual({ id: qid, title: ask.title, fixed: true });
  });
});
