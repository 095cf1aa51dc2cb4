import { beforeAll, describe, expect, it } from 'vitest';
import { POST as askPOST } from '@/app/api/questions/route';
import { PUT as questionPUT } from '@/app/api/questions/[id]/route';
import { POST as answerPOST } from '@/app/api/questions/[id]/answers/route';
import { POST as replyPOST } from '@/app/api/questions/[id]/replies/route';
import { PUT as answerPUT } from '@/app/api/answers/[id]/route';
import { PUT as replyPUT } from '@/app/api/replies/[id]/route';
import { PUT as settingsPUT } from '@/app/api/account/settings/route';
import { POST as signUpPOST } from '@/app/api/account/sign-up/route';
import { initModels } from '@/models';
import { freshDemoDatabase } from '../support/db';
import { actAs } from '../support/act-as';

const { call } = actAs('10.72');
const { User, Question, Answer, Reply, Revision } = initModels();
const p = (id: number) => ({ id: String(id) });

const NEWCOMER = 'brookside_newcomer';
const links = (n: number) => Array.from({ length: n }, (_, i) => `https://spares-${i}.example/valves`).join(' and ');
const question = { title: 'Link check: which waste valve rubber lasts longest', tags: ['tuning'] };

describe('the new-member link limit and the length rules hold for edits as for new posts (issue 17, item 11)', () => {
  let qid: number;
  let aid: number;
  let rid: number;
  let oldAnswer: number;
  beforeAll(async () => {
    await freshDemoDatabase();
    // joined today: a new member (lib/accounts/new-member NEW_MEMBER_DAYS)
    await User.create({
      handle: NEWCOMER,
      displayName: 'Brookside Newcomer',
      email: 'newcomer@brookside.example',
      emailVerifiedAt: new Date(),
      region: null,
      bio: null,
    });
    const q = await call(askPOST, 'POST', '/api/questions', NEWCOMER, {
      ...question,
      body: `Two shops sell them: ${links(2)}.`,
    });
    expect(q.status).toBe(201);
    qid = q.body.id;
    const a = await call(
      answerPOST,
      'POST',
      `/api/questions/${qid}/answers`,
      NEWCOMER,
      { body: `Answering my own: ${links(2)} both stock them.` },
      p(qid),
    );
    expect(a.status).toBe(201);
    aid = a.body.id;
    const r = await call(
      replyPOST,
      'POST',
      `/api/questions/${qid}/replies`,
      NEWCOMER,
      { body: `See ${links(1)}`, answerId: aid },
      p(qid),
    );
    expect(r.status).toBe(201);
    rid = r.body.id;
    const old = await call(
      answerPOST,
      'POST',
      `/api/questions/${qid}/answers`,
      'ironwheel_builds',
      { body: 'Nitrile rubber outlasts leather in cold water.' },
      p(qid),
    );
    oldAnswer = old.body.id;
  });

  it('a new member cannot edit more links into a question, an answer or a reply than a new post may hold', async () => {
    const revisions = await Revision.count();
    const edits = [
      await call(
        questionPUT,
        'PUT',
        `/api/questions/${qid}`,
        NEWCOMER,
        { ...question, body: `Many shops: ${links(20)}.` },
        p(qid),
      ),
      await call(answerPUT, 'PUT', `/api/answers/${aid}`, NEWCOMER, { body: `Many shops: ${links(20)}.` }, p(aid)),
      await call(replyPUT, 'PUT', `/api/replies/${rid}`, NEWCOMER, { body: `See ${links(3)}` }, p(rid)),
    ];
    for (const res of edits) {
      expect(res.status).toBe(422);
      expect(res.body.error.field).toBe('body');
    }
    expect(await Revision.count()).toBe(revisions);
    expect((await Answer.findByPk(aid))!.body).not.toContain('spares-19');
  });

  it('links in capitals, bare www. addresses and protocol-relative targets count as links', async () => {
    const disguised =
      'Try HTTPS://SPARES-A.EXAMPLE/V, www.spares-b.example/valves and [the third](//spares-c.example/v) for rubbers.';
    const res = await call(answerPOST, 'POST', `/api/questions/${qid}/answers`, NEWCOMER, { body: disguised }, p(qid));
    expect(res.status).toBe(422);
    expect(res.body.error.field).toBe('body');
    expect((await call(answerPUT, 'PUT', `/api/answers/${aid}`, NEWCOMER, { body: disguised }, p(aid))).status).toBe(
      422,
    );
  });

  it('an established member is not limited, when posting or editing', async () => {
    expect(
      (
        await call(
          answerPUT,
          'PUT',
          `/api/answers/${oldAnswer}`,
          'ironwheel_builds',
          { body: `Suppliers I have used: ${links(20)}.` },
          p(oldAnswer),
        )
      ).status,
    ).toBe(200);
  });

  it('an edit is held to the same length as the post: an answer stays at least 20 characters, a reply at most 5,000', async () => {
    const short = await call(
      answerPUT,
      'PUT',
      `/api/answers/${oldAnswer}`,
      'ironwheel_builds',
      { body: 'ok' },
      p(oldAnswer),
    );
    expect(short.status).toBe(400);
    expect(short.body.error.field).toBe('body');
    // 20 is the answer form's minimum (lib/validation/question.ts answerSchema): common practice, no source
    expect(short.body.error.message).toMatch(/at least 20 characters/);
    const long = await call(replyPUT, 'PUT', `/api/replies/${rid}`, NEWCOMER, { body: 'r'.repeat(5_001) }, p(rid));
    expect(long.status).toBe(400);
    expect(long.body.error.field).toBe('body');
    expect((await Answer.findByPk(oldAnswer))!.body).toContain('Suppliers I have used');
    expect((await Reply.findByPk(rid))!.body.length).toBeLessThan(5_001);
  });

  it('edits within the rules still save', async () => {
    expect(
      (
        await call(
          answerPUT,
          'PUT',
          `/api/answers/${aid}`,
          NEWCOMER,
          { body: `Answering my own: only ${links(1)} has them now.` },
          p(aid),
        )
      ).status,
    ).toBe(200);
    expect((await call(replyPUT, 'PUT', `/api/replies/${rid}`, NEWCOMER, { body: 'ok' }, p(rid))).status).toBe(200);
  });
});

describe('a locked thread takes no edits, from its authors or anyone (issue 17, item 18)', () => {
  let qid: number;
  let aid: number;
  let modAnswer: number;
  let rid: number;
  const body = 'The drive pipe is 30 ft of galvanised steel on a 5 ft fall.';
  beforeAll(async () => {
    await freshDemoDatabase();
    qid = (
      await call(askPOST, 'POST', '/api/questions', 'ferncombe_tamsin', {
        title: 'Lock check: a thread that got heated',
        body,
        tags: ['stall'],
      })
    ).body.id;
    aid = (
      await call(
        answerPOST,
        'POST',
        `/api/questions/${qid}/answers`,
        'ironwheel_builds',
        { body: 'Calm down and measure the beat rate first.' },
        p(qid),
      )
    ).body.id;
    modAnswer = (
      await call(
        answerPOST,
        'POST',
        `/api/questions/${qid}/answers`,
        'moss_moderator',
        { body: 'Keep it civil, please; this thread is locked.' },
        p(qid),
      )
    ).body.id;
    rid = (
      await call(
        replyPOST,
        'POST',
        `/api/questions/${qid}/replies`,
        'highcrag_shepherd',
        { body: 'Mine beat 50 a minute.', answerId: aid },
        p(qid),
      )
    ).body.id;
    await Question.update({ lockedAt: new Date() }, { where: { id: qid } });
  });

  it('the asker, an answer’s and a reply’s authors, and a moderator on their own answer are refused (409)', async () => {
    const revisions = await Revision.count();
    const tries = [
      await call(
        questionPUT,
        'PUT',
        `/api/questions/${qid}`,
        'ferncombe_tamsin',
        { title: 'Lock check: a thread that got heated', body: `${body} Edited after the lock.`, tags: ['stall'] },
        p(qid),
      ),
      await call(
        answerPUT,
        'PUT',
        `/api/answers/${aid}`,
        'ironwheel_builds',
        { body: 'Edited after the lock, to say something else.' },
        p(aid),
      ),
      await call(
        replyPUT,
        'PUT',
        `/api/replies/${rid}`,
        'highcrag_shepherd',
        { body: 'Edited after the lock.' },
        p(rid),
      ),
      await call(
        answerPUT,
        'PUT',
        `/api/answers/${modAnswer}`,
        'moss_moderator',
        { body: 'A moderator editing inside a locked thread.' },
        p(modAnswer),
      ),
    ];
    for (const res of tries) {
      expect(res.status).toBe(409);
      expect(res.body.error.message).toMatch(/locked/);
    }
    expect(await Revision.count()).toBe(revisions);
    expect((await Question.findByPk(qid))!.body).toBe(body);
  });

  it('someone else’s post is still theirs alone (403), locked or not', async () => {
    expect(
      (
        await call(
          answerPUT,
          'PUT',
          `/api/answers/${aid}`,
          'quarry_lane_valves',
          { body: 'Not my answer to change at all.' },
          p(aid),
        )
      ).status,
    ).toBe(403);
  });

  it('once unlocked, the authors can edit again', async () => {
    await Question.update({ lockedAt: null }, { where: { id: qid } });
    expect(
      (
        await call(
          answerPUT,
          'PUT',
          `/api/answers/${aid}`,
          'ironwheel_builds',
          { body: 'Measure the beat rate first, then the drive flow.' },
          p(aid),
        )
      ).status,
    ).toBe(200);
  });
});

describe('display names show something and claim no role their holder lacks (issue 17, item 18)', () => {
  beforeAll(freshDemoDatabase);
  const borrowed = [
    'Moss (moderator)',
    'admin',
    'Expert Ram Builder',
    'ａｄｍｉｎ',
    'Аdmin',
    'm0derator Moss',
    'M o d',
    'Mo\u200Bderator',
    'Clackwater staff',
  ];
  const invisible = ['\u200B\u200B\u200B', '\u200B\u200C\u200D\u2060\uFEFF', '\u3164\u3164', ' \u00AD\u00AD '];

  it('sign-up refuses them with a 400 naming displayName, and creates no account', async () => {
    const users = await User.count();
    for (const [i, displayName] of [...borrowed, ...invisible].entries()) {
      const res = await call(signUpPOST, 'POST', '/api/account/sign-up', null, {
        email: `wren${i}@linnetmill.example`,
        password: 'kettle moss heron ladder',
        handle: `linnet_wren_${i}`,
        displayName,
      });
      expect(res.status, JSON.stringify(displayName)).toBe(400);
      expect(res.body.error.field).toBe('displayName');
    }
    expect(await User.count()).toBe(users);
  });

  it('settings refuse them for a member, and the name stays as it was', async () => {
    for (const displayName of [...borrowed, ...invisible]) {
      const res = await call(settingsPUT, 'PUT', '/api/account/settings', 'highcrag_shepherd', {
        displayName,
        region: '',
        bio: '',
        units: 'US',
      });
      expect(res.status, JSON.stringify(displayName)).toBe(400);
      expect(res.body.error.field).toBe('displayName');
    }
    expect((await User.findOne({ where: { handle: 'highcrag_shepherd' } }))!.displayName).toBe('Highcrag Shepherd');
  });

  it('a role word is allowed to the account that holds that role; ordinary names pass, invisible characters dropped', async () => {
    const ok = async (who: string, displayName: string) => {
      const res = await call(settingsPUT, 'PUT', '/api/account/settings', who, {
        displayName,
        region: '',
        bio: '',
        units: 'US',
      });
      expect(res.status, `${who}: ${displayName}`).toBe(200);
      return res.body.displayName;
    };
    expect(await ok('moss_moderator', 'Moss (moderator)')).toBe('Moss (moderator)');
    expect(await ok('clack_admin', 'Clackwater admin')).toBe('Clackwater admin');
    expect(await ok('ironwheel_builds', 'Ironwheel Builds, expert')).toBe('Ironwheel Builds, expert');
    expect(await ok('highcrag_shepherd', 'Badminton Brook')).toBe('Badminton Brook');
    expect(await ok('sorrel_cabin', 'Sorrel\u200B Creek Cabin')).toBe('Sorrel Creek Cabin');
    const res = await call(signUpPOST, 'POST', '/api/account/sign-up', null, {
      email: 'wren@linnetmill.example',
      password: 'kettle moss heron ladder',
      handle: 'linnet_mill_wren',
      displayName: 'Wren at Linnet Mill',
    });
    expect(res.status).toBe(202);
  });
});
