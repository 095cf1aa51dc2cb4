import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Op } from 'sequelize';
import { POST as askPOST } from '@/app/api/questions/route';
import { POST as actionPOST } from '@/app/api/review/actions/route';
import { initModels } from '@/models';
import { periodKey, runDigests } from '@/lib/mail/digest';
import { flushOutbox } from '@/lib/mail/outbox';
import { SmtpCatcher } from '../support/smtp-catcher';
import { freshDemoDatabase } from '../support/db';
import { actAs } from '../support/act-as';

const { call } = actAs('10.52');
const catcher = new SmtpCatcher(Number(process.env.SMTP_PORT));
const ask = (who: string, title: string, tags: string[]) =>
  call(askPOST, 'POST', '/api/questions', who, {
    title,
    body: 'Asked while testing the digest: the pump beats, then stops after a few minutes.',
    tags,
  });

describe('digests (real MariaDB, an SMTP catcher)', () => {
  beforeAll(async () => {
    await freshDemoDatabase();
    await catcher.start();
  });
  afterAll(() => catcher.stop());

  it('names the period: ISO 8601 weeks in UTC, days for the daily digest', () => {
    // ISO 8601 week numbering (week 1 holds the year's first Thursday); dates checked from memory against a calendar
    expect(periodKey('weekly', new Date('2026-12-02T10:00:00Z'))).toBe('2026-W49');
    expect(periodKey('weekly', new Date('2021-01-03T10:00:00Z'))).toBe('2020-W53');
    expect(periodKey('weekly', new Date('2024-12-30T10:00:00Z'))).toBe('2025-W01');
    expect(periodKey('daily', new Date('2026-12-02T23:59:00Z'))).toBe('2026-12-02');
  });

  it('a seeded member’s weekly digest holds exactly the new questions in their tags, nothing hidden, none of their own', async () => {
    // highcrag_shepherd follows stall, drive-pipe and tuning in the demo seed
    const hidden = await ask('sorrel_cabin', 'Digest check: a question a moderator hides', ['stall']);
    const elsewhere = await ask('sorrel_cabin', 'Digest check: a question only in frost', ['frost']);
    const own = await ask('highcrag_shepherd', 'Digest check: a question of my own', ['tuning']);
    const fresh = await ask('sorrel_cabin', 'Digest check: a new question in tuning', ['tuning', 'frost']);
    for (const r of [hidden, elsewhere, own, fresh]) expect(r.status).toBe(201);
    expect(
      (
        await call(actionPOST, 'POST', '/api/review/actions', 'moss_moderator', {
          action: 'hide',
          postType: 'question',
          postId: hidden.body.id,
          reason: 'testing the digest',
        })
      ).status,
    ).toBe(200);

    const run = await runDigests('weekly');
    expect(run.queued).toBeGreaterThan(0);
    const { MailMessage, User } = initModels();
    const shepherd = (await User.findOne({ where: { handle: 'highcrag_shepherd' } }))!;
    const rows = await MailMessage.findAll({ where: { userId: shepherd.id, kind: 'digest-weekly' } });
    expect(rows).toHaveLength(1);
    const text = rows[0].textBody;
    // the questions' section only: the guides changed this week depend on the guides' own dates
    const heading = 'NEW QUESTIONS IN YOUR TAGS';
    const rest = text.slice(text.indexOf(heading) + heading.length);
    const end = rest.search(/\n(?:[A-Z][A-Z ,]+\n\n|--\n)/);
    const questions = end < 0 ? rest : rest.slice(0, end);
    const listed = [...questions.matchAll(/^\* (.+)$/gm)].map((m) => m[1]);
    // The demo's questions in the last week in stall, drive-pipe or tuning by someone else, newest first, then today's.
    expect(listed).toEqual([
      'Digest check: a new question in tuning',
      'Second pump added, delivery only went up a little',
      'Half-inch pump beats for a minute, then stops — drive pipe too short?',
    ]);
    expect(text).not.toContain('a moderator hides');
    expect(rows[0].htmlBody).toContain('Digest check: a new question in tuning');
    expect(rows[0].htmlBody).not.toContain('a moderator hides');
    expect(rows[0].htmlBody).not.toMatch(/<img/i);
    expect(rows[0].headers).toMatchObject({ 'List-Unsubscribe-Post': 'List-Unsubscribe=One-Click' });
    expect(rows[0].headers?.['List-Unsubscribe']).toMatch(
      new RegExp(`^<http://127\\.0\\.0\\.1:3100/api/unsubscribe\\?u=${shepherd.id}&s=digest&t=[A-Za-z0-9_-]{43}>$`),
    );
  });

  it('an expert’s digest adds unanswered questions in their tags and guides whose safety check went stale', async () => {
    const { MailMessage, User } = initModels();
    const expert = (await User.findOne({ where: { handle: 'ironwheel_builds' } }))!;
    const row = (await MailMessage.findOne({ where: { userId: expert.id, kind: 'digest-weekly' } }))!;
    expect(row.textBody).toContain('STILL WAITING FOR AN ANSWER');
    expect(row.textBody).toContain('Air chamber size for a ¾" pump');
    // the demo's drive-pipe guide was last checked on an earlier wording
    expect(row.textBody).toContain('SAFETY CHECKS OUT OF DATE');
    expect(row.textBody).toContain('The drive pipe');
    const member = (await User.findOne({ where: { handle: 'highcrag_shepherd' } }))!;
    const plain = (await MailMessage.findOne({ where: { userId: member.id, kind: 'digest-weekly' } }))!;
    expect(plain.textBody).not.toContain('SAFETY CHECKS OUT OF DATE');
  });

  it('members with the digest off or nothing new get none', async () => {
    const { MailMessage, User } = initModels();
    const moss = (await User.findOne({ where: { handle: 'moss_moderator' } }))!;
    expect(await MailMessage.count({ where: { userId: moss.id } })).toBe(0);
  });

  it('two digest runs at once, then two senders at once, send one digest per member', async () => {
    const { MailMessage } = initModels();
    // this week's digests were queued above: two more runs find every key taken
    const [a, b] = await Promise.all([runDigests('weekly'), runDigests('weekly')]);
    expect(a.queued + b.queued).toBe(0);
    expect(a.alreadyQueued).toBeGreaterThan(0);
    const nextWeek = new Date(Date.now() + 7 * 86_400_000);
    const [c, d] = await Promise.all([runDigests('weekly', nextWeek), runDigests('weekly', nextWeek)]);
    const queued = await MailMessage.findAll({
      where: { dedupeKey: { [Op.like]: `digest:weekly:${periodKey('weekly', nextWeek)}:%` } },
    });
    expect(queued.length).toBeGreaterThan(0);
    expect(c.queued + d.queued).toBe(queued.length);
    expect(new Set(queued.map((q) => q.userId)).size).toBe(queued.length);

    const [x, y] = await Promise.all([flushOutbox({ separate: true }), flushOutbox({ separate: true })]);
    const rows = await MailMessage.findAll({ where: { kind: 'digest-weekly' } });
    expect(rows.every((r) => r.status === 'sent')).toBe(true);
    expect(x.sent + y.sent).toBe(await MailMessage.count({ where: { status: 'sent' } }));
    // each member's digests arrive once each: as many at the catcher as rows in the outbox
    for (const address of new Set(rows.map((r) => r.toAddress))) {
      const arrived = catcher.messages.filter(
        (m) => m.to.includes(address) && /weekly Clackwater digest/.test(m.subject),
      ).length;
      expect(arrived, address).toBe(rows.filter((r) => r.toAddress === address).length);
    }
  });
});
