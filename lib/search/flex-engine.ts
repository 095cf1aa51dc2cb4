import { Index } from 'flexsearch';
import type { SearchDoc } from './documents';
import { CANDIDATES, passes, rank, type EngineResult, type SearchEngine, type SearchFilters } from './engine';
import { indexTerms } from './normalize';

const newIndex = () => new Index({ tokenize: 'strict', resolution: 9, encode: (s: string) => s.split(' ').filter(Boolean) });

/**
 * The in-process engine: two flexsearch indexes in this server's memory, one for
 * titles and tags, one for text. Documents are encoded by our own pipeline
 * (normalize.ts), so flexsearch only splits on spaces. Each query term is looked up
 * on its own and the candidates ranked by `rank` (engine.ts), which the Meilisearch
 * adapter's ranking rules mirror.
 */
export class FlexEngine implements SearchEngine {
  readonly name = 'flexsearch' as const;
  private head = newIndex();
  private body = newIndex();
  private docs = new Map<string, SearchDoc>();

  async upsert(docs: SearchDoc[]) {
    for (const d of docs) {
      if (this.docs.has(d.id)) {
        this.head.remove(d.id);
        this.body.remove(d.id);
      }
      this.docs.set(d.id, d);
      this.head.add(d.id, indexTerms(d.head).join(' '));
      this.body.add(d.id, indexTerms(d.text).join(' '));
    }
  }

  async remove(ids: string[]) {
    for (const id of ids) {
      if (this.docs.delete(id)) {
        this.head.remove(id);
        this.body.remove(id);
      }
    }
  }

  async clear() {
    this.head = newIndex();
    this.body = newIndex();
    this.docs.clear();
  }

  async count() {
    return this.docs.size;
  }

  async search(terms: string[], filters: SearchFilters, limit: number, offset: number): Promise<EngineResult> {
    if (terms.length === 0) return { docs: [], total: 0 };
    const perTerm = terms.slice(0, 12).map((t) => ({
      head: new Set(this.head.search(t, { limit: CANDIDATES }) as string[]),
      body: this.body.search(t, { limit: CANDIDATES }) as string[],
    }));
    const ranked = rank(perTerm, this.docs.size);
    const matched: SearchDoc[] = [];
    for (const id of ranked) {
      const d = this.docs.get(id);
      if (d && passes(d, filters)) matched.push(d);
    }
    return { docs: matched.slice(offset, offset + limit), total: matched.length };
  }
}
