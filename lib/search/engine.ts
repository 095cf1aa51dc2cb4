import 'server-only';
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
