import { Op } from 'sequelize';
import { postsChanged } from '@/lib/questions/after-write';
import { getSequelize } from '@/lib/db';
import { initModels } from '@/models';
import { ForumError } from '@/lib/questions/errors';
import type { SessionUser } from '@/lib/auth/session';
import { can } from '@/lib/auth/policy';
import { NEW_MEMBER_DAYS } from '@/lib/accounts/new-member';
import type { FlagReason } from '@/models/Flag';
import { recordAudit } from './audit';
import { loadPost, type ModeratedType } from './posts';

/** Open flags that hide a post pending review; FLAG_HIDE_THRESHOLD overrides it. */
export function hideThreshold(): number {
  const n = Number(process.env.FLAG_HIDE_THRESHOLD ?? 3);
  return Number.isInteger(n) && n > 0 ? n : 3;
}

/**
 * A flag counts toward hiding a post by itself only when its author has confirmed
 * their e-mail and has been a member this long: a handful of throwaway accounts
 * can still bring a post to the queue, but cannot take it down.
 */
export const FLAG_COUNTS_AFTER_DAYS = NEW_MEMBER_DAYS;

/**
 * One open flag per member per post. A post reaching the threshold of open flags
 * from established accounts (confirmed, older than FLAG_COUNTS_AFTER_DAYS), or
 * flagged unsafe by an expert, is hidden pending review — in the same
 * transaction, with its audit row. Members' flags never hide an expert's,
 * moderator's or admin's post, and an expert's never a moderator's or admin's:
 * those wait in the queue, visible, for a moderator.
 */
export async function flagPost(
  user: SessionUser,
  input: { postType: ModeratedType; postId: number; reason: FlagReason; note?: string },
) {
  const { Flag, User } = initModels();
  const out = await getSequelize().transaction(async (transaction) => {
    const { post, questionId } = await loadPost(input.postType, input.postId, transaction);
    if (post.authorId === user.id) throw new ForumError(403, 'You cannot flag your own post.');
    const mine = await Flag.findOne({
      where: { postType: input.postType, postId: input.postId, flaggerId: user.id, status: 'open' },
      transaction,
    });
    if (mine) throw new ForumError(409, 'You have already flagged this post; a moderator will look at it.');
    const flag = await Flag.create(
      {
        postType: input.postType,
        postId: input.postId,
        flaggerId: user.id,
        reason: input.reason,
        note: input.note ?? null,
      },
      { transaction },
    );
    const open = await Flag.count({
      where: { postType: input.postType, postId: input.postId, status: 'open' },
      include: [
        {
          model: User,
          as: 'flagger',
          attributes: [],
          required: true,
          where: {
            emailVerifiedAt: { [Op.ne]: null },
            createdAt: { [Op.lte]: new Date(Date.now() - FLAG_COUNTS_AFTER_DAYS * 86_400_000) },
          },
        },
      ],
      transaction,
    });
    const author = await User.findByPk(post.authorId, { attributes: ['id', 'role', 'suspendedUntil'], transaction });
    const byCount = open >= hideThreshold() && !(author && can(author, 'post.staysUpUnderMemberFlags'));
    const byExpert =
      input.reason === 'unsafe' &&
      can(user, 'flag.hideUnsafeAtOnce') &&
      !(author && can(author, 'post.staysUpUnderExpertFlag'));
    let hidden = false;
    if (!post.hiddenAt && !post.deletedAt && (byCount || byExpert)) {
      const why = byExpert
        ? 'flagged as unsafe advice by an expert; hidden pending review'
        : `${open} flags; hidden pending review`;
      await post.update({ hiddenAt: new Date(), hiddenReason: why }, { transaction });
      await recordAudit(
        {
          actorId: null,
          action: 'auto-hide',
          targetType: input.postType,
          targetId: input.postId,
          reason: why,
          details: { flagId: flag.id, openFlags: open },
        },
        transaction,
      );
      hidden = true;
    }
    return { flagId: flag.id, hidden, questionId };
  });
  // an open unsafe flag shows readers a caution, and a post hidden by flags leaves search
  await postsChanged({
    questionId: out.questionId,
    fieldLogEntryId: input.postType === 'field-log' ? input.postId : null,
    reindex: out.hidden,
  });
  return { flagId: out.flagId, hidden: out.hidden };
}
