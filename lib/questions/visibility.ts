import type { Transaction } from 'sequelize';
import { initModels } from '@/models';
import type { Question } from '@/models/Question';
import type { Answer } from '@/models/Answer';
import type { Reply } from '@/models/Reply';
import { can, type Actor } from '@/lib/auth/policy';
import { ForumError } from './errors';

import type { PostType } from '@/lib/vocabulary';
export type { PostType };
type Hideable = { hiddenAt?: Date | null; deletedAt?: Date | null };

/** Hidden (by a moderator or by flags) or soft-deleted: gone for all but moderators. */
export const isTakenDown = (p: Hideable | null | undefined): boolean => !!(p && (p.hiddenAt || p.deletedAt));

export interface FoundPost {
  question: Question;
  post: Question | Answer | Reply;
  /** the post or its thread is hidden or deleted (only ever true for a viewer who may see that) */
  takenDown: boolean;
}

interface FindOptions {
  /** an answer or reply must belong to this question */
  questionId?: number;
  transaction?: Transaction;
  /** which row to lock for update (within `transaction`): the thread's question, or the post itself */
  lock?: 'question' | 'post';
  /** the field a refusal names */
  field?: string;
}

const notFound = (postType: PostType, field: string) => new ForumError(404, `no such ${postType}`, field);

/**
 * A post and its thread as one reader may see them: the same rule as the thread page
 * (`loadThread`), so no side door (revisions, marks, follows, photos) shows more. A post
 * is visible when it and its question are neither hidden nor deleted; moderators
 * ('moderation.seeHidden') see everything, and an author may read their own hidden (not
 * deleted) answer or reply in a visible thread, so a hide never just makes their words vanish for them. Anything else is "not found", exactly as a
 * post that never existed. With `questionId`, an answer or reply must belong to it.
 * Locks follow `opts.lock`, one row only, so two writers never take them in opposite orders.
 */
export async function findVisiblePost(
  viewer: Actor | null,
  postType: PostType,
  postId: number,
  opts: FindOptions = {},
): Promise<FoundPost> {
  const { Question, Answer, Reply } = initModels();
  const { transaction } = opts;
  const field = opts.field ?? (postType === 'question' ? 'id' : 'postId');
  const lockFor = (what: 'question' | 'post') =>
    transaction && opts.lock === what ? transaction.LOCK.UPDATE : undefined;
  let post: Question | Answer | Reply | null;
  let questionId: number;
  if (postType === 'question') {
    if (opts.questionId !== undefined && opts.questionId !== postId) throw notFound(postType, field);
    post = null;
    questionId = postId;
  } else {
    const found = { transaction, lock: lockFor('post') };
    post = postType === 'answer' ? await Answer.findByPk(postId, found) : await Reply.findByPk(postId, found);
    if (!post || (opts.questionId !== undefined && post.questionId !== opts.questionId))
      throw notFound(postType, field);
    questionId = post.questionId as number;
  }
  const question = await Question.findByPk(questionId, {
    transaction,
    lock: postType === 'question' ? (lockFor('question') ?? lockFor('post')) : lockFor('question'),
  });
  if (!question) throw notFound(postType, field);
  const takenDown = isTakenDown(question) || isTakenDown(post);
  // answers and replies only: a hidden question takes its whole thread down, for its asker too
  const ownHidden = !!viewer && !!post && post.authorId === viewer.id && !post.deletedAt && !isTakenDown(question);
  if (takenDown && !ownHidden && !can(viewer, 'moderation.seeHidden')) throw notFound(postType, field);
  return { question, post: post ?? question, takenDown };
}

/**
 * As `findVisiblePost`, for a write: a moderator who can see a hidden or deleted post is
 * still refused (409), because answering, marking or following it would notify people
 * about words no one else can read; restoring it comes first.
 */
export async function findWritablePost(
  user: Actor,
  postType: PostType,
  postId: number,
  opts: FindOptions = {},
): Promise<FoundPost> {
  const found = await findVisiblePost(user, postType, postId, opts);
  // its author reads a hidden post but writes to it no more than anyone else who cannot see it
  if (found.takenDown && !can(user, 'moderation.seeHidden'))
    throw notFound(postType, opts.field ?? (postType === 'question' ? 'id' : 'postId'));
  if (found.takenDown) {
    const what = isTakenDown(found.question) ? 'This question' : `This ${postType}`;
    throw new ForumError(409, `${what} is hidden or deleted: restore it before anyone writes to it.`, opts.field);
  }
  return found;
}

/**
 * An answer or reply named in a request body (reply under it, choose it as fixed it):
 * one the writer cannot see is refused exactly as one that does not exist (422 naming
 * the field); a moderator who can see it is told it is hidden (409).
 */
export function namedInBody<T extends Hideable>(user: Actor, post: T | null, field: string, noSuch: string): T {
  if (!post || (isTakenDown(post) && !can(user, 'moderation.seeHidden'))) throw new ForumError(422, noSuch, field);
  if (isTakenDown(post))
    throw new ForumError(
      409,
      `${field}: that post is hidden or deleted: restore it before anyone writes to it.`,
      field,
    );
  return post;
}
