import type { Transaction } from 'sequelize';
import { initModels } from '@/models';
import { ForumError } from '@/lib/questions/errors';

export type { ModeratedType } from '@/lib/vocabulary';
import type { ModeratedType } from '@/lib/vocabulary';

/** What moderation needs of any post: its author, its words and its visibility. */
export interface ModeratedPost {
  id: number;
  authorId: number;
  body: string;
  hiddenAt: Date | null;
  hiddenReason: string | null;
  deletedAt: Date | null;
  createdAt: Date;
  update: (v: Record<string, unknown>, o: { transaction: Transaction }) => Promise<unknown>;
}

/** The thread a photo is shown in: its question's, or its answer's question's; null while unattached. */
export async function photoQuestionId(
  photo: { questionId: number | null; answerId: number | null },
  transaction?: Transaction,
): Promise<number | null> {
  if (photo.questionId !== null || photo.answerId === null) return photo.questionId;
  return (
    (await initModels().Answer.findByPk(photo.answerId, { attributes: ['questionId'], transaction }))?.questionId ??
    null
  );
}

/** The post (locked for update) and the question it belongs to. A photo's author is its uploader, its words its description. */
export async function loadPost(
  postType: ModeratedType,
  postId: number,
  transaction: Transaction,
): Promise<{ post: ModeratedPost; questionId: number | null }> {
  const { Question, Answer, Reply, Photo, FieldLogEntry } = initModels();
  if (postType === 'field-log') {
    // an entry belongs to no thread; its words are its site, its measurements and its notes
    const entry = await FieldLogEntry.findByPk(postId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!entry) throw new ForumError(404, 'no such field log entry', 'postId');
    const post: ModeratedPost = {
      id: entry.id,
      authorId: entry.authorId,
      body: `Field log: ${entry.siteName} (${entry.testedOn}). ${entry.notes}`.trim(),
      hiddenAt: entry.hiddenAt ?? null,
      hiddenReason: entry.hiddenReason ?? null,
      deletedAt: entry.deletedAt ?? null,
      createdAt: entry.createdAt,
      update: (v, o) => entry.update(v, o),
    };
    return { post, questionId: null };
  }
  if (postType === 'photo') {
    const photo = await Photo.findByPk(postId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!photo) throw new ForumError(404, 'no such photo', 'postId');
    const questionId = await photoQuestionId(photo, transaction);
    const post: ModeratedPost = {
      id: photo.id,
      authorId: photo.ownerId,
      body: photo.alt ? `Photo: ${photo.alt}` : 'A photo without a description',
      hiddenAt: photo.hiddenAt ?? null,
      hiddenReason: photo.hiddenReason ?? null,
      deletedAt: photo.deletedAt ?? null,
      createdAt: photo.createdAt,
      update: (v, o) => photo.update(v, o),
    };
    return { post, questionId };
  }
  const model = { question: Question, answer: Answer, reply: Reply }[postType] as unknown as typeof Answer;
  const post = (await model.findByPk(postId, { transaction, lock: transaction.LOCK.UPDATE })) as unknown as
    (ModeratedPost & { questionId?: number }) | null;
  if (!post) throw new ForumError(404, `no such ${postType}`, 'postId');
  const questionId = postType === 'question' ? post.id : (post.questionId as number);
  return { post, questionId };
}
