import 'server-only';
import type { UnitSystem } from '@/lib/hydraulics';
import { plain, search } from './index';

export interface SimilarQuestion {
  id: number;
  title: string;
  fixed: boolean;
}

/**
 * Questions like the one being asked, from search: its title, tags, fall and lift
 * (heights match across units), most alike first; the ones that were fixed say so. Titles
 * in the asker's units.
 */
export async function similarQuestions(
  input: { title?: string; tags: string[]; fall?: string; lift?: string },
  limit = 5,
  units?: UnitSystem,
): Promise<SimilarQuestion[]> {
  const q = [
    input.title,
    ...input.tags.map((t) => t.replace(/-/g, ' ')),
    input.fall && `fall ${input.fall}`,
    input.lift && `lift ${input.lift}`,
  ]
    .filter(Boolean)
    .join(' ')
    .slice(0, 200);
  if (!q.trim()) return [];
  const { items } = await search({ q, kinds: ['question'], limit, offset: 0 }, { seeHidden: false, units });
  return items.map((i) => ({
    id: Number(i.id.replace('question-', '')),
    title: plain(i.title),
    fixed: Boolean(i.solved),
  }));
}
