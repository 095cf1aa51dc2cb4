import { getSequelize } from '@/lib/db';
import { initModels } from '@/models';
import { can, REFUSAL, type Actor } from '@/lib/auth/policy';
import { ForumError } from '@/lib/questions/errors';
import type { ModeratedType } from '@/lib/vocabulary';
import { loadPost } from './posts';

/**
 * An author asks the moderators to look again at the hide or removal of their post.
 * One open appeal per post: a second waits for the first to be decided.
 */
export async function submitAppeal(user: Actor, input: { postType: ModeratedType; postId: number; text: string }) {
  const { Appeal } = initModels();
  return getSequelize().transaction(async (transaction) => {
    const { post } = await loadPost(input.postType, input.postId, transaction);
    if (!can(user, 'moderation.appeal', post.authorId))
      throw new ForumError(403, REFUSAL['moderation.appeal'], 'postId');
    if (!post.hiddenAt && !post.deletedAt)
      throw new ForumError(422, 'postId: this post is shown to readers; there is no decision to review', 'postId');
    const open = await Appeal.findOne({
      where: { postType: input.postType, postId: input.postId, status: 'open' },
      transaction,
    });
    if (open)
      throw new ForumError(
        409,
        'postId: you have already asked for a review of this post; a moderator will decide it',
        'postId',
      );
    const appeal = await Appeal.create(
      { userId: user.id, postType: input.postType, postId: input.postId, text: input.text },
      { transaction },
    );
    return { id: appeal.id };
  });
}
