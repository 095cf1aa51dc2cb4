import { beforeAll, describe, expect, it } from 'vitest';
import { POST as askPOST } from '@/app/api/questions/route';
import { POST as answerPOST } from '@/app/api/questions/[id]/answers/route';
import { POST as followPOST } from '@/app/api/questions/[id]/follow/route';
import { GET as threadGET } from '@/app/api/questions/[id]/route';
import { GET as revisionsGET } from '@/app/api/questions/[id]/revisions/route';
import { PUT as answerPUT } from '@/app/api/answers/[id]/route';
import { POST as flagPOST } from '@/app/api/flags/route';
import { POST as appealPOST } from '@/app/api/appeals/route';
import { POST as actionPOST } from '@/app/api/review/actions/route';
import { GET as reviewGET } from '@/app/api/review/route';
import { initModels } from '@/models';
import { freshDemoDatabase } from '../support/db';
import { actAs } from '../support/act-as';

const { call } = actAs('10.21.4');
const { MailMessage, User, Appeal, Notice } = initModels();
const userId = async (handle: string) => (await User.findOne({ where: { handle } }))!.id;
const mailsTo = async (handle: string, kind: string) =>
  MailMessage.findAll({ where: { userId: await userId(handle), kind }, order: [['id', 'ASC']] });
const MOD = 'moss_moderator';
const ASKER = 'ferncombe_tamsin';
const AUTHOR = 'quarry_lane_valves';
const FOLLOWER = 'sorrel_cabin';
const STRANGER = 'highcrag_shepherd';
const UNSAFE_TEXT = 'Weld the waste valve shut and cap the delivery pipe to build up more pressure overnight.';
const act = (body: Record<string, unknown>) => call(actionPOST, 'POST', '/api/review/actions', MOD, body);
type Item = { post: { type: string; id: number }; flags: { reason: string }[]; appeal: { text: string } | null };
const queue = async () => (await call(reviewGET, 'GET', '/api/review', MOD)).body.items as Item[];

describe('the review queue: unsafe advice first, no default action, only actions that fit (real MariaDB)', () => {
  let qid: number;
  let unsafeAnswer: number;
  let spamAnswer: number;
  beforeAll(async () => {
    await freshDemoDatabase();
    const q = await call(askPOST, 'POST', '/api/questions', ASKER, {
      title: 'Review check: the delivery line bursts at night',
      body: 'Every few nights the delivery hose splits near the pump; the tank is never full.',
      tags: ['tuning'],
    });
    qid = q.body.id;
    const answer = async (who: string, body: string) =>
      (await call(answerPOST, 'POST', `/api/questions/${qid}/answers`, who, { body }, { id: String(qid) })).body
        .id as number;
    spamAnswer = await answer('ironwheel_builds', 'Buy the deluxe hose kit from my shop, link in my profile.');
    unsafeAnswer = await answer(AUTHOR, UNSAFE_TEXT);
    expect(
      (await call(followPOST, 'POST', `/api/questions/${qid}/follow`, FOLLOWER, undefined, { id: String(qid) })).status,
    ).toBe(200);
    // the spam flag is older than the unsafe one: oldest-first alone would put it first
    const flag = (who: string, postId: number, reason: string) =>
      call(flagPOST, 'POST', '/api/flags', who, { postType: 'answer', postId, reason });
    expect((await flag(STRANGER, spamAnswer, 'spam')).status).toBe(201);
    await new Promise((r) => setTimeout(r, 1100)); // DATETIME keeps whole seconds
    expect((await flag(FOLLOWER, unsafeAnswer, 'unsafe')).status).toBe(201);
  });

  it('puts the unsafe-advice flag before an older spam flag', async () => {
    const items = await queue();
    const at = (id: number) => items.findIndex((i) => i.post.type === 'answer' && i.post.id === id);
    expect(at(unsafeAnswer)).toBeGreaterThanOrEqual(0);
    expect(at(spamAnswer)).toBeGreaterThan(at(unsafeAnswer));
    // every unsafe item comes before every other
    const firstOther = items.findIndex((i) => !i.flags.some((f) => f.reason === 'unsafe'));
    const lastUnsafe = items.findLastIndex((i) => i.flags.some((f) => f.reason === 'unsafe'));
    if (firstOther >= 0) expect(lastUnsafe).toBeLessThan(firstOther);
  });

  it('refuses an action that was not chosen, naming the field', async () => {
    const res = await act({ postType: 'answer', postId: unsafeAnswer, reason: 'No choice made.' });
    expect(res.status).toBe(400);
    expect(res.body.error.field).toBe('action');
  });

  it('refuses restoring a post readers already see, and locking an answer, naming the field', async () => {
    const res = await act({
      action: 'restore',
      postType: 'answer',
      postId: unsafeAnswer,
      reason: 'Nothing to restore.',
    });
    expect(res.status).toBe(422);
    expect(res.body.error.field).toBe('action');
    const lock = await act({
      action: 'lock',
      postType: 'answer',
      postId: unsafeAnswer,
      reason: 'Answers have no lock.',
    });
    expect(lock.status).toBe(422);
    expect(lock.body.error.field).toBe('postType');
    expect((await initModels().Answer.findByPk(unsafeAnswer))!.hiddenAt).toBeNull();
  });

  it('hiding it as unsafe sends the asker and the follower one short follow-up each, never the advice', async () => {
    const hide = () =>
      act({ action: 'hide', postType: 'answer', postId: unsafeAnswer, reason: 'Unsafe: a capped line bursts.' });
    expect((await hide()).status).toBe(200);
    // a second hide of a hidden post does not fit; restoring and hiding again sends nothing more
    expect((await hide()).status).toBe(422);
    expect(
      (await act({ action: 'restore', postType: 'answer', postId: unsafeAnswer, reason: 'Looking again.' })).status,
    ).toBe(200);
    expect((await hide()).status).toBe(200);
    for (const who of [ASKER, FOLLOWER]) {
      const mails = await mailsTo(who, 'withdrawn');
      expect(mails, who).toHaveLength(1);
      expect(mails[0].subject).toContain('Review check: the delivery line bursts at night');
      expect(mails[0].textBody).toContain(`/questions/${qid}`);
      expect(mails[0].textBody).not.toContain('Weld the waste valve');
    }
    expect(await mailsTo(AUTHOR, 'withdrawn')).toHaveLength(0);
    // the author's own notice names the thread
    const [notice] = await mailsTo(AUTHOR, 'moderation');
    expect(notice.textBody).toContain('Review check: the delivery line bursts at night');
    expect(notice.textBody).not.toContain('write to the moderators from your settings page');
  });

  it('the author reads their own hidden answer, marked with the reason; a stranger does not', async () => {
    const mine = await call(threadGET, 'GET', `/api/questions/${qid}`, AUTHOR, undefined, { id: String(qid) });
    const a = mine.body.answers.find((x: { id: number }) => x.id === unsafeAnswer);
    expect(a).toMatchObject({ ownPost: true, hiddenReason: 'Unsafe: a capped line bursts.' });
    expect(a.hiddenAt).not.toBeNull();
    const revs = `/api/questions/${qid}/revisions?postType=answer&postId=${unsafeAnswer}`;
    expect((await call(revisionsGET, 'GET', revs, AUTHOR, undefined, { id: String(qid) })).status).toBe(200);
    for (const who of [STRANGER, null]) {
      const theirs = await call(threadGET, 'GET', `/api/questions/${qid}`, who, undefined, { id: String(qid) });
      expect(theirs.body.answers.map((x: { id: number }) => x.id)).not.toContain(unsafeAnswer);
      expect(JSON.stringify(theirs.body)).not.toContain('Weld the waste valve');
      expect((await call(revisionsGET, 'GET', revs, who, undefined, { id: String(qid) })).status).toBe(404);
    }
    // reading is all: the author still cannot rewrite it while hidden
    const edit = await call(
      answerPUT,
      'PUT',
      `/api/answers/${unsafeAnswer}`,
      AUTHOR,
      { body: 'Quietly softened after the hide.' },
      { id: String(unsafeAnswer) },
    );
    expect(edit.status).toBe(404);
  });

  it('the author appeals once; the appeal is an item of its own in the queue; a stranger cannot appeal', async () => {
    const appeal = (who: string) =>
      call(appealPOST, 'POST', '/api/appeals', who, {
        postType: 'answer',
        postId: unsafeAnswer,
        text: 'The cap was only for a pressure test with the pump off; I can edit it to say so.',
      });
    expect((await appeal(STRANGER)).status).toBe(403);
    expect((await appeal(AUTHOR)).status).toBe(201);
    const again = await appeal(AUTHOR);
    expect(again.status).toBe(409);
    expect(again.body.error.field).toBe('postId');
    const short = await call(appealPOST, 'POST', '/api/appeals', AUTHOR, {
      postType: 'answer',
      postId: unsafeAnswer,
      text: 'no',
    });
    expect(short.status).toBe(400);
    expect(short.body.error.field).toBe('text');
    // a post readers still see has no decision to appeal
    const visible = await call(appealPOST, 'POST', '/api/appeals', 'ironwheel_builds', {
      postType: 'answer',
      postId: spamAnswer,
      text: 'Please look again at this one as well.',
    });
    expect(visible.status).toBe(422);

    const item = (await queue()).find((i) => i.appeal && i.post.id === unsafeAnswer);
    expect(item?.appeal?.text).toContain('pressure test with the pump off');
    expect(item?.flags).toEqual([]);

    // keeping the decision closes the appeal and tells the author so
    expect(
      (await act({ action: 'dismiss', postType: 'answer', postId: unsafeAnswer, reason: 'Still unsafe as written.' }))
        .status,
    ).toBe(200);
    expect(await Appeal.count({ where: { postId: unsafeAnswer, status: 'open' } })).toBe(0);
    expect((await queue()).some((i) => i.appeal && i.post.id === unsafeAnswer)).toBe(false);
    const last = await Notice.findOne({ where: { userId: await userId(AUTHOR) }, order: [['id', 'DESC']] });
    expect(last?.message).toContain('kept the decision');
    expect((await initModels().Answer.findByPk(unsafeAnswer))!.hiddenAt).not.toBeNull();
  });
});
