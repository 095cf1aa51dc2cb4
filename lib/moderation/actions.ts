import { Op } from 'sequelize';
import { getSequelize } from '@/lib/db';
import { initModels } from '@/models';
import { ForumError } from '@/lib/questions/errors';
import type { SessionUser } from '@/lib/auth/session';
import { can, MODERATING, REFUSAL, type Actor, type Role } from '@/lib/auth/policy';
import { recordAudit } from './audit';
import { notifyModeration, notifyWithdrawn } from '@/lib/mail/notify';
import { postsChanged } from '@/lib/questions/after-write';
import { loadPost, type ModeratedType } from './posts';
import { whyNotApplicable } from './applicable';
import { QUESTION_ONLY_ACTIONS } from '@/lib/vocabulary';
import { bumpSessionVersion } from '@/lib/auth/session-version';

export { MODERATION_ACTIONS, type ModerationAction } from '@/lib/vocabulary';
import type { ModerationAction } from '@/lib/vocabulary';
import { formatDate } from '@/lib/dates';

const WORDS: Record<ModerationAction, string> = {
  dismiss: 'The flags on your post were reviewed and dismissed',
  hide: 'A moderator hid your post',
  restore: 'A moderator restored your post',
  delete: 'A moderator removed your post',
  lock: 'A moderator locked your thread',
  unlock: 'A moderator unlocked your thread',
  retag: 'A moderator changed the tags on your question',
  warn: 'A moderator warned you about a post',
  suspend: 'A moderator suspended your account',
};

const POST_LABEL: Record<ModeratedType, string> = {
  question: 'your question',
  answer: 'your answer',
  reply: 'your reply',
  photo: 'a photo you added',
  'field-log': 'your field log entry',
};

/** Refuses acting on an account of equal or higher rank (a moderator on a moderator or an admin, anyone on an admin). */
export function checkRank(actor: Actor, targetRole: Role): void {
  const action = MODERATING[targetRole];
  if (!can(actor, action)) throw new ForumError(403, REFUSAL[action]);
}

/**
 * Takes one moderation action. The change, the flags it settles, its audit row and
 * the author's notice are one transaction: no action without its audit row.
 */
export async function moderate(
  moderator: SessionUser,
  input: {
    action: ModerationAction;
    postType: ModeratedType;
    postId: number;
    reason: string;
    tags?: string[];
    until?: string;
  },
) {
  const { Flag, Question, QuestionTag, Tag, User, Notice, Appeal } = initModels();
  const done = await getSequelize().transaction(async (transaction) => {
    const { post, questionId } = await loadPost(input.postType, input.postId, transaction);
    if (post.authorId === moderator.id) throw new ForumError(403, 'Moderators cannot act on their own posts.');
    const author = await User.findByPk(post.authorId, { attributes: ['id', 'role'], transaction });
    if (author) checkRank(moderator, author.role);
    const ownFlag = await Flag.findOne({
      where: { postType: input.postType, postId: input.postId, flaggerId: moderator.id, status: 'open' },
      transaction,
    });
    if (ownFlag)
      throw new ForumError(403, 'Moderators cannot act on a post they flagged themselves; another moderator will.');
    // the panel offers only the actions that fit; a request for another (a stale page, a script) is refused
    const unfit = whyNotApplicable(input.action, {
      type: input.postType,
      hiddenAt: post.hiddenAt,
      hiddenReason: post.hiddenReason,
      deletedAt: post.deletedAt,
      lockedAt: input.postType === 'question' ? ((post as { lockedAt?: Date | null }).lockedAt ?? null) : undefined,
    });
    if (unfit) {
      const field =
        QUESTION_ONLY_ACTIONS.includes(input.action) && input.postType !== 'question' ? 'postType' : 'action';
      throw new ForumError(422, `${field}: ${unfit}`, field);
    }
    const now = new Date();
    const details: Record<string, unknown> = { questionId };
    const settleFlags = (status: 'dismissed' | 'upheld') =>
      Flag.update(
        { status, resolvedBy: moderator.id, resolvedAt: now },
        { where: { postType: input.postType, postId: input.postId, status: 'open' }, transaction },
      );

    switch (input.action) {
      case 'dismiss':
        await settleFlags('dismissed');
        if (post.hiddenAt && /pending review/.test(post.hiddenReason ?? ''))
          await post.update({ hiddenAt: null, hiddenReason: null }, { transaction });
        break;
      case 'hide': {
        // asked before the flags settle; upheld ones count too, so a hide after a restore still knows
        const unsafe =
          input.postType === 'answer' &&
          (await Flag.count({
            where: {
              postType: 'answer',
              postId: input.postId,
              reason: 'unsafe',
              status: { [Op.in]: ['open', 'upheld'] },
            },
            transaction,
          })) > 0;
        await post.update({ hiddenAt: now, hiddenReason: input.reason }, { transaction });
        await settleFlags('upheld');
        if (unsafe && questionId)
          await notifyWithdrawn(transaction, {
            answerId: input.postId,
            questionId,
            answerAuthorId: post.authorId,
            moderatorId: moderator.id,
          });
        break;
      }
      case 'restore':
        await post.update({ hiddenAt: null, hiddenReason: null, deletedAt: null }, { transaction });
        await settleFlags('dismissed');
        break;
      case 'delete':
        await post.update({ deletedAt: now }, { transaction });
        await settleFlags('upheld');
        break;
      case 'lock':
      case 'unlock': {
        if (input.postType !== 'question')
          throw new ForumError(422, 'postType: only a question’s thread can be locked', 'postType');
        await Question.update(
          { lockedAt: input.action === 'lock' ? now : null },
          { where: { id: input.postId }, transaction },
        );
        break;
      }
      case 'retag': {
        if (input.postType !== 'question') throw new ForumError(422, 'postType: only questions have tags', 'postType');
        const slugs = [...new Set(input.tags ?? [])];
        if (slugs.length < 1 || slugs.length > 5) throw new ForumError(422, 'tags: choose one to five', 'tags');
        const tags = await Tag.findAll({ where: { slug: { [Op.in]: slugs } }, transaction });
        if (tags.length !== slugs.length) throw new ForumError(422, 'tags: one of these is not a tag', 'tags');
        const before = await QuestionTag.findAll({ where: { questionId: input.postId }, transaction });
        details.tagsBefore = before.map((t) => t.tagId);
        await QuestionTag.destroy({ where: { questionId: input.postId }, transaction });
        await QuestionTag.bulkCreate(
          tags.map((t) => ({ questionId: input.postId, tagId: t.id })),
          { transaction },
        );
        details.tags = slugs;
        break;
      }
      case 'warn':
        break;
      case 'suspend': {
        const until = input.until ? new Date(`${input.until}T23:59:59Z`) : null;
        if (!until || Number.isNaN(until.getTime()) || until <= now)
          throw new ForumError(422, 'until: the suspension must end on a date after today', 'until');
        await User.update({ suspendedUntil: until }, { where: { id: post.authorId }, transaction });
        await bumpSessionVersion(post.authorId, transaction);
        details.until = until.toISOString();
        break;
      }
    }
    // the action is the moderator's answer to any appeal waiting on this post
    const [appealsDecided] = await Appeal.update(
      { status: 'decided', resolvedBy: moderator.id, resolvedAt: now },
      { where: { postType: input.postType, postId: input.postId, status: 'open' }, transaction },
    );
    const audit = await recordAudit(
      {
        actorId: moderator.id,
        action: input.action,
        targetType: input.action === 'warn' || input.action === 'suspend' ? 'member' : input.postType,
        targetId: input.action === 'warn' || input.action === 'suspend' ? post.authorId : input.postId,
        reason: input.reason,
        details: { ...details, postType: input.postType, postId: input.postId },
      },
      transaction,
    );
    // a dismissal answering an appeal keeps the decision, and the author who asked hears so
    const words =
      input.action === 'dismiss' && appealsDecided > 0
        ? 'A moderator reviewed your request and kept the decision'
        : WORDS[input.action];
    const untilWords = input.action === 'suspend' ? ` until ${formatDate(details.until as string)}` : '';
    await Notice.create(
      {
        userId: post.authorId,
        kind: 'moderation',
        message: `${words}${untilWords}. Reason: ${input.reason}`,
        link: questionId ? `/questions/${questionId}` : null,
        readAt: null,
      },
      { transaction },
    );
    if (input.action !== 'dismiss' || appealsDecided > 0) {
      await notifyModeration(transaction, {
        auditId: audit.id,
        authorId: post.authorId,
        moderatorId: moderator.id,
        words,
        reason: input.reason,
        questionId,
        postLabel: POST_LABEL[input.postType],
        anchor:
          input.postType === 'answer' || input.postType === 'reply' ? `${input.postType}-${input.postId}` : undefined,
        appealable: input.action === 'hide' && (input.postType === 'answer' || input.postType === 'reply'),
      });
    }
    return { auditId: audit.id, questionId };
  });
  // hide, restore, delete and retag change what search shows: the thread is reindexed now
  await postsChanged({
    questionId: done.questionId,
    fieldLogEntryId: input.postType === 'field-log' ? input.postId : null,
  });
  return { auditId: done.auditId };
}
