import { Op } from 'sequelize';
import { initModels } from '@/models';

/**
 * A plain substring match on question titles and bodies. The header search box
 * uses it until the search engine (lib/search) replaces it.
 */
export async function findQuestionsByText(text: string, limit = 20) {
  const { Question } = initModels();
  const like = `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
  const rows = await Question.findAll({
    attributes: ['id', 'title', 'answerCount', 'createdAt'],
    where: { hiddenAt: null, deletedAt: null, [Op.or]: [{ title: { [Op.like]: like } }, { body: { [Op.like]: like } }] },
    order: [['createdAt', 'DESC']],
    limit,
  });
  return rows.map((q) => ({ id: q.id, title: q.title, answerCount: q.answerCount, createdAt: q.createdAt.toISOString() }));
}
