import { initModels } from '@/models';
import { listQuestions, type ListPosition, type QuestionPage } from './list';

/** A tag's page: its name and description and one page of its questions; null for a tag that does not exist. */
export async function tagPage(
  slug: string,
  at: ListPosition,
): Promise<{ tag: { name: string; description: string | null }; questions: QuestionPage } | null> {
  const tag = await initModels().Tag.findOne({ where: { slug } });
  if (!tag) return null;
  return {
    tag: { name: tag.name, description: tag.description },
    questions: await listQuestions(at, { kind: 'tag', tag: slug }),
  };
}
