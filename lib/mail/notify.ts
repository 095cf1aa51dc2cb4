import 'server-only';
import type { Transaction } from 'sequelize';
import { initModels } from '@/models';
import type { User } from '@/models/User';
import { siteUrl } from '@/lib/site';
import { enqueue } from './outbox';
import { renderMail, type MailContent } from './templates';
import { mailInUnits } from './units';
import { unsubscribeHeaders, unsubscribePageUrl, type UnsubscribeScope } from './unsubscribe';

/**
 * Notifications: each is queued in the outbox inside the transaction of the event it
 * reports, so the event and its message commit together or not at all. A member
 * who switched a kind off in settings, has not confirmed their address, or caused
 * the event themselves gets nothing.
 */
type Switch = 'notifyAnswers' | 'notifyReplies' | 'notifyFixed' | 'notifyModeration' | 'notifyExpert';
const SCOPE_OF: Record<Switch, Exclude<UnsubscribeScope, 'digest' | 'all'>> = {
  notifyAnswers: 'answers',
  notifyReplies: 'replies',
  notifyFixed: 'fixed',
  notifyModeration: 'moderation',
  notifyExpert: 'expert',
};

/**
 * At most this many characters of a member's words are quoted in a message: enough to
 * recognise the post, while the advice itself is read in the thread, where a
 * moderator can still withdraw it.
 */
const QUOTE_CHARS = 200;

export function excerpt(text: string, max = QUOTE_CHARS): string {
  const t = text.replace(/\r\n/g, '\n').trim();
  if (t.length <= max) return t;
  const cut = t.slice(0, max);
  const space = cut.lastIndexOf(' ');
  return `${cut.slice(0, space > max * 0.6 ? space : max)}…`;
}

async function recipient(
  userId: number,
  actorId: number | null,
  flag: Switch,
  transaction: Transaction,
): Promise<User | null> {
  if (userId === actorId) return null;
  const u = await initModels().User.findByPk(userId, { transaction });
  if (!u || !u.emailVerifiedAt || !u[flag]) return null;
  return u;
}

async function queue(
  key: string,
  kind: string,
  to: User,
  flag: Switch,
  content: Omit<MailContent, 'footer'> & { reason: string },
  transaction: Transaction,
) {
  const scope = SCOPE_OF[flag];
  const { reason, ...rest } = content;
  const mail = await renderMail({
    ...mailInUnits(rest, to.units),
    footer: {
      reason,
      settingsUrl: `${siteUrl()}/settings#email`,
      unsubscribe: { label: 'Stop these e-mails', url: unsubscribePageUrl(to.id, scope) },
    },
  });
  await enqueue(
    [
      {
        key,
        userId: to.id,
        to: to.email,
        kind,
        subject: mail.subject,
        text: mail.text,
        html: mail.html,
        headers: unsubscribeHeaders(to.id, scope),
      },
    ],
    transaction,
  );
}

const threadUrl = (questionId: number, anchor?: string) =>
  `${siteUrl()}/questions/${questionId}${anchor ? `#${anchor}` : ''}`;

/** An answer to your question. */
export async function notifyAnswer(
  transaction: Transaction,
  a: { answerId: number; questionId: number; authorId: number; body: string },
) {
  const { Question, User } = initModels();
  const q = await Question.findByPk(a.questionId, { attributes: ['id', 'title', 'authorId'], transaction });
  if (!q) return;
  const to = await recipient(q.authorId, a.authorId, 'notifyAnswers', transaction);
  if (!to) return;
  const by = (await User.findByPk(a.authorId, { attributes: ['displayName'], transaction }))?.displayName ?? 'A member';
  await queue(
    `answer:${a.answerId}:to:${to.id}`,
    'answer',
    to,
    'notifyAnswers',
    {
      subject: `New answer: ${q.title}`,
      preview: `${by} answered your question.`,
      heading: 'Your question has a new answer',
      paragraphs: [`${by} answered “${q.title}”.`],
      quote: { by, text: excerpt(a.body) },
      action: { label: 'Read the answer', url: threadUrl(q.id, `answer-${a.answerId}`) },
      reason: 'You get this because you asked this question on Clackwater.',
    },
    transaction,
  );
}

/** A reply to your post: the reply it answers, else the answer it sits under, else the question. */
export async function notifyReply(
  transaction: Transaction,
  r: {
    replyId: number;
    questionId: number;
    authorId: number;
    body: string;
    answerId: number | null;
    replyToId: number | null;
  },
) {
  const { Question, Answer, Reply, User } = initModels();
  const q = await Question.findByPk(r.questionId, { attributes: ['id', 'title', 'authorId'], transaction });
  if (!q) return;
  let ownerId = q.authorId;
  let what = 'your question';
  if (r.replyToId) {
    const parent = await Reply.findByPk(r.replyToId, { attributes: ['authorId'], transaction });
    if (parent) [ownerId, what] = [parent.authorId, 'your reply'];
  } else if (r.answerId) {
    const parent = await Answer.findByPk(r.answerId, { attributes: ['authorId'], transaction });
    if (parent) [ownerId, what] = [parent.authorId, 'your answer'];
  }
  const to = await recipient(ownerId, r.authorId, 'notifyReplies', transaction);
  if (!to) return;
  const by = (await User.findByPk(r.authorId, { attributes: ['displayName'], transaction }))?.displayName ?? 'A member';
  await queue(
    `reply:${r.replyId}:to:${to.id}`,
    'reply',
    to,
    'notifyReplies',
    {
      subject: `New reply: ${q.title}`,
      preview: `${by} replied to ${what}.`,
      heading: `A reply to ${what}`,
      paragraphs: [`${by} replied to ${what} in “${q.title}”.`],
      quote: { by, text: excerpt(r.body) },
      action: { label: 'Read the reply', url: threadUrl(q.id, `reply-${r.replyId}`) },
      reason: 'You get this because you wrote the post this replies to.',
    },
    transaction,
  );
}

/** The asker chose your answer as the one that fixed it. */
export async function notifyFixed(
  transaction: Transaction,
  f: { questionId: number; answerId: number; askerId: number; whatFixedIt: string },
) {
  const { Question, Answer, User } = initModels();
  const [q, a] = await Promise.all([
    Question.findByPk(f.questionId, { attributes: ['id', 'title'], transaction }),
    Answer.findByPk(f.answerId, { attributes: ['id', 'authorId'], transaction }),
  ]);
  if (!q || !a) return;
  const to = await recipient(a.authorId, f.askerId, 'notifyFixed', transaction);
  if (!to) return;
  const by = (await User.findByPk(f.askerId, { attributes: ['displayName'], transaction }))?.displayName ?? 'The asker';
  await queue(
    `fixed:${q.id}:${a.id}:to:${to.id}`,
    'fixed',
    to,
    'notifyFixed',
    {
      subject: `Your answer fixed it: ${q.title}`,
      preview: `${by} marked your answer as the one that fixed it.`,
      heading: 'Your answer fixed it',
      paragraphs: [
        `${by} marked your answer to “${q.title}” as the one that fixed it. It now shows first in the thread, for the next builder with the same trouble.`,
        `What fixed it, in ${by}’s words: “${f.whatFixedIt}”`,
      ],
      action: { label: 'Open the thread', url: threadUrl(q.id, `answer-${a.id}`) },
      reason: 'You get this because you answered this question on Clackwater.',
    },
    transaction,
  );
}

/** A moderator acted on your post (not sent for a dismissed flag: nothing changed). */
export async function notifyModeration(
  transaction: Transaction,
  m: {
    auditId: number;
    authorId: number;
    moderatorId: number;
    words: string;
    reason: string;
    questionId: number | null;
    postLabel: string;
    /** the post's place in its thread ("answer-12"), so the link opens at it */
    anchor?: string;
    /** the author still sees the post, marked, and may ask for a review from it */
    appealable?: boolean;
  },
) {
  const to = await recipient(m.authorId, m.moderatorId, 'notifyModeration', transaction);
  if (!to) return;
  const title = m.questionId
    ? (await initModels().Question.findByPk(m.questionId, { attributes: ['title'], transaction }))?.title
    : null;
  await queue(
    `moderation:${m.auditId}:to:${to.id}`,
    'moderation',
    to,
    'notifyModeration',
    {
      subject: `${m.words} on Clackwater`,
      preview: `${m.words}. Reason: ${m.reason}`,
      heading: m.words,
      paragraphs: [
        title ? `This concerns ${m.postLabel} in “${title}”.` : `This concerns ${m.postLabel}.`,
        `The moderator’s reason: ${m.reason}`,
        m.appealable
          ? 'Your notices in Settings keep a copy. You still see the post in the thread, marked with this reason; if you think this was a mistake, ask the moderators to review the decision from there.'
          : 'Your notices in Settings keep a copy.',
      ],
      action: m.questionId
        ? { label: 'Open the thread', url: threadUrl(m.questionId, m.anchor) }
        : { label: 'Open your settings', url: `${siteUrl()}/settings` },
      reason: 'You get this because a moderator acted on something you posted.',
    },
    transaction,
  );
}

/**
 * An answer hidden as unsafe advice: the asker and the thread's followers may have read
 * it by e-mail, so each gets one short follow-up (keyed per answer and recipient, so a
 * second hide sends nothing more). It names the thread but never repeats the advice.
 */
export async function notifyWithdrawn(
  transaction: Transaction,
  w: { answerId: number; questionId: number; answerAuthorId: number; moderatorId: number },
) {
  const { Question, QuestionFollow } = initModels();
  const q = await Question.findByPk(w.questionId, { attributes: ['id', 'title', 'authorId'], transaction });
  if (!q) return;
  const follows = await QuestionFollow.findAll({ where: { questionId: q.id }, attributes: ['userId'], transaction });
  const ids = [...new Set([q.authorId, ...follows.map((f) => f.userId)])].filter((id) => id !== w.moderatorId);
  for (const id of ids) {
    const to = await recipient(id, w.answerAuthorId, 'notifyAnswers', transaction);
    if (!to) continue;
    await queue(
      `withdrawn:answer:${w.answerId}:to:${to.id}`,
      'withdrawn',
      to,
      'notifyAnswers',
      {
        subject: `Advice withdrawn as unsafe: ${q.title}`,
        preview: 'A moderator withdrew an answer in this thread as unsafe advice.',
        heading: 'An answer was withdrawn as unsafe',
        paragraphs: [
          `A moderator withdrew an answer in “${q.title}” as unsafe advice. If you read it in an earlier e-mail, please do not follow it.`,
          'The thread shows the answers that still stand.',
        ],
        action: { label: 'Open the thread', url: threadUrl(q.id) },
        reason: 'You get this because you asked or follow this question on Clackwater.',
      },
      transaction,
    );
  }
}

/** A moderator decided your expert application. */
export async function notifyExpertDecision(
  transaction: Transaction,
  d: { applicationId: number; applicantId: number; moderatorId: number; approved: boolean; note: string },
) {
  const to = await recipient(d.applicantId, d.moderatorId, 'notifyExpert', transaction);
  if (!to) return;
  await queue(
    `expert-decision:${d.applicationId}:to:${to.id}`,
    'expert-decision',
    to,
    'notifyExpert',
    {
      subject: d.approved ? 'You are now an expert on Clackwater' : 'Your expert application on Clackwater',
      preview: d.approved
        ? 'Your application for expert standing was approved.'
        : 'Your application for expert standing was declined this time.',
      heading: d.approved ? 'Your expert application was approved' : 'Your expert application was declined this time',
      paragraphs: d.approved
        ? [
            'You can now record safety checks on guides, and your answers carry the expert mark.',
            `The moderator wrote: ${d.note}`,
          ]
        : [`The moderator wrote: ${d.note}`, 'You can apply again later from your settings page.'],
      action: { label: 'Open your settings', url: `${siteUrl()}/settings` },
      reason: 'You get this because you applied for expert standing on Clackwater.',
    },
    transaction,
  );
}
