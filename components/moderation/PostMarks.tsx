import { Caution } from '@/components/Caution';
import type { PostType } from '@/lib/vocabulary';
import { AppealForm } from './AppealForm';

/**
 * What a thread shows about a post's review state, above its text: an amber caution
 * while an "unsafe advice" flag is open, and — for moderators, the only readers who
 * receive such posts — whether it is hidden or deleted. Its author, the one other reader
 * of their hidden post, reads it marked with the moderator's reason.
 */
export function PostMarks({
  post,
  kind,
}: {
  post: {
    id: number;
    cautionUnsafe: boolean;
    hiddenAt: string | null;
    hiddenReason?: string | null;
    ownPost?: boolean;
    inQueue?: boolean;
    deletedAt: string | null;
  };
  kind: PostType;
}) {
  if (!post.cautionUnsafe && !post.hiddenAt && !post.deletedAt && !post.inQueue) return null;
  return (
    <>
      {post.inQueue ? (
        <p className="font-sans text-sm" data-testid="in-review-queue">
          <a href={`/review#review-${kind}-${post.id}`} className="cw-link font-semibold">
            Flagged: act on it in the review queue
          </a>
        </p>
      ) : null}
      {post.hiddenAt || post.deletedAt ? (
        <p className="flex gap-2 self-start font-sans text-xs font-semibold" data-testid="moderation-state">
          {post.hiddenAt ? (
            <span className="rounded bg-signal-100 px-1.5 py-0.5 text-creek-900 dark:bg-signal-900 dark:text-signal-100">
              {post.ownPost
                ? `hidden — only you and the moderators see your ${kind}`
                : `hidden — only moderators see this ${kind}`}
            </span>
          ) : null}
          {post.deletedAt ? (
            <span className="rounded bg-clay-200 px-1.5 py-0.5 text-clay-700 dark:bg-clay-700 dark:text-limestone-50">
              deleted — only moderators see this {kind}
            </span>
          ) : null}
        </p>
      ) : null}
      {post.hiddenAt && post.hiddenReason ? (
        <p className="font-sans text-sm" data-testid="hidden-reason">
          <span className="font-semibold">Why it is hidden:</span> {post.hiddenReason}
        </p>
      ) : null}
      {post.hiddenAt && post.ownPost && !post.deletedAt ? <AppealForm postType={kind} postId={post.id} /> : null}
      {post.cautionUnsafe ? (
        <Caution title="Flagged as unsafe advice">
          A member has flagged this {kind} as possibly unsafe, and a moderator will review it. Until then, check it
          against the guides and local codes, and ask a licensed plumber or engineer before relying on it.
        </Caution>
      ) : null}
    </>
  );
}
