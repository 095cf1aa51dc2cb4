import { initModels } from '@/models';
import type { Pagination } from '@/lib/validation/pagination';

export interface QuestionSummary {
  id: number;
  title: string;
  excerpt: string;
  answerCount: number;
  fixed: boolean;
  author: { handle: string; displayName: string };
  tags: { slug: string; name: string }[];
  createdAt: string;
}

export interface QuestionPage {
  page: number;
  perPage: number;
  total: number;
  totalPages: number;
  items: QuestionSummary[];
}

const EXCERPT = 180;

/** Newest questions first, one page at a time (index questions_created_at_id). */
export async function listQuestions({ page, perPage }: Pagination): Promise<QuestionPage> {
  const { Question, User, Tag } = initModels();
  const total = await Question.count();
  const ids = await Question.findAll({
    attributes: ['id'],
    order: [
      ['createdAt', 'DESC'],
      ['id', 'DESC'],
    ],
    limit: perPage,
    offset: (page - 1) * perPage,
    raw: true,
  });
  const rows = ids.length
    ? await Question.findAll({
        where: { id: ids.map((r) => r.id) },
        include: [
          { model: User, as: 'author', attributes: ['handle', 'displayName'] },
          { model: Tag, as: 'tags', attributes: ['slug', 'name'], through: { attributes: [] } },
        ],
        order: [
          ['createdAt', 'DESC'],
          ['id', 'DESC'],
        ],
      })
    : [];
  return {
    page,
    perPage,
    total,
    totalPages: Math.max(1, Math.ceil(total / perPage)),
    items: rows.map((q) => ({
      id: q.id,
      title: q.title,
      excerpt: q.body.length > EXCERPT ? `${q.body.slice(0, EXCERPT).trimEnd()}…` : q.body,
      answerCount: q.answerCount,
      fixed: q.fixedAnswerId !== null,
      author: { handle: q.author?.handle ?? 'unknown', displayName: q.author?.displayName ?? 'unknown' },
      tags: (q.tags ?? []).map((t) => ({ slug: t.slug, name: t.name })),
      createdAt: q.createdAt.toISOString(),
    })),
  };
}
