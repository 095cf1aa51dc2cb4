import type { Sequelize } from 'sequelize';
import { initModels } from '@/models';
import { demoQuestions, demoTags, demoUsers } from './demo-data';

const DAY = 86_400_000;

/**
 * Seeds the invented demo scenario in one transaction. Returns false and writes
 * nothing when the database already holds members (a second `npm start`).
 */
export async function seedDemo(sequelize: Sequelize, now = new Date()): Promise<boolean> {
  const { User, Tag, Question, Answer, QuestionTag } = initModels(sequelize);
  if ((await User.count()) > 0) return false;

  await sequelize.transaction(async (transaction) => {
    const users = await User.bulkCreate(
      demoUsers.map((u) => ({ ...u, createdAt: new Date(now.getTime() - 400 * DAY), updatedAt: now })),
      { transaction },
    );
    const userId = new Map(users.map((u) => [u.handle, u.id]));
    const tags = await Tag.bulkCreate([...demoTags], { transaction });
    const tagId = new Map(tags.map((t) => [t.slug, t.id]));

    for (const q of demoQuestions) {
      const createdAt = new Date(now.getTime() - q.daysAgo * DAY);
      const question = await Question.create(
        { authorId: must(userId, q.author), title: q.title, body: q.body, answerCount: q.answers.length, fixedAnswerId: null, createdAt, updatedAt: createdAt },
        { transaction },
      );
      await QuestionTag.bulkCreate(
        q.tags.map((slug) => ({ questionId: question.id, tagId: must(tagId, slug) })),
        { transaction },
      );
      for (const a of q.answers) {
        const at = new Date(createdAt.getTime() + a.hoursLater * 3_600_000);
        await Answer.create(
          { questionId: question.id, authorId: must(userId, a.author), body: a.body, createdAt: at, updatedAt: at },
          { transaction },
        );
      }
    }
  });
  return true;
}

function must<K, V>(map: Map<K, V>, key: K): V {
  const v = map.get(key);
  if (v === undefined) throw new Error(`demo data refers to unknown key ${String(key)}`);
  return v;
}
