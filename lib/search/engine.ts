import type { SearchDoc, SearchKind } from './documents';

export interface SearchFilters {
  kinds?: SearchKind[];
  tag?: string;
  solved?: boolean;
  level?: string;
  /** moderators also find hidden and deleted posts */
  includeHidden: boolean;
}

export interface EngineResult {
  docs: SearchDoc[];
  /** how many matched in all (capped by the engine's candidate limit) */
  total: number;
}

/** What both engines do; the query arrives already as our terms (lib/search/normalize). */
export interface SearchEngine {
  readonly name: 'flexsearch' | 'meilisearch';
  upsert(docs: SearchDoc[]): Promise<void>;
  remove(ids: string[]): Promise<void>;
  clear(): Promise<void>;
  count(): Promise<number>;
  search(terms: string[], filters: SearchFilters, limit: number, offset: number): Promise<EngineResult>;
}

/** Most candidates an engine ranks for one query before filters and paging. */
export const CANDIDATES = 1000;

export function passes(d: SearchDoc, f: SearchFilters): boolean {
  if (d.hidden && !f.includeHidden) return false;
  if (f.kinds?.length && !f.kinds.includes(d.kind)) return false;
  if (f.tag && !d.tags.includes(f.tag)) return false;
  if (f.solved !== undefined && d.solved !== f.solved) return false;
  if (f.level && d.level !== f.level) return false;
  return true;
}

/**
 * Orders candidates the way Meilisearch's default rules do, on our terms: first by
 * how many of the query's terms a document holds (words), then by how many of them
 * are in its title or tags (attribute), then by the rarity of what it matched (a
 * document holding a rare term before one holding a common one), then by where the
 * term sits in the text (earlier first). `perTerm` gives, for each query term, the
 * documents whose title/tags hold it and those whose text holds it, best first.
 */
export function rank(perTerm: { head: Set<string>; body: string[] }[], corpusSize: number): string[] {
  const score = new Map<string, { words: number; head: number; rarity: number; position: number }>();
  for (const { head, body } of perTerm) {
    const df = new Set([...head, ...body]).size;
    if (df === 0) continue;
    const rarity = Math.log(1 + corpusSize / df);
    const seen = new Set<string>();
    const touch = (id: string, inHead: boolean, position: number) => {
      let s = score.get(id);
      if (!s) score.set(id, (s = { words: 0, head: 0, rarity: 0, position: 0 }));
      if (!seen.has(id)) {
        seen.add(id);
        s.words++;
        s.rarity += rarity;
      }
      if (inHead) s.head++;
      s.position += position;
    };
    for (const id of head) touch(id, true, 0);
    body.forEach((id, i) => touch(id, false, i / body.length));
  }
  return [...score.entries()]
    .sort(([, a], [, b]) => b.words - a.words || b.head - a.head || b.rarity - a.rarity || a.position - b.position)
    .map(([id]) => id);
}
