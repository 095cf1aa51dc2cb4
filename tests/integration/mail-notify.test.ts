import { beforeAll, describe, expect, it } from 'vitest';
import { POST as askPOST } from '@/app/api/questions/route';
import { POST as answerPOST } from '@/app/api/questions/[id]/answers/route';
import { POST as replyPOST } from '@/app/api/questions/[id]/replies/route';
import { PUT as fixedPUT } from '@/app/api/questions/[id]/fixed/route';
import { POST as actionPOST } from '@/app/api/review/actions/route';
import { GET as mailGET, PUT as mailPUT } from '@/app/api/account/mail/route';
import { GET as unsubGET, POST as unsubPOST } from '@/app/api/unsubscribe/route';
import { initModels } from '@/models';
import { unsubscribeQuery } from '@/lib/mail/unsubscribe';
import { freshDemoDatabase } from '../support/db';
import { actAs } from '../support/act-as';

const { call, raw } = actAs('10.54');
const { MailMessage, User } = initModels();
const userId = async (handle: string) => (await User.findOne({ where: { handle } }))!.id;
const mailsTo = async (handle: string, kind?: string) =>
  MailMessage.findAll({ where: { userId: await userId(handle), ...(kind ? { kind } : {}) }, order: [['id', 'ASC']] });

describe('notifications are queued with their event, once, and only when wanted', () => {
  let qid: number;
  let aid: number;
  beforeAll(async () => {
    await freshDemoDatabase();
    const q = await call(askPOST, 'POST', '/api/questions', 'ferncombe_tamsin', {
      title: 'Notify check: the air chamber fills with water',
      body: 'After a week the pump loses its cushion and bangs; the snifter hole is clear.',
      tags: ['tuning'],
    });
    qid = q.body.id;
  });

  it('an answer to your question, with the answer quoted and a link to it; nothing to the one who answered', async () => {
    const a = await call(
      answerPOST,
      'POST',
      `/api/questions/${qid}/answers`,
      'quarry_lane_valves',
      {
        body: 'A snifter valve lets a little air in each beat; make sure it is above the water line. <script>alert(1)</script>',
      },
      { id: String(qid) },
    );
    expect(a.status).toBe(201);
    aid = a.body.id;
    const [m] = await mailsTo('ferncombe_tamsin', 'answer');
    expect(m).toMatchObject({
      toAddress: 'tamsin@ferncombe.example',
      subject: 'New answer: Notify check: the air chamber fills with water',
      status: 'pending',
      dedupeKey: `answer:${aid}:to:${await userId('ferncombe_tamsin')}`,
    });
    expect(m.textBody).toContain('Quarry Lane Valves wrote:');
    expect(m.textBody).toContain(`/questions/${qid}#answer-${aid}`);
    // a member's words are text in the HTML part, never markup
    expect(m.htmlBody).not.toContain('<script>');
    expect(m.htmlBody).toContain('&lt;script&gt;');
    expect(await mailsTo('quarry_lane_valves')).toHaveLength(0);
  });

  it('a reply goes to the author of what it replies to', async () => {
    const r = await call(
      replyPOST,
      'POST',
      `/api/questions/${qid}/replies`,
      'ferncombe_tamsin',
      { body: 'The snifter was below the water line. Moved it.', answerId: aid },
      { id: String(qid) },
    );
    expect(r.status).toBe(201);
    const [m] = await mailsTo('quarry_lane_valves', 'reply');
    expect(m.subject).toBe('New reply: Notify check: the air chamber fills with water');
    expect(m.textBody).toContain('replied to your answer');
    const nested = await call(
      replyPOST,
      'POST',
      `/api/questions/${qid}/replies`,
      'highcrag_shepherd',
      { body: 'Same fix worked here.', replyToId: r.body.id },
      { id: String(qid) },
    );
    expect(nested.status).toBe(201);
    const toTamsin = await mailsTo('ferncombe_tamsin', 'reply');
    expect(toTamsin).toHaveLength(1);
    expect(toTamsin[0].textBody).toContain('replied to your reply');
  });

  it('fixed it tells the answer’s author once, however often it is chosen again', async () => {
    for (const answerId of [aid, null, aid]) {
      expect(
        (
          await call(
            fixedPUT,
            'PUT',
            `/api/questions/${qid}/fixed`,
            'ferncombe_tamsin',
            answerId === null
              ? { answerId }
              : { answerId, whatFixedIt: 'Drained the air chamber and fitted a snifter' },
            { id: String(qid) },
          )
        ).status,
      ).toBe(200);
    }
    const m = await mailsTo('quarry_lane_valves', 'fixed');
    expect(m).toHaveLength(1);
    expect(m[0].subject).toBe('Your answer fixed it: Notify check: the air chamber fills with water');
  });

  it('a moderation action tells the author, with the reason; a dismissed flag does not', async () => {
    const act = (action: string) =>
      call(actionPOST, 'POST', '/api/review/actions', 'moss_moderator', {
        action,
        postType: 'answer',
        postId: aid,
        reason: 'testing notifications',
      });
    expect((await act('dismiss')).status).toBe(200);
    expect(await mailsTo('quarry_lane_valves', 'moderation')).toHaveLength(0);
    expect((await act('hide')).status).toBe(200);
    const [m] = await mailsTo('quarry_lane_valves', 'moderation');
    expect(m.subject).toBe('A moderator hid your post on Clackwater');
    expect(m.textBody).toContain('testing notifications');
  });

  it('a member who switches a kind off gets none of it; the settings name a bad field', async () => {
    const bad = async (body: unknown, field: string, status = 400) => {
      const res = await call(mailPUT, 'PUT', '/api/account/mail', 'ferncombe_tamsin', body);
      expect(res.status, JSON.stringify(body)).toBe(status);
      expect(res.body.error.field).toBe(field);
    };
    const good = {
      digest: 'weekly',
      tags: ['tuning', 'frost'],
      notify: { answers: false, replies: true, fixed: true, moderation: true, expert: true },
    };
    await bad({ ...good, digest: 'hourly' }, 'digest');
    await bad({ ...good, tags: ['Not A Tag'] }, 'tags.0');
    await bad({ ...good, tags: ['no-such-tag'] }, 'tags', 422);
    await bad({ ...good, notify: { ...good.notify, answers: 'yes' } }, 'notify.answers');
    expect((await call(mailPUT, 'PUT', '/api/account/mail', null, good)).status).toBe(401);
    const saved = await call(mailPUT, 'PUT', '/api/account/mail', 'ferncombe_tamsin', good);
    expect(saved.status).toBe(200);
    expect(saved.body).toEqual({
      digest: 'weekly',
      tags: ['frost', 'tuning'].sort((a, b) => a.localeCompare(b)),
      notify: good.notify,
    });
    const read = await call(mailGET, 'GET', '/api/account/mail', 'ferncombe_tamsin');
    expect(read.body.tags.sort()).toEqual(['frost', 'tuning']);
    expect(read.body.tagChoices.length).toBeGreaterThan(5);

    const before = (await mailsTo('ferncombe_tamsin', 'answer')).length;
    expect(
      (
        await call(
          answerPOST,
          'POST',
          `/api/questions/${qid}/answers`,
          'ironwheel_builds',
          { body: 'Drain and refill the chamber once a season.' },
          { id: String(qid) },
        )
      ).status,
    ).toBe(201);
    expect(await mailsTo('ferncombe_tamsin', 'answer')).toHaveLength(before);
  });

  it('an unsubscribe link with one character changed is refused; the real one switches the digest off, signed out', async () => {
    const id = await userId('highcrag_shepherd');
    expect((await User.findByPk(id))!.digestFrequency).toBe('weekly');
    const real = unsubscribeQuery(id, 'digest');
    const t = new URLSearchParams(real).get('t')!;
    const flipped = t.slice(0, 10) + (t[10] === 'A' ? 'B' : 'A') + t.slice(11);
    const tampered = new URLSearchParams({ u: String(id), s: 'digest', t: flipped }).toString();
    const refused = await call(unsubPOST, 'POST', `/api/unsubscribe?${tampered}`, null);
    expect(refused.status).toBe(403);
    expect(refused.body.error.field).toBe('t');
    // the same signature on someone else's number, or on another kind of mail, is refused too
    const other = await userId('sorrel_cabin');
    expect(
      (
        await call(
          unsubPOST,
          'POST',
          `/api/unsubscribe?${new URLSearchParams({ u: String(other), s: 'digest', t })}`,
          null,
        )
      ).status,
    ).toBe(403);
    expect(
      (await call(unsubPOST, 'POST', `/api/unsubscribe?${new URLSearchParams({ u: String(id), s: 'all', t })}`, null))
        .status,
    ).toBe(403);
    expect(
      (
        await call(
          unsubPOST,
          'POST',
          `/api/unsubscribe?${new URLSearchParams({ u: String(id), s: 'everything', t })}`,
          null,
        )
      ).body.error.field,
    ).toBe('s');
    expect((await User.findByPk(id))!.digestFrequency).toBe('weekly');

    const page = await raw(unsubGET, 'GET', `/api/unsubscribe?${real}`, null);
    expect(page.status).toBe(303);
    expect(page.headers.get('location')).toBe(`http://localhost/unsubscribe?${real}`);
    const ok = await call(unsubPOST, 'POST', `/api/unsubscribe?${real}`, null);
    expect(ok.status).toBe(200);
    expect(ok.body.message).toMatch(/the digest is switched off/);
    expect((await User.findByPk(id))!.digestFrequency).toBe('off');
    expect((await User.findByPk(id))!.notifyAnswers).toBe(true);
  });
});
