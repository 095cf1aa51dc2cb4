import 'server-only';
import { Index } from 'flexsearch';
import type { SearchDoc } from './documents';
import { CANDIDATES, passes, type EngineResult, type SearchEngine, type SearchFilters } from './engine';
import { indexTerms } from './normalize';

const newIndex = () =>
  new Index({ tokenize: 'strict', resolution: 9, encode: (s: string) => s.split(' ').filter(Boolean) });

/** A scratch array's slot; grow() keeps every document's number inside, so the 0 is never used. */
const at = (a: Float64Array, n: number): number => a[n] ?? 0;

/** Most query terms looked up (a pasted paragraph is cut here). */
const MAX_TERMS = 12;

/**
 * The in-process engine: two flexsearch indexes in this server's memory, one for
 * each document's head (title and tags), one for its text. Documents are encoded by
 * our own pipeline (normalize.ts), so flexsearch only splits on spaces; inside, each
 * document has a number, so ranking works on typed arrays without hashing strings.
 *
 * Ranking follows Meilisearch's default rules, on our terms: first by how many of
 * the query's terms a document holds (words), then how many of them are in its head
 * (attribute), then the rarity of what it matched (a document holding a rare term
 * before one holding a common one), then where the terms sit in its text (earlier
 * first). The Meilisearch adapter gets the first two from Meilisearch itself.
 */
export class FlexEngine implements SearchEngine {
  readonly name = 'flexsearch' as const;
  private head = newIndex();
  private body = newIndex();
  private numOf = new Map<string, number>();
  private docAt: (SearchDoc | undefined)[] = [];
  // per-document scratch for ranking, reset after each query
  private words = new Float64Array(1024);
  private inHead = new Float64Array(1024);
  private rarity = new Float64Array(1024);
  private position = new Float64Array(1024);
  private lastTerm = new Int32Array(1024).fill(-1);

  private grow(n: number) {
    if (n < this.words.length) return;
    const size = Math.max(n + 1, this.words.length * 2);
    const bigger = <T extends Float64Array | Int32Array>(a: T, fill = 0): T => {
      const b = new (a.constructor as new (n: number) => T)(size).fill(fill) as T;
      b.set(a);
      return b;
    };
    this.words = bigger(this.words);
    this.inHead = bigger(this.inHead);
    this.rarity = bigger(this.rarity);
    this.position = bigger(this.position);
    this.lastTerm = bigger(this.lastTerm, -1);
  }

  async upsert(docs: SearchDoc[]) {
    for (const d of docs) {
      let n = this.numOf.get(d.id);
      if (n === undefined) {
        n = this.docAt.length;
        this.numOf.set(d.id, n);
        this.docAt.push(d);
        this.grow(n);
      } else {
        this.head.remove(n);
        this.body.remove(n);
        this.docAt[n] = d;
      }
      this.head.add(n, indexTerms(d.head).join(' '));
      this.body.add(n, indexTerms(d.text).join(' '));
    }
  }

  async remove(ids: string[]) {
    for (const id of ids) {
      const n = this.numOf.get(id);
      if (n === undefined) continue;
      this.numOf.delete(id);
      this.docAt[n] = undefined;
      this.head.remove(n);
      this.body.remove(n);
    }
  }

  async clear() {
    this.head = newIndex();
    this.body = newIndex();
    this.numOf.clear();
    this.docAt = [];
  }

  async count() {
    return this.numOf.size;
  }

  async search(terms: string[], filters: SearchFilters, limit: number, offset: number): Promise<EngineResult> {
    if (terms.length === 0) return { docs: [], total: 0 };
    const { words, inHead, rarity, position, lastTerm } = this;
    const touched: number[] = [];
    const corpus = this.numOf.size;
    const used = terms.slice(0, MAX_TERMS);
    used.forEach((term, t) => {
      const head = this.head.search(term, { limit: CANDIDATES }) as number[];
      const body = this.body.search(term, { limit: CANDIDATES }) as number[];
      const df = head.length + body.length;
      if (df === 0) return;
      const rare = Math.log(1 + corpus / df);
      const mark = (n: number) => {
        if (lastTerm[n] === t) return;
        if (words[n] === 0) touched.push(n);
        lastTerm[n] = t;
        words[n] = at(words, n) + 1;
        rarity[n] = at(rarity, n) + rare;
      };
      for (const n of head) {
        mark(n);
        inHead[n] = at(inHead, n) + 1;
      }
      for (const [k, n] of body.entries()) {
        mark(n);
        position[n] = at(position, n) + k / body.length;
      }
    });
    // the four keys packed in one number, the candidate's place in the low bits: one numeric sort
    const SHIFT = 131072; // 2^17 > the most candidates (MAX_TERMS × 2 × CANDIDATES)
    const keys = new Float64Array(touched.length);
    for (const [i, n] of touched.entries()) {
      // words ≤ 12 (× 10^6), head ≤ 12 (× 10^4), rarity ≤ 12 × 11.6 (× 50 < 10^4), earlier-ness ≤ 12 (× 3 < 50)
      const score =
        at(words, n) * 1e6 +
        at(inHead, n) * 1e4 +
        Math.round(at(rarity, n) * 50) +
        Math.round((used.length - at(position, n)) * 3);
      keys[i] = -(score * SHIFT) + i;
    }
    keys.sort();
    const matched: SearchDoc[] = [];
    for (const key of keys) {
      const n = touched[((key % SHIFT) + SHIFT) % SHIFT];
      const d = n === undefined ? undefined : this.docAt[n];
      if (d && passes(d, filters) && matched.push(d) >= CANDIDATES) break;
    }
    for (const n of touched) {
      words[n] = 0;
      inHead[n] = 0;
      rarity[n] = 0;
      position[n] = 0;
      lastTerm[n] = -1;
    }
    return { docs: matched.slice(offset, offset + limit), total: matched.length };
  }
}
