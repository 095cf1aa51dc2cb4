import type { Transaction } from 'sequelize';
import { notifyAnswer, notifyFixed, notifyReply } from '@/lib/mail/notify';
import { getSequelize } from '@/lib/db';
import { initModels } from '@/models';
import type { Answer } from '@/models/Answer';
import type { Reply } from '@/models/Reply';
import type { SessionUser } from '@/lib/auth/session';
import { can, REFUSAL } from '@/lib/auth/policy';
import { attachPhotos } from '@/lib/photos/store';
import { ForumError } from './errors';
import { validateSiteSheet } from '@/lib/calculators/site-sheet';
import { postsChanged, threadChanged } from './after-write';
import { findWritablePost, namedInBody, type PostType } from './visibility';
import { checkPostText } from './post-text';
import { saveWorkedCalculation, type NewWorkedCalculation } from '@/lib/calculations/store';
import { linkedSiteId } from '@/lib/sites/links';

/** Runs a write, then brings the thread's search documents and its cached page up to date (same request). */
async function thenIndex<T>(write: Promise<T>, questionId: (result: T) => number): Promise<T> {
  const result = await write;
  await postsChanged({ questionId: questionId(result) });
  return result;
}

/** Replies nest this deep; a reply to one at the cap joins its level instead (flattened). */
export const MAX_REPLY_DEPTH = 3;

async function tagIds(slugs: string[], transaction: Transaction) {
  const { Tag } = initModels();
  const tags = await Tag.findAll({ where: { slug: slugs }, transaction });
  const unknown = slugs.filter((s) => !tags.some((t) => t.slug === s));
  if (unknown.length) throw new ForumError(422, `tags: no tag called ${unknown.join(', ')}`, 'tags');
  return tags.map((t) => t.id);
}

export async function askQuestion(
  user: SessionUser,
  input: {
    title: string;
    body: string;
    tags: string[];
    siteSheet?: Record<string, string | undefined>;
    photoIds: string[];
    guide?: string;
    fieldLogEntryId?: number;
    siteId?: string;
  },
  outer?: Transaction,
) {
  checkPostText(user, 'question', input);
  const siteSheet = validateSiteSheet(input.siteSheet);
  const { Question, QuestionTag, Revision, QuestionFollow, FieldLogEntry } = initModels();
  const work = async (transaction: Transaction) => {
    const ids = await tagIds([...new Set(input.tags)], transaction);
    if (input.fieldLogEntryId !== undefined) {
      const entry = await FieldLogEntry.findOne({
        where: { id: input.fieldLogEntryId, hiddenAt: null, deletedAt: null },
        attributes: ['id'],
        transaction,
      });
      if (!entry) throw new ForumError(422, 'fieldLogEntryId: no such field log entry', 'fieldLogEntryId');
    }
    const siteId = await linkedSiteId(user, input.siteId, transaction);
    const now = new Date();
    const q = await Question.create(
      {
        authorId: user.id,
        title: input.title,
        body: input.body,
        answerCount: 0,
        fixedAnswerId: null,
        siteSheet,
        guideSlug: input.guide ?? null,
        fieldLogEntryId: input.fieldLogEntryId ?? null,
        siteId,
        lastActivityAt: now,
      },
      { transaction },
    );
    await QuestionTag.bulkCreate(
      ids.map((tagId) => ({ questionId: q.id, tagId })),
      { transaction },
    );
    await Revision.create(
      { postType: 'question', postId: q.id, editorId: user.id, title: q.title, body: q.body },
      { transaction },
    );
    await QuestionFollow.create({ questionId: q.id, userId: user.id }, { transaction });
    if (input.photoIds.length) {
      const n = await attachPhotos(input.photoIds, user.id, { questionId: q.id }, transaction);
      if (n !== input.photoIds.length)
        throw new ForumError(422, 'photoIds: a photo is not yours or is already attached', 'photoIds');
    }
    return q;
  };
  // in the caller's transaction (one that keeps an idempotency key), the caller brings the
  // thread up to date once it has committed: see questionAsked
  if (outer) return work(outer);
  return thenIndex(getSequelize().transaction(work), (q) => q.id);
}

/** After a question written in the caller's transaction has committed: search and cached pages. */
export async function questionAsked(questionId: number): Promise<void> {
  await postsChanged({ questionId });
}

/**
 * A locked thread is closed to its authors too: an edit could otherwise rewrite the
 * words a moderator locked it over. The lock binds moderators' own posts as well;
 * they unlock the thread first, so the change shows in the audit log.
 */
function refuseEditWhenLocked(q: { lockedAt?: Date | null }) {
  if (q.lockedAt) throw new ForumError(409, 'This thread is locked: its posts cannot be edited.');
}

/** The thread a write goes to, locked: not found for one who cannot see it, refused (409) when hidden. */
async function writableQuestion(user: SessionUser, id: number, transaction: Transaction) {
  return (await findWritablePost(user, 'question', id, { transaction, lock: 'question' })).question;
}

export async function editQuestion(
  user: SessionUser,
  id: number,
  input: { title: string; body: string; tags: string[]; siteSheet?: Record<string, string | undefined> },
) {
  const siteSheet = validateSiteSheet(input.siteSheet);
  const { QuestionTag, Revision } = initModels();
  const write = getSequelize().transaction(async (transaction) => {
    const q = await writableQuestion(user, id, transaction);
    if (!can(user, 'question.edit', q.authorId)) throw new ForumError(403, REFUSAL['question.edit']);
    refuseEditWhenLocked(q);
    checkPostText(user, 'question', input);
    const ids = await tagIds([...new Set(input.tags)], transaction);
    await q.update({ title: input.title, body: input.body, siteSheet }, { transaction });
    await QuestionTag.destroy({ where: { questionId: id }, transaction });
    await QuestionTag.bulkCreate(
      ids.map((tagId) => ({ questionId: id, tagId })),
      { transaction },
    );
    await Revision.create(
      { postType: 'question', postId: id, editorId: user.id, title: input.title, body: input.body },
      { transaction },
    );
    return q;
  });
  return thenIndex(write, (q) => q.id);
}

export async function postAnswer(
  user: SessionUser,
  questionId: number,
  input: { body: string; calculationId?: string; photoIds: string[] },
  /** a calculation from the answer form, already recomputed by the server; saved in the answer's transaction */
  newCalculation?: Omit<NewWorkedCalculation, 'authorId'>,
) {
  checkPostText(user, 'answer', input);
  const { Answer, WorkedCalculation, Revision } = initModels();
  const write = getSequelize().transaction(async (transaction) => {
    const q = await writableQuestion(user, questionId, transaction);
    if (q.lockedAt) throw new ForumError(409, 'This thread is locked: no new answers or replies.');
    let calculationId: number | null = null;
    if (newCalculation) {
      calculationId = (await saveWorkedCalculation({ ...newCalculation, authorId: user.id }, transaction)).id;
    } else if (input.calculationId) {
      const calc = await WorkedCalculation.findOne({ where: { publicId: input.calculationId }, transaction });
      if (!calc) throw new ForumError(422, 'calculationId: no worked calculation with that id', 'calculationId');
      calculationId = calc.id;
    }
    const a = await Answer.create({ questionId, authorId: user.id, body: input.body, calculationId }, { transaction });
    await Revision.create(
      { postType: 'answer', postId: a.id, editorId: user.id, title: null, body: a.body },
      { transaction },
    );
    if (input.photoIds.length) {
      const n = await attachPhotos(input.photoIds, user.id, { answerId: a.id }, transaction);
      if (n !== input.photoIds.length)
        throw new ForumError(422, 'photoIds: a photo is not yours or is already attached', 'photoIds');
    }
    await q.update({ answerCount: q.answerCount + 1, lastActivityAt: new Date() }, { transaction });
    await notifyAnswer(transaction, { answerId: a.id, questionId, authorId: user.id, body: a.body });
    return a;
  });
  return thenIndex(write, (a) => a.questionId);
}

export async function editPostBody(user: SessionUser, postType: 'answer' | 'reply', id: number, body: string) {
  const { Revision } = initModels();
  const write = getSequelize().transaction(async (transaction) => {
    const found = await findWritablePost(user, postType, id, { transaction, lock: 'post', field: 'id' });
    const post = found.post as Answer | Reply;
    const action = postType === 'answer' ? 'answer.edit' : 'reply.edit';
    if (!can(user, action, post.authorId)) throw new ForumError(403, REFUSAL[action]);
    refuseEditWhenLocked(found.question);
    checkPostText(user, postType, { body });
    post.body = body;
    await post.save({ transaction });
    await Revision.create({ postType, postId: id, editorId: user.id, title: null, body }, { transaction });
    return post;
  });
  return thenIndex(write, (post) => post.questionId);
}

export async function postReply(
  user: SessionUser,
  questionId: number,
  input: { body: string; answerId?: number; replyToId?: number },
) {
  checkPostText(user, 'reply', input);
  const { Answer, Reply, Revision } = initModels();
  const write = getSequelize().transaction(async (transaction) => {
    const q = await writableQuestion(user, questionId, transaction);
    if (q.lockedAt) throw new ForumError(409, 'This thread is locked: no new answers or replies.');
    let answerId: number | null = input.answerId ?? null;
    let depth = 0;
    let replyToId: number | null = null;
    if (input.replyToId) {
      const parent = namedInBody(
        user,
        await Reply.findOne({ where: { id: input.replyToId, questionId }, transaction }),
        'replyToId',
        'replyToId: no such reply in this thread',
      );
      answerId = parent.answerId;
      // Nesting is capped; past the cap a reply joins its parent's level (flattened).
      if (parent.depth + 1 > MAX_REPLY_DEPTH) {
        depth = parent.depth;
        replyToId = parent.replyToId;
      } else {
        depth = parent.depth + 1;
        replyToId = parent.id;
      }
    } else if (answerId) {
      namedInBody(
        user,
        await Answer.findOne({ where: { id: answerId, questionId }, transaction }),
        'answerId',
        'answerId: no such answer on this question',
      );
    }
    const r = await Reply.create(
      {
        questionId,
        parentType: answerId ? 'answer' : 'question',
        answerId,
        replyToId,
        depth,
        authorId: user.id,
        body: input.body,
      },
      { transaction },
    );
    await Revision.create(
      { postType: 'reply', postId: r.id, editorId: user.id, title: null, body: r.body },
      { transaction },
    );
    await q.update({ lastActivityAt: new Date() }, { transaction });
    await notifyReply(transaction, {
      replyId: r.id,
      questionId,
      authorId: user.id,
      body: r.body,
      answerId,
      replyToId: input.replyToId ?? null,
    });
    return r;
  });
  return thenIndex(write, (r) => r.questionId);
}

/** One helpful mark per member per post, never on one's own post; the post's count follows. */
export async function markHelpful(user: SessionUser, postType: PostType, postId: number, on: boolean) {
  const { HelpfulMark } = initModels();
  const out = await getSequelize().transaction(async (transaction) => {
    const { post, question } = await findWritablePost(user, postType, postId, { transaction, lock: 'post' });
    if (post.authorId === user.id) throw new ForumError(403, 'You cannot mark your own post helpful.');
    const existing = await HelpfulMark.findOne({ where: { postType, postId, userId: user.id }, transaction });
    if (on && existing) throw new ForumError(409, 'You have already marked this helpful.');
    if (!on && !existing) throw new ForumError(404, 'You have not marked this helpful.');
    if (on) await HelpfulMark.create({ postType, postId, userId: user.id }, { transaction });
    else await existing!.destroy({ transaction });
    const count = await HelpfulMark.count({ where: { postType, postId }, transaction });
    post.helpfulCount = count;
    await post.save({ transaction });
    return { count, questionId: question.id };
  });
  threadChanged(out.questionId);
  return out.count;
}

/**
 * The asker's choice of the answer that fixed it, with their one line saying what the
 * fix was (or none: `null` takes the choice back and clears the line). The mark, the
 * line and the mail to the answer's author are one transaction.
 */
export async function chooseFixed(
  user: SessionUser,
  questionId: number,
  choice: { answerId: number; whatFixedIt: string } | null,
) {
  const { Answer } = initModels();
  const write = getSequelize().transaction(async (transaction) => {
    const q = await writableQuestion(user, questionId, transaction);
    if (!can(user, 'question.markFixed', q.authorId)) throw new ForumError(403, REFUSAL['question.markFixed']);
    if (choice !== null) {
      namedInBody(
        user,
        await Answer.findOne({ where: { id: choice.answerId, questionId }, transaction }),
        'answerId',
        'answerId: no such answer on this question',
      );
    }
    const before = q.fixedAnswerId;
    await q.update(
      { fixedAnswerId: choice?.answerId ?? null, whatFixedIt: choice?.whatFixedIt ?? null },
      { transaction },
    );
    if (choice !== null && choice.answerId !== before)
      await notifyFixed(transaction, {
        questionId,
        answerId: choice.answerId,
        askerId: user.id,
        whatFixedIt: choice.whatFixedIt,
      });
    return q;
  });
  return thenIndex(write, (q) => q.id);
}

export async function setFollow(user: SessionUser, questionId: number, on: boolean) {
  const { QuestionFollow } = initModels();
  await findWritablePost(user, 'question', questionId);
  if (on) await QuestionFollow.findOrCreate({ where: { questionId, userId: user.id } });
  else await QuestionFollow.destroy({ where: { questionId, userId: user.id } });
  return on;
}
