import { QUESTION_ONLY_ACTIONS, type ModeratedType, type ModerationAction } from '@/lib/vocabulary';

/** What decides which actions make sense: the post's kind and its state. */
export interface PostState {
  type: ModeratedType;
  hiddenAt: Date | string | null;
  hiddenReason?: string | null;
  deletedAt: Date | string | null;
  /** a question's thread lock; unknown (undefined) for other posts */
  lockedAt?: Date | string | null;
}

/** The automatic hide's reason starts so (lib/moderation/flags.ts); a moderator may still confirm it. */
const PENDING = /pending review/;

/**
 * Why an action does not fit this post, or null when it does. Shared by the queue's
 * panel (which offers only the ones that fit) and the server (which refuses the rest),
 * so a restore is never offered for a post readers already see.
 */
export function whyNotApplicable(action: ModerationAction, post: PostState): string | null {
  if (QUESTION_ONLY_ACTIONS.includes(action) && post.type !== 'question')
    return action === 'retag' ? 'only questions have tags' : 'only a question’s thread can be locked';
  const hidden = !!post.hiddenAt;
  const deleted = !!post.deletedAt;
  switch (action) {
    case 'hide':
      if (deleted) return 'the post is deleted; restore it first';
      if (hidden && !PENDING.test(post.hiddenReason ?? '')) return 'the post is already hidden';
      return null;
    case 'restore':
      return hidden || deleted ? null : 'the post is already shown to readers';
    case 'delete':
      return deleted ? 'the post is already deleted' : null;
    case 'lock':
      return post.lockedAt ? 'the thread is already locked' : null;
    case 'unlock':
      return post.lockedAt === undefined || post.lockedAt ? null : 'the thread is not locked';
    default:
      return null;
  }
}

export function applicableActions(actions: readonly ModerationAction[], post: PostState): ModerationAction[] {
  return actions.filter((a) => whyNotApplicable(a, post) === null);
}
