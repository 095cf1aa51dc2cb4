import { Op, type WhereOptions } from 'sequelize';
import { initModels } from '@/models';
import type { Pagination } from '@/lib/validation/pagination';

export interface QuestionSummary {
  id: number;
  title: string;
  excerpt: string;
  answerCount: number;
  fixed: boolean;
  /** where the question stands, in our words (components/questions/state-words.ts) */
  state: QuestionState;
  /** the site sheet as the asker typed it; the list shows it in the reader's units */
  siteSheet: Record<string, string> | null;
  author: { handle: string; displayName: string };
  tags: { slug: string; name: string }[];
  createdAt: string;
}

/**
 * Where a question stands: nobody has answered yet, answers are coming in, or the
 * asker chose the answer that fixed it (with their line, and the answer to link to).
 */
export type QuestionState =
  { kind: 'waiting' } | { kind: 'worked-on' } | { kind: 'fixed'; line: string | null; answerId: number };

export function questionState(q: { answerCount: number; fixedAnswerId: number | null; whatFixedIt: string | null }) {
  const state: QuestionState =
    q.fixedAnswerId !== null
      ? { kind: 'fixed', line: q.whatFixedIt, answerId: q.fixedAnswerId }
      : q.answerCount === 0
        ? { kind: 'waiting' }
        : { kind: 'worked-on' };
  return state;
}

export interface QuestionPage {
  page: number;
  perPage: number;
  total: number;
  totalPages: number;
  items: QuestionSummary[];
}

const EXCERPT = 180;

export type ListFilter =
  | { kind: 'newest' }
  | { kind: 'unanswered' }
  | { kind: 'tag'; tag: string }
  | { kind: 'mine'; userId: number }
  | { kind: 'followed'; userId: number };

/** The question ids a filter selects, as a where clause on questions (each on an index). */
async function filterWhere(filter: ListFilter): Promise<WhereOptions> {
  const { Tag, QuestionTag, QuestionFollow } = initModels();
  switch (filter.kind) {
    case 'unanswered':
      return { answerCount: 0 };
    case 'mine':
      return { authorId: filter.userId };
    case 'tag': {
      const tag = await Tag.findOne({ where: { slug: filter.tag } });
      const rows = tag ? await QuestionTag.findAll({ where: { tagId: tag.id }, attributes: ['questionId'] }) : [];
      return { id: { [Op.in]: rows.map((r) => r.questionId) } };
    }
    case 'followed': {
      const rows = await QuestionFollow.findAll({ where: { userId: filter.userId }, attributes: ['questionId'] });
      return { id: { [Op.in]: rows.map((r) => r.questionId) } };
    }
    default:
      return {};
  }
}

/**
 * How many questions each public list holds, kept for a few seconds: counting every
 * visible question scans an index of all of them, and every list page shows the
 * count. Any write to a thread in this process forgets them at once
 * (lib/questions/after-write.ts); other instances' counts catch up within the TTL.
 */
const COUNT_TTL_MS = 10_000;
const counts = new Map<string, { value: number; until: number }>();

export function forgetListCounts(): void {
  counts.clear();
}

async function countOf(filter: ListFilter, where: WhereOptions): Promise<number> {
  const { Question } = initModels();
  // a member's own and followed lists are small and on their own indexes: counted each time
  if (filter.kind === 'mine' || filter.kind === 'followed') return Question.count({ where });
  const key = JSON.stringify(filter);
  const hit = counts.get(key);
  if (hit && hit.until > Date.now()) return hit.value;
  const value = await Question.count({ where });
  counts.set(key, { value, until: Date.now() + COUNT_TTL_MS });
  return value;
}

/** Newest questions first, one page at a time (index questions_created_at_id), optionally filtered. */
export async function listQuestions(
  { page, perPage }: Pagination,
  filter: ListFilter = { kind: 'newest' },
): Promise<QuestionPage> {
  const { Question, User, Tag } = initModels();
  // hidden and deleted questions never appear in lists
  const where = { ...(await filterWhere(filter)), hiddenAt: null, deletedAt: null } as WhereOptions;
  const total = await countOf(filter, where);
  const ids = await Question.findAll({
    where,
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
      state: questionState(q),
      siteSheet: (q.siteSheet as Record<string, string> | null) ?? null,
      author: { handle: q.author?.handle ?? 'unknown', displayName: q.author?.displayName ?? 'unknown' },
      tags: (q.tags ?? []).map((t) => ({ slug: t.slug, name: t.name })),
      createdAt: q.createdAt.toISOString(),
    })),
  };
}
