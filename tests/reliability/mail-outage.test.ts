import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { POST as askPOST } from '@/app/api/questions/route';
import { POST as answerPOST } from '@/app/api/questions/[id]/answers/route';
import { POST as replyPOST } from '@/app/api/questions/[id]/replies/route';
import { POST as retryPOST } from '@/app/api/admin/outbox/[id]/retry/route';
import { initModels } from '@/models';
import { backoffMs, flushOutbox, maxAttempts } from '@/lib/mail/outbox';
import { SmtpCatcher } from '../support/smtp-catcher';
import { freshDemoDatabase } from '../support/db';
import { actAs } from '../support/act-as';

const { call } = actAs('10.53');
const port = Number(process.env.SMTP_PORT);
const HOUR = 3_600_000;

describe('SMTP down: events commit, messages wait in the outbox, each goes out once when it is back', () => {
  let catcher: SmtpCatcher | null = null;
  let qid: number;
  beforeAll(async () => {
    await freshDemoDatabase();
  });
  afterAll(async () => {
    await catcher?.stop();
  });

  it('with no mail server, answers and replies are saved and their messages wait', async () => {
    const q = await call(askPOST, 'POST', '/api/questions', 'ferncombe_tamsin', {
      title: 'Outage check: delivery drops at dusk',
      body: 'Every evening the delivery falls to half and comes back by morning.',
      tags: ['stall'],
    });
    expect(q.status).toBe(201);
    qid = q.body.id;
    const a = await call(
      answerPOST,
      'POST',
      `/api/questions/${qid}/answers`,
      'ironwheel_builds',
      { body: 'Check the intake screen at dusk: leaves settle on it when the breeze drops.' },
      { id: String(qid) },
    );
    expect(a.status).toBe(201);
    const r = await call(
      replyPOST,
      'POST',
      `/api/questions/${qid}/replies`,
      'ferncombe_tamsin',
      { body: 'The screen was half covered. Cleared it.', answerId: a.body.id },
      { id: String(qid) },
    );
    expect(r.status).toBe(201);

    const { MailMessage, Answer, Reply } = initModels();
    expect(await Answer.count({ where: { questionId: qid } })).toBe(1);
    expect(await Reply.count({ where: { questionId: qid } })).toBe(1);
    const waiting = await MailMessage.findAll({ where: { status: 'pending' }, order: [['id', 'ASC']] });
    expect(waiting.map((m) => m.kind)).toEqual(['answer', 'reply']);

    const out = await flushOutbox();
    expect(out).toEqual({ sent: 0, retrying: 2, failed: 0 });
    const after = await MailMessage.findAll({ order: [['id', 'ASC']] });
    expect(after.every((m) => m.status === 'pending')).toBe(true);
    // the message tried counts an attempt and says why; the rest of the batch keep theirs for when the server answers
    expect(after[0].attempts).toBe(1);
    expect(after[0].lastError).toMatch(/ECONNREFUSED|ECONNECTION|connect/i);
    expect(after[1].attempts).toBe(0);
    expect(after[0].nextAttemptAt.getTime()).toBeGreaterThan(Date.now() + backoffMs(1) - 5_000);
    // nothing is due before the backoff has passed
    expect(await flushOutbox()).toEqual({ sent: 0, retrying: 0, failed: 0 });
  });

  it('after the server starts again, each message goes out once (the catcher counts them)', async () => {
    catcher = new SmtpCatcher(port, { reject: ['refused@nowhere.example'] });
    await catcher.start();
    const later = () => new Date(Date.now() + HOUR);
    const out = await flushOutbox({ now: later });
    expect(out).toEqual({ sent: 2, retrying: 0, failed: 0 });
    // run again, and twice at once: nothing more is sent
    expect(await flushOutbox({ now: later })).toEqual({ sent: 0, retrying: 0, failed: 0 });
    await Promise.all([flushOutbox({ now: later, separate: true }), flushOutbox({ now: later, separate: true })]);
    expect(catcher.messages).toHaveLength(2);
    expect(catcher.countTo('tamsin@ferncombe.example')).toBe(1);
    expect(catcher.countTo('builds@ironwheel.example')).toBe(1);
    const answerMail = await catcher.waitFor('tamsin@ferncombe.example', /^New answer: Outage check/);
    expect(answerMail.text).toContain('Check the intake screen at dusk');
    expect(answerMail.text).toMatch(new RegExp(`/questions/${qid}#answer-\\d+`));
    expect(answerMail.html).toContain('Check the intake screen at dusk');
    expect(answerMail.raw.get('list-unsubscribe-post')).toBe('List-Unsubscribe=One-Click');
    expect(answerMail.raw.get('list-unsubscribe')).toMatch(
      /^<http:\/\/127\.0\.0\.1:3100\/api\/unsubscribe\?u=\d+&s=answers&t=[\w-]{43}>$/,
    );
    const { MailMessage } = initModels();
    expect(await MailMessage.count({ where: { status: 'sent' } })).toBe(2);
  });

  it('a message refused after its last attempt is marked failed with the SMTP error, for admins to see and send again', async () => {
    const { MailMessage, User } = initModels();
    const cabin = (await User.findOne({ where: { handle: 'sorrel_cabin' } }))!;
    await cabin.update({ email: 'refused@nowhere.example' });
    const theirs = (await initModels().Question.findOne({ where: { authorId: cabin.id } }))!.id;
    const a = await call(
      answerPOST,
      'POST',
      `/api/questions/${theirs}/answers`,
      'ironwheel_builds',
      { body: 'Raise the outlet a little.' },
      { id: String(theirs) },
    );
    expect(a.status).toBe(201);
    const row = (await MailMessage.findOne({ where: { toAddress: 'refused@nowhere.example' } }))!;
    let t = Date.now();
    for (let i = 0; i < maxAttempts(); i++) {
      t += 7 * HOUR; // past the longest backoff each time
      await flushOutbox({ now: () => new Date(t) });
    }
    await row.reload();
    expect(row.status).toBe('failed');
    expect(row.attempts).toBe(maxAttempts());
    expect(row.lastError).toMatch(/550/);
    expect(catcher!.countTo('refused@nowhere.example')).toBe(0);

    const member = await call(
      retryPOST,
      'POST',
      `/api/admin/outbox/${row.id}/retry`,
      'moss_moderator',
      {},
      { id: String(row.id) },
    );
    expect(member.status).toBe(403);
    const admin = await call(
      retryPOST,
      'POST',
      `/api/admin/outbox/${row.id}/retry`,
      'clack_admin',
      {},
      { id: String(row.id) },
    );
    expect(admin.status).toBe(200);
    await row.reload();
    expect(row).toMatchObject({ status: 'pending', attempts: 0 });
    const again = await call(
      retryPOST,
      'POST',
      `/api/admin/outbox/${row.id}/retry`,
      'clack_admin',
      {},
      { id: String(row.id) },
    );
    expect(again.status).toBe(404);
  });

  it('a message queued a moment ago does not inherit the long wait of an older one tried first while the server is down', async () => {
    await catcher?.stop();
    catcher = null;
    const { MailMessage } = initModels();
    await MailMessage.destroy({ where: {} });
    const base = {
      userId: null,
      kind: 'answer',
      subject: 'Backoff check',
      textBody: 'x',
      htmlBody: null,
      headers: null,
    };
    const old = await MailMessage.create({
      ...base,
      dedupeKey: 'check:old',
      toAddress: 'old@nowhere.example',
      attempts: 4,
      nextAttemptAt: new Date(Date.now() - 60_000),
    });
    const fresh = await MailMessage.create({
      ...base,
      dedupeKey: 'check:fresh',
      toAddress: 'fresh@nowhere.example',
      nextAttemptAt: new Date(),
    });
    const t0 = Date.now();
    expect(await flushOutbox()).toEqual({ sent: 0, retrying: 2, failed: 0 });
    await old.reload();
    await fresh.reload();
    // the older one was tried (the first in the batch) and waits its fifth interval
    expect(old.attempts).toBe(5);
    expect(old.nextAttemptAt.getTime()).toBeGreaterThanOrEqual(t0 + backoffMs(5) - 1_000);
    // the fresh one was handed back untried and waits only the first interval
    expect(fresh.attempts).toBe(0);
    expect(fresh.nextAttemptAt.getTime()).toBeLessThanOrEqual(Date.now() + backoffMs(1) + 1_000);
    expect(backoffMs(5)).toBeGreaterThan(backoffMs(1) * 4);
  });
});
