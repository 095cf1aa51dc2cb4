import type { Transaction } from 'sequelize';
import { initModels } from '@/models';
import { ForumError } from '@/lib/forum/errors';

export type ModeratedType = 'question' | 'answer' | 'reply';

/** The post (locked for update) and the question it belongs to. */
export async function loadPost(postType: ModeratedType, postId: number, transaction: Transaction) {
  const { Question, Answer, Reply } = initModels();
  const model = { question: Question, answer: Answer, reply: Reply }[postType] as unknown as typeof Answer;
  const post = (await model.findByPk(postId, { transaction, lock: transaction.LOCK.UPDATE })) as unknown as {
    id: number;
    authorId: number;
    body: string;
    hiddenAt: Date | null;
    hiddenReason: string | null;
    deletedAt: Date | null;
    questionId?: number;
    createdAt: Date;
    update: (v: Record<string, unknown>, o: { transaction: Transaction }) => Promise<unknown>;
  } | null;
  if (!post) throw new ForumError(404, `no such ${postType}`, 'postId');
  const questionId = postType === 'question' ? post.id : (post.questionId as number);
  return { post, questionId };
}
