import { mkdtempSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import sharp from 'sharp';
import { Op } from 'sequelize';
import { POST as askPOST } from '@/app/api/questions/route';
import { GET as threadGET, PUT as questionPUT } from '@/app/api/questions/[id]/route';
import { POST as answerPOST } from '@/app/api/questions/[id]/answers/route';
import { POST as replyPOST } from '@/app/api/questions/[id]/replies/route';
import { PUT as fixedPUT } from '@/app/api/questions/[id]/fixed/route';
import { POST as followPOST, DELETE as followDELETE } from '@/app/api/questions/[id]/follow/route';
import { GET as revisionsGET } from '@/app/api/questions/[id]/revisions/route';
import { PUT as answerPUT } from '@/app/api/answers/[id]/route';
import { PUT as replyPUT } from '@/app/api/replies/[id]/route';
import { POST as helpfulPOST, DELETE as helpfulDELETE } from '@/app/api/helpful/route';
import { GET as photoGET } from '@/app/api/photos/[id]/route';
import { GET as thumbGET } from '@/app/api/photos/[id]/thumb/route';
import { newPhotoId, writeVariant } from '@/lib/photos/storage';
import { initModels } from '@/models';
import { freshDemoDatabase } from '../support/db';
import { actAs } from '../support/act-as';

// Photos for this file go to a directory of its own; storage reads UPLOAD_DIR on every call.
process.env.UPLOAD_DIR = mkdtempSync(path.join(os.tmpdir(), 'clackwater-visibility-'));

const { call, raw } = actAs('10.71');
const { Question, Answer, Reply, FieldLogEntry, MailMessage, QuestionFollow, HelpfulMark, Revision, Photo, User } =
  initModels();
const p = (id: number) => ({ id: String(id) });
const userId = async (handle: string) => (await User.findOne({ where: { handle } }))!.id;

const ASKER = 'ferncombe_tamsin';
const EXPERT = 'ironwheel_builds';
const MEMBER = 'highcrag_shepherd';
const MOD = 'moss_moderator';

async function ask(title: string) {
  const res = await call(askPOST, 'POST', '/api/questions', ASKER, {
    title,
    body: 'The waste valve beats for a minute, then stops shut; the brook is at its summer low.',
    tags: ['stall'],
  });
  expect(res.status).toBe(201);
  return res.body.id as number;
}
async function answer(qid: number, who = EXPERT) {
  const res = await call(
    answerPOST,
    'POST',
    `/api/questions/${qid}/answers`,
    who,
    { body: 'Lengthen the drive pipe and check the waste valve spring weight first.' },
    p(qid),
  );
  expect(res.status).toBe(201);
  return res.body.id as number;
}
async function reply(qid: number, answerId: number, who = MEMBER) {
  const res = await call(
    replyPOST,
    'POST',
    `/api/questions/${qid}/replies`,
    who,
    { body: 'Same here with a 1 inch pump.', answerId },
    p(qid),
  );
  expect(res.status).toBe(201);
  return res.body.id as number;
}
const hide = { hiddenAt: new Date(), hiddenReason: 'test: hidden by a moderator' };

/** A stored photo (both copies) attached to a post, as an upload would leave it. */
async function photoOn(target: { questionId?: number; answerId?: number; fieldLogEntryId?: number }) {
  const publicId = newPhotoId();
  const web = await sharp({ create: { width: 64, height: 48, channels: 3, background: '#5f7a3a' } })
    .webp()
    .toBuffer();
  await writeVariant(publicId, 'web', web);
  await writeVariant(publicId, 'thumb', web);
  await Photo.create({
    publicId,
    ownerId: await userId(ASKER),
    questionId: target.questionId ?? null,
    answerId: target.answerId ?? null,
    fieldLogEntryId: target.fieldLogEntryId ?? null,
    mime: 'image/webp',
    width: 64,
    height: 48,
    bytes: web.length,
    alt: 'the pump on its sill',
  });
  return publicId;
}

describe('revision history follows the visibility of its post and its thread (issue 17, item 1)', () => {
  let open: number;
  let openAnswer: number;
  let openReply: number;
  let hiddenQ: number;
  let answerInHiddenQ: number;
  let hiddenAnswer: number;
  let deletedReply: number;
  beforeAll(async () => {
    await freshDemoDatabase();
    open = await ask('Revisions check: an open thread with an edit');
    openAnswer = await answer(open);
    openReply = await reply(open, openAnswer);
    hiddenAnswer = await answer(open, 'quarry_lane_valves');
    deletedReply = await reply(open, openAnswer, 'sorrel_cabin');
    hiddenQ = await ask('Revisions check: a thread a moderator hid');
    answerInHiddenQ = await answer(hiddenQ);
    expect(
      (
        await call(
          questionPUT,
          'PUT',
          `/api/questions/${hiddenQ}`,
          ASKER,
          {
            title: 'Revisions check: a thread a moderator hid',
            body: 'Edited: the second version of the words nobody may read now.',
            tags: ['stall'],
          },
          p(hiddenQ),
        )
      ).status,
    ).toBe(200);
    await Question.update(hide, { where: { id: hiddenQ } });
    await Answer.update(hide, { where: { id: hiddenAnswer } });
    await Reply.update({ deletedAt: new Date() }, { where: { id: deletedReply } });
  });

  const revisions = (qid: number, who: string | null, query = '') =>
    call(revisionsGET, 'GET', `/api/questions/${qid}/revisions${query}`, who, undefined, p(qid));

  it('a hidden question’s history is not found for the anonymous, members and its own asker, as the thread is', async () => {
    for (const who of [null, MEMBER, ASKER]) {
      const res = await revisions(hiddenQ, who);
      expect(res.status, `as ${who ?? 'anonymous'}`).toBe(404);
      expect(JSON.stringify(res.body)).not.toContain('nobody may read');
      expect((await call(threadGET, 'GET', `/api/questions/${hiddenQ}`, who, undefined, p(hiddenQ))).status).toBe(404);
    }
    const asAnswer = await revisions(hiddenQ, null, `?postType=answer&postId=${answerInHiddenQ}`);
    expect(asAnswer.status).toBe(404);
  });

  it('moderators read it, as they read the hidden thread', async () => {
    const res = await revisions(hiddenQ, MOD);
    expect(res.status).toBe(200);
    expect(res.body.revisions).toHaveLength(2);
    expect(res.body.revisions[1].body).toContain('nobody may read');
    expect((await revisions(hiddenQ, 'clack_admin', `?postType=answer&postId=${answerInHiddenQ}`)).status).toBe(200);
    // a moderator's view of hidden words is never for a shared cache
    for (const [handler, url] of [
      [revisionsGET, `/api/questions/${hiddenQ}/revisions`],
      [threadGET, `/api/questions/${hiddenQ}`],
    ] as const) {
      const res = await raw(handler, 'GET', url, MOD, undefined, p(hiddenQ));
      expect(res.status).toBe(200);
      expect(res.headers.get('cache-control')).toBe('private, no-store');
    }
  });

  it('hidden answers and deleted replies in an open thread: not found but for moderators and a hidden answer’s author', async () => {
    for (const who of [null, MEMBER, 'quarry_lane_valves']) {
      // issue 21: the author reads their own hidden answer (never a deleted post, never another's)
      const expected = who === 'quarry_lane_valves' ? 200 : 404;
      expect((await revisions(open, who, `?postType=answer&postId=${hiddenAnswer}`)).status, `as ${who}`).toBe(
        expected,
      );
      expect((await revisions(open, who, `?postType=reply&postId=${deletedReply}`)).status).toBe(404);
    }
    expect((await revisions(open, MOD, `?postType=answer&postId=${hiddenAnswer}`)).status).toBe(200);
    expect((await revisions(open, MOD, `?postType=reply&postId=${deletedReply}`)).status).toBe(200);
  });

  it('an answer or reply is looked up only in the thread named in the path', async () => {
    const other = (await Question.findOne({ where: { id: { [Op.ne]: open } }, order: [['id', 'ASC']] }))!.id;
    expect(other).not.toBe(open);
    for (const who of [null, MOD]) {
      expect((await revisions(other, who, `?postType=answer&postId=${openAnswer}`)).status).toBe(404);
      expect((await revisions(other, who, `?postType=reply&postId=${openReply}`)).status).toBe(404);
    }
    expect((await revisions(open, null, '?postType=answer&postId=99999999')).status).toBe(404);
  });

  it('open posts keep their history for everyone', async () => {
    const q = await revisions(open, null);
    expect(q.status).toBe(200);
    expect(q.body.revisions).toHaveLength(1);
    expect((await revisions(open, null, `?postType=answer&postId=${openAnswer}`)).body.revisions).toHaveLength(1);
    expect((await revisions(open, MEMBER, `?postType=reply&postId=${openReply}`)).body.revisions).toHaveLength(1);
  });
});

describe('hidden and deleted posts take no answers, replies, marks, follows or fixed-it choices, and send no mail (issue 17, item 3)', () => {
  let hiddenQ: number;
  let answerInHiddenQ: number;
  let open: number;
  let hiddenAnswer: number;
  let deletedAnswer: number;
  let hiddenReply: number;
  let visibleAnswer: number;
  let outboxBefore: number;
  beforeAll(async () => {
    await freshDemoDatabase();
    hiddenQ = await ask('Writes check: a thread a moderator hid');
    answerInHiddenQ = await answer(hiddenQ);
    open = await ask('Writes check: an open thread with hidden posts');
    visibleAnswer = await answer(open);
    hiddenAnswer = await answer(open, 'quarry_lane_valves');
    deletedAnswer = await answer(open, 'sorrel_cabin');
    hiddenReply = await reply(open, visibleAnswer);
    // a mark made before the post was hidden, to take back afterwards
    expect(
      (await call(helpfulPOST, 'POST', '/api/helpful', MEMBER, { postType: 'answer', postId: hiddenAnswer })).status,
    ).toBe(201);
    await Question.update(hide, { where: { id: hiddenQ } });
    await Answer.update(hide, { where: { id: hiddenAnswer } });
    await Answer.update({ deletedAt: new Date() }, { where: { id: deletedAnswer } });
    await Reply.update(hide, { where: { id: hiddenReply } });
    outboxBefore = await MailMessage.count();
  });

  it('an answer or a reply to a hidden question is not found, for a member and for its own asker', async () => {
    const answers = await Answer.count();
    const replies = await Reply.count();
    for (const who of [MEMBER, EXPERT, ASKER]) {
      const a = await call(
        answerPOST,
        'POST',
        `/api/questions/${hiddenQ}/answers`,
        who,
        { body: 'An answer nobody can read, to a question nobody can read.' },
        p(hiddenQ),
      );
      expect(a.status, `answer as ${who}`).toBe(404);
      const r = await call(
        replyPOST,
        'POST',
        `/api/questions/${hiddenQ}/replies`,
        who,
        { body: 'A reply to a hidden question.' },
        p(hiddenQ),
      );
      expect(r.status, `reply as ${who}`).toBe(404);
      const under = await call(
        replyPOST,
        'POST',
        `/api/questions/${hiddenQ}/replies`,
        who,
        { body: 'A reply under an answer in a hidden thread.', answerId: answerInHiddenQ },
        p(hiddenQ),
      );
      expect(under.status).toBe(404);
    }
    expect(await Answer.count()).toBe(answers);
    expect(await Reply.count()).toBe(replies);
    expect((await Question.findByPk(hiddenQ))!.answerCount).toBe(1);
  });

  it('a moderator, who can see it, is told to restore it first (409), and nothing is saved', async () => {
    const a = await call(
      answerPOST,
      'POST',
      `/api/questions/${hiddenQ}/answers`,
      MOD,
      { body: 'A moderator answering in a hidden thread.' },
      p(hiddenQ),
    );
    expect(a.status).toBe(409);
    expect(a.body.error.message).toMatch(/hidden or deleted/);
    expect(
      (await call(helpfulPOST, 'POST', '/api/helpful', MOD, { postType: 'question', postId: hiddenQ })).status,
    ).toBe(409);
    expect(
      (await call(followPOST, 'POST', `/api/questions/${hiddenQ}/follow`, MOD, undefined, p(hiddenQ))).status,
    ).toBe(409);
    expect(await Answer.count({ where: { questionId: hiddenQ } })).toBe(1);
  });

  it('a reply under a hidden or deleted answer, or to a hidden reply, is refused as if it were not there', async () => {
    const replies = await Reply.count();
    for (const [answerId, replyToId] of [
      [hiddenAnswer, undefined],
      [deletedAnswer, undefined],
      [undefined, hiddenReply],
    ]) {
      const r = await call(
        replyPOST,
        'POST',
        `/api/questions/${open}/replies`,
        MEMBER,
        { body: 'Replying to something hidden.', answerId, replyToId },
        p(open),
      );
      expect(r.status).toBe(422);
      expect(r.body.error.field).toBe(answerId ? 'answerId' : 'replyToId');
    }
    expect(await Reply.count()).toBe(replies);
  });

  it('helpful marks on hidden posts, or on any post of a hidden thread, are not found, either way', async () => {
    const marks = await HelpfulMark.count();
    const targets: [string, number][] = [
      ['question', hiddenQ],
      ['answer', answerInHiddenQ],
      ['answer', hiddenAnswer],
      ['answer', deletedAnswer],
      ['reply', hiddenReply],
    ];
    for (const [postType, postId] of targets) {
      const res = await call(helpfulPOST, 'POST', '/api/helpful', 'sorrel_cabin', { postType, postId });
      expect(res.status, `${postType} ${postId}`).toBe(404);
    }
    const back = await call(helpfulDELETE, 'DELETE', '/api/helpful', MEMBER, {
      postType: 'answer',
      postId: hiddenAnswer,
    });
    expect(back.status).toBe(404);
    expect(await HelpfulMark.count()).toBe(marks);
    expect((await Answer.findByPk(hiddenAnswer))!.helpfulCount).toBe(1);
  });

  it('a hidden question cannot be followed', async () => {
    const res = await call(followPOST, 'POST', `/api/questions/${hiddenQ}/follow`, MEMBER, undefined, p(hiddenQ));
    expect(res.status).toBe(404);
    expect(await QuestionFollow.count({ where: { questionId: hiddenQ, userId: await userId(MEMBER) } })).toBe(0);
    expect(
      (await call(followDELETE, 'DELETE', `/api/questions/${hiddenQ}/follow`, MEMBER, undefined, p(hiddenQ))).status,
    ).toBe(404);
  });

  it('fixed it: not on a hidden question, and never a hidden or deleted answer', async () => {
    const LINE = 'Cleared the drive pipe intake screen';
    expect(
      (
        await call(
          fixedPUT,
          'PUT',
          `/api/questions/${hiddenQ}/fixed`,
          ASKER,
          { answerId: answerInHiddenQ, whatFixedIt: LINE },
          p(hiddenQ),
        )
      ).status,
    ).toBe(404);
    for (const answerId of [hiddenAnswer, deletedAnswer]) {
      const res = await call(
        fixedPUT,
        'PUT',
        `/api/questions/${open}/fixed`,
        ASKER,
        { answerId, whatFixedIt: LINE },
        p(open),
      );
      expect(res.status).toBe(422);
      expect(res.body.error.field).toBe('answerId');
    }
    expect((await Question.findByPk(hiddenQ))!.fixedAnswerId).toBeNull();
    expect((await Question.findByPk(open))!.fixedAnswerId).toBeNull();
  });

  it('their authors cannot edit hidden posts they can no longer see', async () => {
    const revisions = await Revision.count();
    expect(
      (
        await call(
          answerPUT,
          'PUT',
          `/api/answers/${hiddenAnswer}`,
          'quarry_lane_valves',
          { body: 'Quietly rewriting a hidden answer after the fact.' },
          p(hiddenAnswer),
        )
      ).status,
    ).toBe(404);
    expect(
      (
        await call(
          answerPUT,
          'PUT',
          `/api/answers/${answerInHiddenQ}`,
          EXPERT,
          { body: 'Rewriting an answer in a hidden thread after the fact.' },
          p(answerInHiddenQ),
        )
      ).status,
    ).toBe(404);
    expect(
      (
        await call(
          replyPUT,
          'PUT',
          `/api/replies/${hiddenReply}`,
          MEMBER,
          { body: 'Rewriting a hidden reply.' },
          p(hiddenReply),
        )
      ).status,
    ).toBe(404);
    expect(
      (
        await call(
          questionPUT,
          'PUT',
          `/api/questions/${hiddenQ}`,
          ASKER,
          {
            title: 'Writes check: a thread a moderator hid',
            body: 'Rewriting the hidden question after the fact.',
            tags: ['stall'],
          },
          p(hiddenQ),
        )
      ).status,
    ).toBe(404);
    expect(await Revision.count()).toBe(revisions);
  });

  it('not one message was queued for any of the refused writes', async () => {
    expect(await MailMessage.count()).toBe(outboxBefore);
  });

  it('open posts in the same thread still take answers and replies (and their mail)', async () => {
    expect(
      (
        await call(
          replyPOST,
          'POST',
          `/api/questions/${open}/replies`,
          MEMBER,
          { body: 'Still open for replies.', answerId: visibleAnswer },
          p(open),
        )
      ).status,
    ).toBe(201);
    expect(await MailMessage.count()).toBeGreaterThan(outboxBefore);
  });
});

describe('a photo on a hidden post is served only to moderators, and never to a shared cache (issue 17, item 17)', () => {
  const taken: Record<string, string> = {};
  let openPhoto: string;
  beforeAll(async () => {
    await freshDemoDatabase();
    const hiddenQ = await ask('Photos check: a thread a moderator hid');
    const answerInHiddenQ = await answer(hiddenQ);
    const open = await ask('Photos check: an open thread');
    const hiddenAnswer = await answer(open);
    const deletedQ = await ask('Photos check: a thread a moderator deleted');
    const entry = (await FieldLogEntry.findOne({ order: [['id', 'ASC']] }))!;
    taken['hidden question'] = await photoOn({ questionId: hiddenQ });
    taken['visible answer in a hidden thread'] = await photoOn({ questionId: hiddenQ, answerId: answerInHiddenQ });
    taken['hidden answer'] = await photoOn({ questionId: open, answerId: hiddenAnswer });
    taken['deleted question'] = await photoOn({ questionId: deletedQ });
    taken['hidden field log entry'] = await photoOn({ fieldLogEntryId: entry.id });
    openPhoto = await photoOn({ questionId: open });
    await Question.update(hide, { where: { id: hiddenQ } });
    await Question.update({ deletedAt: new Date() }, { where: { id: deletedQ } });
    await Answer.update(hide, { where: { id: hiddenAnswer } });
    await entry.update(hide);
  });

  it('is not found for the anonymous and for members, and that answer is not kept by any cache', async () => {
    for (const [what, id] of Object.entries(taken)) {
      for (const who of [null, MEMBER, ASKER]) {
        for (const [handler, url] of [
          [photoGET, `/api/photos/${id}`],
          [thumbGET, `/api/photos/${id}/thumb`],
        ] as const) {
          const res = await raw(handler, 'GET', url, who, undefined, { id });
          expect(res.status, `${what} ${url} as ${who ?? 'anonymous'}`).toBe(404);
          expect(res.headers.get('content-type')).not.toMatch(/image/);
          expect(res.headers.get('cache-control') ?? '').not.toMatch(/public/);
          expect(res.headers.get('cache-control') ?? '').toMatch(/no-store/);
        }
      }
    }
  });

  it('moderators see it, privately and uncached', async () => {
    for (const [what, id] of Object.entries(taken)) {
      const res = await raw(photoGET, 'GET', `/api/photos/${id}`, MOD, undefined, { id });
      expect(res.status, what).toBe(200);
      expect(res.headers.get('content-type')).toBe('image/webp');
      expect(res.headers.get('cache-control')).toBe('private, no-store');
    }
  });

  it('a photo on an open post is still public and cacheable', async () => {
    const res = await raw(thumbGET, 'GET', `/api/photos/${openPhoto}/thumb`, null, undefined, { id: openPhoto });
    expect(res.status).toBe(200);
    expect(res.headers.get('cache-control')).toBe('public, max-age=3600'); // an hour, as photos.test.ts: common practice, no source
  });
});
