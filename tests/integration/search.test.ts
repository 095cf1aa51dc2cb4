import { beforeAll, describe, expect, it } from 'vitest';
import { GET as searchGET } from '@/app/api/search/route';
import { POST as askPOST } from '@/app/api/questions/route';
import { PUT as questionPUT } from '@/app/api/questions/[id]/route';
import { POST as answerPOST } from '@/app/api/questions/[id]/answers/route';
import { POST as replyPOST } from '@/app/api/questions/[id]/replies/route';
import { PUT as answerPUT } from '@/app/api/answers/[id]/route';
import { POST as actionPOST } from '@/app/api/review/actions/route';
import { POST as flagPOST } from '@/app/api/flags/route';
import { GET as similarGET } from '@/app/api/questions/similar/route';
import { POST as fieldLogPOST } from '@/app/api/field-log/route';
import { rebuildIndex, searchEngine } from '@/lib/search';
import { freshDemoDatabase } from '../support/db';
import { actAs } from '../support/act-as';

const { call } = actAs('10.8.0');
type Hit = { id: string; kind: string; url: string; hidden: boolean };
const find = async (q: string, who: string | null = null, extra = '') => {
  const res = await call(searchGET, 'GET', `/api/search?q=${encodeURIComponent(q)}${extra}`, who);
  expect(res.status).toBe(200);
  return res.body.items as Hit[];
};
const ids = async (q: string, who: string | null = null, extra = '') => (await find(q, who, extra)).map((h) => h.id);
const moderate = (body: Record<string, unknown>) =>
  call(actionPOST, 'POST', '/api/review/actions', 'moss_moderator', body);

describe('search follows every write (real MariaDB, in-process engine)', () => {
  let qid: number;
  let aid: number;
  let rid: number;
  beforeAll(async () => {
    await freshDemoDatabase();
    await rebuildIndex();
  });

  it('finds the demo’s guides and threads for a builder’s question', async () => {
    expect(searchEngine().name).toBe('flexsearch');
    const hits = await find('Has anyone had a 1-inch pump stop when the creek drops?');
    expect(hits.length).toBeGreaterThan(0);
    expect(hits.some((h) => h.kind === 'guide')).toBe(true);
    expect(hits.some((h) => h.kind === 'question' || h.kind === 'answer')).toBe(true);
  });

  it('a new question is found at once, by its words, its site sheet and its tag', async () => {
    const res = await call(askPOST, 'POST', '/api/questions', 'ferncombe_tamsin', {
      title: 'Quernstone ram gulps air at the intake',
      body: 'The intake is a bucket in a shallow pool and it whistles every few beats.',
      tags: ['drive-pipe'],
      siteSheet: {
        fall: '5 ft',
        lift: '40 ft',
        driveLength: '30 ft',
        driveSize: '1-1/4',
        driveMaterial: 'pvc-sch40',
        pumpSize: '1-1/4',
        pumps: '1',
      },
    });
    expect(res.status).toBe(201);
    qid = res.body.id;
    expect(await ids('quernstone')).toContain(`question-${qid}`);
    // the site sheet's 1-1/4 inch drive pipe, asked for in millimetres (DN 32: ISO 6708:1995)
    expect(await ids('quernstone 32 mm drive line')).toContain(`question-${qid}`);
    expect(await ids('quernstone', null, '&tag=drive-pipe&kind=question&solved=false')).toEqual([`question-${qid}`]);
    expect(await ids('quernstone', null, '&tag=frost')).toEqual([]);
  });

  it('an edit replaces the old words', async () => {
    const res = await call(
      questionPUT,
      'PUT',
      `/api/questions/${qid}`,
      'ferncombe_tamsin',
      {
        title: 'Millrace ram gulps air at the intake',
        body: 'The intake is a bucket in a shallow pool and it whistles every few beats.',
        tags: ['drive-pipe'],
      },
      { id: String(qid) },
    );
    expect(res.status).toBe(200);
    expect(await ids('quernstone')).toEqual([]);
    expect(await ids('millrace')).toContain(`question-${qid}`);
  });

  it('answers, replies and their edits are found, linked to their place in the thread', async () => {
    const a = await call(
      answerPOST,
      'POST',
      `/api/questions/${qid}/answers`,
      'ironwheel_builds',
      { body: 'Sink the intake deeper: a vortex at a shallow intake draws air into the drive pipe. Use a tee screen.' },
      { id: String(qid) },
    );
    expect(a.status).toBe(201);
    aid = a.body.id;
    const hit = (await find('vortex tee screen')).find((h) => h.id === `answer-${aid}`);
    expect(hit?.url).toBe(`/questions/${qid}#answer-${aid}`);
    const r = await call(
      replyPOST,
      'POST',
      `/api/questions/${qid}/replies`,
      'ferncombe_tamsin',
      { body: 'A flat slate over the intake stopped the whirlpool.', answerId: aid },
      { id: String(qid) },
    );
    expect(r.status).toBe(201);
    rid = r.body.id;
    expect(await ids('whirlpool slate')).toContain(`reply-${rid}`);
    const e = await call(
      answerPUT,
      'PUT',
      `/api/answers/${aid}`,
      'ironwheel_builds',
      { body: 'Sink the intake deeper and fit a baffle board so no eddy forms.' },
      { id: String(aid) },
    );
    expect(e.status).toBe(200);
    expect(await ids('vortex tee screen')).not.toContain(`answer-${aid}`);
    expect(await ids('baffle board eddy')).toContain(`answer-${aid}`);
  });

  it('a hidden answer disappears for members and stays for moderators; restore brings it back', async () => {
    expect(
      (await moderate({ action: 'hide', postType: 'answer', postId: aid, reason: 'checking search' })).status,
    ).toBe(200);
    expect(await ids('baffle board eddy')).not.toContain(`answer-${aid}`);
    expect(await ids('baffle board eddy', 'highcrag_shepherd')).not.toContain(`answer-${aid}`);
    const forModerator = (await find('baffle board eddy', 'moss_moderator')).find((h) => h.id === `answer-${aid}`);
    expect(forModerator?.hidden).toBe(true);
    expect((await moderate({ action: 'restore', postType: 'answer', postId: aid, reason: 'back' })).status).toBe(200);
    expect(await ids('baffle board eddy')).toContain(`answer-${aid}`);
  });

  it('an answer hidden by flags (an expert’s unsafe flag) leaves members’ results at once', async () => {
    const res = await call(flagPOST, 'POST', '/api/flags', 'quarry_lane_valves', {
      postType: 'answer',
      postId: aid,
      reason: 'unsafe',
      note: 'checking search',
    });
    expect(res.status).toBe(201);
    expect(res.body.hidden).toBe(true);
    expect(await ids('baffle board eddy')).not.toContain(`answer-${aid}`);
    expect(await ids('baffle board eddy', 'moss_moderator')).toContain(`answer-${aid}`);
  });

  it('a deleted question takes its answers and replies out of everyone’s results but moderators’', async () => {
    expect(
      (await moderate({ action: 'delete', postType: 'question', postId: qid, reason: 'checking search' })).status,
    ).toBe(200);
    for (const [q, id] of [
      ['millrace', `question-${qid}`],
      ['baffle board eddy', `answer-${aid}`],
      ['whirlpool slate', `reply-${rid}`],
    ]) {
      expect(await ids(q)).not.toContain(id);
      expect(await ids(q, 'ferncombe_tamsin')).not.toContain(id);
      expect(await ids(q, 'moss_moderator')).toContain(id);
    }
  });

  it('field log entries are found by site, pumps and notes; a hidden one only by moderators', async () => {
    const demo = await find('Ferncombe lower meadow', null, '&kind=field-log');
    expect(demo.length).toBeGreaterThan(0);
    expect(demo[0].url).toMatch(/^\/field-log\/\d+$/);
    const res = await call(fieldLogPOST, 'POST', '/api/field-log', 'sorrel_cabin', {
      siteName: 'Tolvaddon sluice trial',
      testedOn: '2026-05-14',
      pumpSize: '1/2',
      fall: '4 ft',
      lift: '29 ft',
      driveLength: '30 ft',
      driveSize: '1/2',
      driveMaterial: 'pvc',
      deliveryLength: '200 ft',
      deliverySize: '1/2',
      deliveryMaterial: 'hdpe',
      driveFlow: '2 gal/min',
      driveFlowMethod: 'measured',
      driveFlowHow: 'a bucket for a minute',
      trials: [
        { volume: '0.49 L', seconds: 60 },
        { volume: '0.5 L', seconds: 60 },
      ],
      bpm: 60,
      notes: 'Eelgrass fouled the strainer twice.',
    });
    expect(res.status).toBe(201);
    const id = `field-log-${res.body.id}`;
    expect(await ids('tolvaddon')).toContain(id);
    expect(await ids('eelgrass strainer', null, '&kind=field-log')).toEqual([id]);
    expect(
      (await moderate({ action: 'hide', postType: 'field-log', postId: res.body.id, reason: 'checking search' }))
        .status,
    ).toBe(200);
    expect(await ids('tolvaddon')).not.toContain(id);
    expect(await ids('tolvaddon', 'sorrel_cabin')).not.toContain(id);
    expect(await ids('tolvaddon', 'moss_moderator')).toContain(id);
  });

  it('the ask form’s similar questions come from search: other words for the part, heights in other units', async () => {
    // 1.2 m = 3.94 ft, the demo thread's 4 ft of fall (1 ft = 0.3048 m exactly)
    const res = await call(
      similarGET,
      'GET',
      `/api/questions/similar?${new URLSearchParams({ title: 'How heavy should the impulse valve be', tags: 'tuning', fall: '1.2 m' })}`,
      null,
    );
    expect(res.status).toBe(200);
    expect(res.body.items[0]).toMatchObject({ title: 'What weight on the waste valve for 4 ft of fall?' });
    const tooLong = await call(similarGET, 'GET', `/api/questions/similar?title=${'x'.repeat(161)}`, null);
    expect(tooLong.status).toBe(400);
    expect(tooLong.body.error.field).toBe('title');
  });

  it('validates its parameters, naming the field', async () => {
    const bad = async (query: string, field: string) => {
      const res = await call(searchGET, 'GET', `/api/search?${query}`, null);
      expect(res.status, query).toBe(400);
      expect(res.body.error.field, query).toBe(field);
    };
    await bad('q=pump&kind=forum', 'kind.0');
    await bad('q=pump&limit=0', 'limit');
    await bad('q=pump&limit=500', 'limit');
    await bad('q=pump&offset=-1', 'offset');
    await bad('q=pump&solved=maybe', 'solved');
    await bad('q=pump&level=expert', 'level');
    await bad('q=pump&tag=Not%20A%20Tag', 'tag');
    await bad(`q=${'x'.repeat(201)}`, 'q');
    const ok = await call(searchGET, 'GET', '/api/search?q=waste%20valve&kind=guide,question&limit=3', null);
    expect(ok.status).toBe(200);
    expect(ok.body.items.length).toBeLessThanOrEqual(3);
    expect(ok.body.items.every((h: Hit) => h.kind === 'guide' || h.kind === 'question')).toBe(true);
    expect((await call(searchGET, 'GET', '/api/search?q=', null)).body).toMatchObject({ items: [], total: 0 });
  });
});
