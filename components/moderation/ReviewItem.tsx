'use client';

import Link from 'next/link';
import { MemberText } from '@/components/posts/MemberText';
import { FLAG_REASON_WORDS, type FlagReason, type PostType } from './words';
import { ActionPanel } from './ActionPanel';
import { can, MODERATING, REFUSAL, type Role } from '@/lib/auth/policy';
import { formatDateTime } from '@/lib/dates';

/** One entry of GET /api/review. */
export interface ReviewItemView {
  post: {
    type: PostType;
    id: number;
    questionId: number;
    questionTitle: string;
    body: string;
    author: { id: number; handle: string; displayName: string; role: Role } | null;
    hiddenAt: string | null;
    hiddenReason?: string | null;
    deletedAt: string | null;
    createdAt: string;
    /** a question's thread lock */
    lockedAt?: string | null;
    tags?: string[];
    /** a flagged photo's public id: the queue shows it even while hidden */
    photoId?: string | null;
  };
  /** an author's request to look again at a decision: an item of its own */
  appeal?: { id: number; text: string; by: string; createdAt: string } | null;
  flags: {
    id: number;
    reason: FlagReason;
    note: string | null;
    flagger: { handle: string; displayName: string; role: string };
    createdAt: string;
  }[];
  revisions: { body: string; at: string; editor: string }[];
}

const when = formatDateTime;

/** A flagged post in context: where it sits, who wrote it, who flagged it and why, how it changed. */
export function ReviewItem({
  item,
  viewer,
  onDone,
}: {
  item: ReviewItemView;
  viewer: { id: number; handle: string; role: Role };
  onDone: (message: string) => void;
}) {
  const { post, flags, revisions, appeal } = item;
  const authorName = post.author?.displayName ?? 'a removed member';
  const own = post.author?.id === viewer.id;
  const flaggedByMe = flags.some((f) => f.flagger.handle === viewer.handle);
  // the server refuses the same; saying so here spares a moderator a form that cannot succeed
  const outranked = post.author ? !can(viewer, MODERATING[post.author.role]) : false;
  const where = {
    question: 'Question',
    answer: 'Answer on',
    reply: 'Reply on',
    photo: 'Photo on',
    'field-log': 'Field log entry',
  }[post.type];

  return (
    <article
      className="cw-card flex flex-col gap-3"
      aria-label={appeal ? `Appeal on a ${post.type} by ${authorName}` : `Flagged ${post.type} by ${authorName}`}
      data-review-item={`${post.type}:${post.id}`}
      data-review-kind={appeal ? 'appeal' : 'flags'}
      id={`${appeal ? 'appeal' : 'review'}-${post.type}-${post.id}`}
      tabIndex={-1}
    >
      <header className="flex flex-col gap-1 font-sans">
        <p className="text-sm">
          {where}{' '}
          {post.type === 'field-log' ? (
            <Link href={`/field-log/${post.id}`} className="cw-link font-semibold">
              {`entry ${post.id}`}
            </Link>
          ) : (
            <Link href={`/questions/${post.questionId}`} className="cw-link font-semibold">
              {post.questionTitle || `question ${post.questionId}`}
            </Link>
          )}
        </p>
        <p className="cw-muted text-xs">
          by{' '}
          {post.author ? (
            <Link href={`/people/${post.author.handle}`} className="cw-link">
              {post.author.displayName}
            </Link>
          ) : (
            authorName
          )}{' '}
          · posted {when(post.createdAt)}
          {post.tags?.length ? ` · tags: ${post.tags.join(', ')}` : null}
        </p>
        <p className="flex flex-wrap gap-2 text-xs font-semibold">
          {post.hiddenAt ? (
            <span className="rounded bg-signal-100 px-1.5 py-0.5 text-creek-900 dark:bg-signal-900 dark:text-signal-100">
              hidden since {when(post.hiddenAt)}
            </span>
          ) : null}
          {post.deletedAt ? (
            <span className="rounded bg-clay-200 px-1.5 py-0.5 text-clay-700 dark:bg-clay-700 dark:text-limestone-50">
              deleted {when(post.deletedAt)}
            </span>
          ) : null}
          {!post.hiddenAt && !post.deletedAt ? <span className="cw-muted font-normal">shown to readers</span> : null}
        </p>
      </header>

      <section aria-label="The post" className="rounded-md border-l-4 border-limestone-300 pl-3 dark:border-creek-600">
        {post.photoId ? (
          <figure className="flex flex-col gap-1">
            {/* moderators are served hidden photos too */}
            {/* eslint-disable-next-line @next/next/no-img-element */}
            <img
              src={`/api/photos/${post.photoId}`}
              alt={post.body || 'the flagged photo'}
              className="max-h-80 w-auto max-w-full rounded-md object-contain"
            />
            <figcaption className="cw-muted font-sans text-xs">
              {post.body ? `Description: ${post.body}` : 'No description given.'}
            </figcaption>
          </figure>
        ) : (
          <MemberText>{post.body}</MemberText>
        )}
      </section>

      {appeal ? (
        <section aria-label="Appeal" className="font-sans text-sm">
          <h3 className="font-semibold">The author asks for a review</h3>
          <p className="cw-muted text-xs">
            {appeal.by}, {when(appeal.createdAt)}
          </p>
          <MemberText>{appeal.text}</MemberText>
          <p className="cw-muted mt-1 text-xs">
            Restore the post to grant it, or dismiss to keep the decision; either way the author gets a notice with your
            reason.
          </p>
        </section>
      ) : null}
      {flags.length === 0 ? null : (
        <section aria-label="Flags" className="font-sans text-sm">
          <h3 className="font-semibold">{flags.length === 1 ? '1 flag' : `${flags.length} flags`}</h3>
          <ul className="mt-1 flex flex-col gap-1">
            {flags.map((f) => (
              <li key={f.id}>
                <span className="font-semibold">{FLAG_REASON_WORDS[f.reason] ?? f.reason}</span> —{' '}
                {f.flagger.displayName}
                {f.flagger.role !== 'member' ? ` (${f.flagger.role})` : ''}, {when(f.createdAt)}
                {f.note ? <q className="ml-1 italic">{f.note}</q> : null}
              </li>
            ))}
          </ul>
        </section>
      )}

      {revisions.length > 1 ? (
        <details className="font-sans text-sm">
          <summary className="cw-link cursor-pointer">Revision history ({revisions.length} versions)</summary>
          <ol className="mt-2 flex flex-col gap-3">
            {revisions.map((r, i) => (
              <li key={`${r.at}-${i}`} className="border-l-2 border-creek-200 pl-2">
                <p className="cw-muted text-xs">
                  {i === 0 ? 'First posted' : 'Edited'} by {r.editor}, {when(r.at)}
                </p>
                <MemberText>{r.body}</MemberText>
              </li>
            ))}
          </ol>
        </details>
      ) : (
        <p className="cw-muted font-sans text-xs">Never edited.</p>
      )}

      {own ? (
        <p className="cw-muted font-sans text-sm">This is your own post: another moderator decides it.</p>
      ) : flaggedByMe ? (
        <p className="cw-muted font-sans text-sm">You flagged this post yourself: another moderator decides it.</p>
      ) : outranked && post.author ? (
        <p className="cw-muted font-sans text-sm">{REFUSAL[MODERATING[post.author.role]]}</p>
      ) : (
        <ActionPanel post={post} authorName={authorName} onDone={onDone} />
      )}
    </article>
  );
}
