import 'server-only';
import { Meilisearch, type Index as MeiliIndex } from 'meilisearch';
import type { SearchDoc } from './documents';
import { CANDIDATES, type EngineResult, type SearchEngine, type SearchFilters } from './engine';
import { indexTerms } from './normalize';

/** the document as stored, with our encoded terms of its head and of its text */
type MeiliDoc = SearchDoc & { headTerms: string; bodyTerms: string };

const WAIT = { timeout: 30_000, interval: 25 };
const quote = (s: string) => JSON.stringify(s);

/**
 * The shared engine for more than one app instance: documents carry our encoded
 * terms (the same pipeline as flexsearch) and Meilisearch ranks them by its
 * words-then-attribute rules, which the in-process ranking mirrors.
 */
export class MeiliEngine implements SearchEngine {
  readonly name = 'meilisearch' as const;
  private client: Meilisearch;
  private uid: string;
  private configured: Promise<void> | null = null;

  constructor(host: string, apiKey?: string, uid = 'clackwater') {
    this.client = new Meilisearch({ host, apiKey });
    this.uid = uid;
  }

  private index(): MeiliIndex<MeiliDoc> {
    return this.client.index<MeiliDoc>(this.uid);
  }

  /** Creates the index with its settings once per process. */
  private ready() {
    this.configured ??= (async () => {
      await this.client.createIndex(this.uid, { primaryKey: 'id' }).waitTask(WAIT);
      await this.index()
        .updateSettings({
          searchableAttributes: ['headTerms', 'bodyTerms'],
          rankingRules: ['words', 'attribute', 'typo', 'proximity', 'sort', 'exactness'],
          filterableAttributes: ['kind', 'tags', 'solved', 'level', 'hidden', 'threadId'],
          stopWords: [],
          typoTolerance: { enabled: false },
        })
        .waitTask(WAIT);
    })().catch((err) => {
      this.configured = null;
      throw err;
    });
    return this.configured;
  }

  async upsert(docs: SearchDoc[]) {
    if (docs.length === 0) return;
    await this.ready();
    const task = await this.index()
      .addDocuments(
        docs.map((d) => ({ ...d, headTerms: indexTerms(d.head).join(' '), bodyTerms: indexTerms(d.text).join(' ') })),
        { primaryKey: 'id' },
      )
      .waitTask(WAIT);
    if (task.status !== 'succeeded')
      throw new Error(`Meilisearch could not index documents: ${task.error?.message ?? task.status}`);
  }

  async remove(ids: string[]) {
    if (ids.length === 0) return;
    await this.ready();
    await this.index().deleteDocuments(ids).waitTask(WAIT);
  }

  async clear() {
    await this.ready();
    await this.index().deleteAllDocuments().waitTask(WAIT);
  }

  async count() {
    try {
      return (await this.index().getStats()).numberOfDocuments;
    } catch {
      return 0;
    }
  }

  async search(terms: string[], f: SearchFilters, limit: number, offset: number): Promise<EngineResult> {
    if (terms.length === 0) return { docs: [], total: 0 };
    await this.ready();
    const filter: string[] = [];
    if (!f.includeHidden) filter.push('hidden = false');
    if (f.kinds?.length) filter.push(`kind IN [${f.kinds.map(quote).join(', ')}]`);
    if (f.tag) filter.push(`tags = ${quote(f.tag)}`);
    if (f.solved !== undefined) filter.push(`solved = ${f.solved}`);
    if (f.level) filter.push(`level = ${quote(f.level)}`);
    const res = await this.index().search(terms.join(' '), {
      filter,
      limit: Math.min(limit, CANDIDATES),
      offset,
      matchingStrategy: 'last',
      attributesToRetrieve: [
        'id',
        'kind',
        'title',
        'head',
        'url',
        'text',
        'tags',
        'solved',
        'level',
        'hidden',
        'date',
        'threadId',
      ],
    });
    return { docs: res.hits as SearchDoc[], total: Math.min(res.estimatedTotalHits ?? res.hits.length, CANDIDATES) };
  }
}
