import 'server-only';
import { Op, QueryTypes } from 'sequelize';
import { getSequelize } from '@/lib/db';
import { initModels } from '@/models';
import type { User } from '@/models/User';
import { listGuides } from '@/lib/guides/content';
import { siteUrl } from '@/lib/site';
import { enqueue, type OutgoingMail } from './outbox';
import { mailInUnits } from './units';
import { renderMail, type MailItem, type MailSection } from './templates';
import { unsubscribeHeaders, unsubscribePageUrl } from './unsubscribe';
import { can } from '@/lib/auth/policy';
import { formatDate } from '@/lib/dates';

/**
 * Digests. A run for one frequency builds each member's message from what changed
 * in the period before it (a day or a week), and queues it under a key naming the
 * period: two runs at once, or a second run the same day or week, queue one digest
 * per member. A member with nothing new gets no message.
 */
export type DigestFrequency = 'daily' | 'weekly';

const DAY = 86_400_000;
const NEW_QUESTIONS_MAX = 20;
const UNANSWERED_MAX = 10;
/** Unanswered questions older than this drop out of an expert's digest. */
const UNANSWERED_DAYS = 60;

/** "2026-W49" for weekly digests (ISO 8601 week, UTC), "2026-12-02" for daily ones. */
export function periodKey(frequency: DigestFrequency, now: Date): string {
  if (frequency === 'daily') return now.toISOString().slice(0, 10);
  const d = new Date(Date.UTC(now.getUTCFullYear(), now.getUTCMonth(), now.getUTCDate()));
  const weekday = d.getUTCDay() || 7;
  d.setUTCDate(d.getUTCDate() + 4 - weekday); // the Thursday of this week decides its year
  const yearStart = Date.UTC(d.getUTCFullYear(), 0, 1);
  const week = Math.ceil(((d.getTime() - yearStart) / DAY + 1) / 7);
  return `${d.getUTCFullYear()}-W${String(week).padStart(2, '0')}`;
}

interface QuestionRow {
  id: number;
  title: string;
  created_at: Date;
  answer_count: number;
  fixed_answer_id: number | null;
}

const VISIBLE = 'q.hidden_at IS NULL AND q.deleted_at IS NULL';

/**
 * Visible questions by others in the tags a member follows, asked in [since, until):
 * the new ones newest first, or those with no visible answer yet oldest first.
 */
async function questionsInTags(
  userId: number,
  o: { since: Date; until: Date; unanswered: boolean; limit: number },
): Promise<QuestionRow[]> {
  const order = o.unanswered ? 'ASC' : 'DESC';
  return getSequelize().query<QuestionRow>(
    `SELECT DISTINCT q.id, q.title, q.created_at, q.answer_count, q.fixed_answer_id
       FROM tag_follows tf
       JOIN question_tags qt ON qt.tag_id = tf.tag_id
       JOIN questions q ON q.id = qt.question_id
      WHERE tf.user_id = :userId AND q.created_at >= :since AND q.created_at < :until AND ${VISIBLE} AND q.author_id <> :userId
        ${o.unanswered ? 'AND NOT EXISTS (SELECT 1 FROM answers a WHERE a.question_id = q.id AND a.hidden_at IS NULL AND a.deleted_at IS NULL)' : ''}
      ORDER BY q.created_at ${order}, q.id ${order} LIMIT ${o.limit}`,
    { replacements: { userId, since: o.since, until: o.until }, type: QueryTypes.SELECT },
  );
}

async function tagNames(questionIds: number[]): Promise<Map<number, string[]>> {
  const out = new Map<number, string[]>();
  if (questionIds.length === 0) return out;
  const rows = await getSequelize().query<{ question_id: number; name: string }>(
    'SELECT qt.question_id, t.name FROM question_tags qt JOIN tags t ON t.id = qt.tag_id WHERE qt.question_id IN (:ids) ORDER BY t.name',
    { replacements: { ids: questionIds }, type: QueryTypes.SELECT },
  );
  for (const r of rows) out.set(r.question_id, [...(out.get(r.question_id) ?? []), r.name]);
  return out;
}

function questionItems(rows: QuestionRow[], tags: Map<number, string[]>, now: Date): MailItem[] {
  return rows.map((q) => {
    const days = Math.floor((now.getTime() - new Date(q.created_at).getTime()) / DAY);
    const age = days < 1 ? 'today' : days === 1 ? 'yesterday' : `${days} days ago`;
    const answers = q.fixed_answer_id
      ? 'fixed'
      : q.answer_count === 0
        ? 'no answers yet'
        : `${q.answer_count} answer${q.answer_count === 1 ? '' : 's'}`;
    return {
      title: q.title,
      url: `${siteUrl()}/questions/${q.id}`,
      meta: [(tags.get(q.id) ?? []).join(', '), `asked ${age}`, answers].filter(Boolean).join(' · '),
    };
  });
}

/** Guides whose newest safety check was made on an earlier wording than the file has now. */
async function staleGuides(guides: ReturnType<typeof listGuides>): Promise<MailItem[]> {
  const { SafetyCheck } = initModels();
  const checks = await SafetyCheck.findAll({
    attributes: ['guideSlug', 'contentHash', 'createdAt', 'id'],
    order: [
      ['createdAt', 'DESC'],
      ['id', 'DESC'],
    ],
  });
  const newest = new Map<string, { contentHash: string; createdAt: Date }>();
  for (const c of checks) if (!newest.has(c.guideSlug)) newest.set(c.guideSlug, c);
  return guides
    .filter((g) => newest.has(g.slug) && newest.get(g.slug)!.contentHash !== g.hash)
    .map((g) => ({
      title: g.meta.title,
      url: `${siteUrl()}/guides/${g.slug}`,
      meta: `last checked ${formatDate(newest.get(g.slug)!.createdAt)}, on an earlier wording`,
    }));
}

/** What is the same in every member's digest of one run. */
interface RunContext {
  now: Date;
  start: Date;
  /** guides whose `updated` date falls in the period */
  changedGuides: MailItem[];
  /** guides whose newest safety check was made on an earlier wording (experts only) */
  stale: MailItem[];
}

/** The sections of one member's digest (empty ones left out). */
async function digestSections(user: Pick<User, 'id' | 'role'>, run: RunContext): Promise<MailSection[]> {
  const expert = can(user, 'digest.expertSections');
  const fresh = await questionsInTags(user.id, {
    since: run.start,
    until: run.now,
    unanswered: false,
    limit: NEW_QUESTIONS_MAX,
  });
  const waiting = expert
    ? await questionsInTags(user.id, {
        since: new Date(run.now.getTime() - UNANSWERED_DAYS * DAY),
        until: run.now,
        unanswered: true,
        limit: UNANSWERED_MAX,
      })
    : [];
  const tags = await tagNames([...fresh, ...waiting].map((q) => q.id));

  const sections: MailSection[] = [];
  if (fresh.length) sections.push({ title: 'New questions in your tags', items: questionItems(fresh, tags, run.now) });
  if (waiting.length)
    sections.push({
      title: 'Still waiting for an answer',
      note: 'Questions in your tags that nobody has answered yet, oldest first.',
      items: questionItems(waiting, tags, run.now),
    });
  if (run.changedGuides.length) sections.push({ title: 'Guides added or changed', items: run.changedGuides });
  if (expert && run.stale.length)
    sections.push({
      title: 'Safety checks out of date',
      note: 'These guides changed after their last safety check. An expert’s fresh read keeps the cautions honest.',
      items: run.stale,
    });
  return sections;
}

export interface DigestRunResult {
  frequency: DigestFrequency;
  period: string;
  members: number;
  queued: number;
  nothingNew: number;
  alreadyQueued: number;
}

const BATCH = 200;

/** Queues the digests for every member on this frequency. Safe to run twice, or twice at once. */
export async function runDigests(frequency: DigestFrequency, now = new Date()): Promise<DigestRunResult> {
  const { User } = initModels();
  const period = periodKey(frequency, now);
  const guides = listGuides();
  const start = new Date(now.getTime() - (frequency === 'weekly' ? 7 : 1) * DAY);
  const startDay = start.toISOString().slice(0, 10);
  const run: RunContext = {
    now,
    start,
    changedGuides: guides
      .filter((g) => g.meta.updated >= startDay)
      .map((g) => ({
        title: g.meta.title,
        url: `${siteUrl()}/guides/${g.slug}`,
        meta: `updated ${g.meta.updated} · ${g.meta.level}`,
      })),
    stale: await staleGuides(guides),
  };
  const result: DigestRunResult = { frequency, period, members: 0, queued: 0, nothingNew: 0, alreadyQueued: 0 };
  let afterId = 0;
  for (;;) {
    const members = await User.findAll({
      where: { digestFrequency: frequency, emailVerifiedAt: { [Op.ne]: null }, id: { [Op.gt]: afterId } },
      attributes: ['id', 'email', 'displayName', 'role', 'units'],
      order: [['id', 'ASC']],
      limit: BATCH,
    });
    const last = members.at(-1);
    if (!last) break;
    afterId = last.id;
    result.members += members.length;
    const mails: OutgoingMail[] = [];
    for (const m of members) {
      const sections = await digestSections(m, run);
      if (sections.length === 0) {
        result.nothingNew++;
        continue;
      }
      const count = sections.reduce((n, s) => n + s.items.length, 0);
      const mail = await renderMail({
        ...mailInUnits(
          {
            subject: `Your ${frequency} Clackwater digest: ${count} thing${count === 1 ? '' : 's'} to read`,
            preview: sections.map((s) => `${s.title} (${s.items.length})`).join(' · '),
            heading: `Your ${frequency} digest`,
            paragraphs: [
              `Hello ${m.displayName}, here is what happened on Clackwater in the ${frequency === 'weekly' ? 'last seven days' : 'last day'}.`,
            ],
            sections,
            action: { label: 'Ask a question', url: `${siteUrl()}/questions/ask` },
          },
          m.units,
        ),
        footer: {
          reason: `You get this ${frequency} because you chose a ${frequency} digest in your settings. Follow or unfollow tags there to change what it holds.`,
          settingsUrl: `${siteUrl()}/settings#email`,
          unsubscribe: { label: 'Stop the digest', url: unsubscribePageUrl(m.id, 'digest') },
        },
      });
      mails.push({
        key: `digest:${frequency}:${period}:to:${m.id}`,
        userId: m.id,
        to: m.email,
        kind: `digest-${frequency}`,
        subject: mail.subject,
        text: mail.text,
        html: mail.html,
        headers: unsubscribeHeaders(m.id, 'digest'),
      });
    }
    const added = await getSequelize().transaction((transaction) => enqueue(mails, transaction));
    result.queued += added;
    result.alreadyQueued += mails.length - added;
  }
  return result;
}
