import { initModels } from '@/models';
import type { Pagination } from '@/lib/validation/pagination';
import { listQuestions, type QuestionPage } from './list';

/** A tag's page: its name and description and one page of its questions; null for a tag that does not exist. */
export async function tagPage(
  slug: string,
  pagination: Pagination,
): Promise<{ tag: { name: string; description: string | null }; questions: QuestionPage } | null> {
  const tag = await initModels().Tag.findOne({ where: { slug } });
  if (!tag) return null;
  return {
    tag: { name: tag.name, description: tag.description },
    questions: await listQuestions(pagination, { kind: 'tag', tag: slug }),
  };
}
