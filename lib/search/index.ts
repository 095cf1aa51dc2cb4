import 'server-only';
import { mkdirSync, statSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { allGuideDocs, allThreadDocs, fieldLogDocs, threadDocs, type SearchDoc, type SearchKind } from './documents';
import type { SearchEngine, SearchFilters } from './engine';
import { IndexFeed, type IndexChange } from './feed';
import { FlexEngine } from './flex-engine';
import { MeiliEngine } from './meili-engine';
import { queryTerms } from './normalize';
import type { UnitSystem } from '@/lib/hydraulics';
import { quantitiesInUnits } from '@/lib/units/in-text';
import { highlight, snippet, type Segment } from './snippet';
import { redisUrl } from '@/lib/redis';

export { SEARCH_KINDS, type SearchKind, type SearchDoc } from './documents';
export type { Segment } from './snippet';

/**
 * Search across guides, questions, answers, replies and field log entries.
 * One interface, two engines: flexsearch in this process (the default), or
 * Meilisearch when MEILISEARCH_URL is set (shared by every app instance). With
 * REDIS_URL, in-process indexes pass their changes to each other (./feed.ts).
 */

interface State {
  engine: SearchEngine;
  built: Promise<void> | null;
  builtAt: number;
  checkedAt: number;
}

const g = globalThis as unknown as { __clackwaterSearch?: State; __clackwaterSearchFeed?: IndexFeed | null };

export function createEngine(env: Record<string, string | undefined> = process.env): SearchEngine {
  return env.MEILISEARCH_URL
    ? new MeiliEngine(env.MEILISEARCH_URL, env.MEILISEARCH_KEY || undefined, env.MEILISEARCH_INDEX || 'clackwater')
    : new FlexEngine();
}

function state(): State {
  g.__clackwaterSearch ??= { engine: createEngine(), built: null, builtAt: 0, checkedAt: 0 };
  return g.__clackwaterSearch;
}

/**
 * Use this engine from now on (tests swap in a Meilisearch adapter on a fake server;
 * benchmarks hand over an index they filled themselves with `filled`).
 */
export function setSearchEngine(engine: SearchEngine, opts: { filled?: boolean } = {}) {
  const now = Date.now();
  stopIndexFeed();
  g.__clackwaterSearch = {
    engine,
    built: opts.filled ? Promise.resolve() : null,
    builtAt: opts.filled ? now : 0,
    checkedAt: now,
  };
}

export function searchEngine(): SearchEngine {
  return state().engine;
}

/** Another instance's change, applied to this in-process index (nothing to do for a shared Meilisearch). */
async function applyChange(change: IndexChange): Promise<void> {
  const s = state();
  if (s.engine.name !== 'flexsearch' || !s.built) return; // not built yet: the coming build reads the database
  await s.built;
  if (change.upsert?.length) await s.engine.upsert(change.upsert);
  if (change.remove?.length) await s.engine.remove(change.remove);
}

/**
 * With REDIS_URL and the in-process engine, the channel this instance's index changes
 * go out on and the others' come in on (lib/search/feed.ts); null otherwise.
 */
function feed(): IndexFeed | null {
  if (g.__clackwaterSearchFeed === undefined) {
    g.__clackwaterSearchFeed =
      redisUrl() && state().engine.name === 'flexsearch'
        ? new IndexFeed(applyChange, () => {
            // changes may have been missed while away: rebuild on the next search
            state().built = null;
          })
        : null;
  }
  return g.__clackwaterSearchFeed;
}

/** Stops listening to other instances (tests; a script that should end). */
export function stopIndexFeed() {
  g.__clackwaterSearchFeed?.stop();
  g.__clackwaterSearchFeed = undefined;
}

/** Indexes `docs` here (when this index is built) and tells the other instances. */
async function indexDocs(docs: SearchDoc[]): Promise<void> {
  const s = state();
  await feed()?.publish({ upsert: docs });
  if (!s.built) return;
  await s.built;
  await s.engine.upsert(docs);
}

/** `npm run search:rebuild` touches this file; in-process indexes older than it rebuild. */
export function rebuildStampPath() {
  return path.join(process.env.SEARCH_STATE_DIR ?? path.join(process.cwd(), '.data', 'search'), 'rebuilt-at');
}

function stampTime(): number {
  try {
    return statSync(/* turbopackIgnore: true */ rebuildStampPath()).mtimeMs;
  } catch {
    return 0;
  }
}

/** Fills an engine from the database and content/guides; returns how many documents. */
async function fill(engine: SearchEngine): Promise<{ documents: number; ms: number }> {
  const t0 = performance.now();
  await engine.clear();
  const guides = allGuideDocs();
  await engine.upsert(guides);
  let documents = guides.length;
  for await (const batch of allThreadDocs()) {
    await engine.upsert(batch);
    documents += batch.length;
  }
  const entries = await fieldLogDocs();
  await engine.upsert(entries);
  documents += entries.length;
  return { documents, ms: performance.now() - t0 };
}

/** Rebuilds this process's index (and a shared Meilisearch index) now. */
export async function rebuildIndex(): Promise<{ documents: number; ms: number }> {
  const s = state();
  s.builtAt = Date.now();
  const run = fill(s.engine);
  s.built = run.then(() => undefined);
  s.built.catch(() => (s.built = null));
  return run;
}

/** Marks a rebuild for every in-process index (they rebuild on their next search). */
export function stampRebuild() {
  const file = rebuildStampPath();
  mkdirSync(/* turbopackIgnore: true */ path.dirname(file), { recursive: true });
  writeFileSync(/* turbopackIgnore: true */ file, new Date().toISOString());
}

/**
 * The index, built when missing: an in-process index starts empty in every new
 * server, a Meilisearch index is built when it holds nothing.
 */
export async function ensureIndex(): Promise<void> {
  const s = state();
  const now = Date.now();
  if (s.built && s.engine.name === 'flexsearch' && now - s.checkedAt > 5_000) {
    s.checkedAt = now;
    if (stampTime() > s.builtAt) s.built = null;
  }
  s.built ??= (async () => {
    // listening before reading, so no change falls between the build's read and the first message
    await feed()?.start();
    s.builtAt = Date.now();
    if (s.engine.name === 'meilisearch' && (await s.engine.count()) > 0) return;
    await fill(s.engine);
  })().catch((err) => {
    s.built = null;
    throw err;
  });
  return s.built;
}

/**
 * Brings a thread's documents (question, answers, replies) up to date after a write:
 * called by every create, edit, hide, restore and delete, in the same request.
 * The database stays the record: if the engine fails, the write still stands and the
 * error is logged; the next rebuild repairs the index.
 */
export async function indexThread(questionId: number): Promise<void> {
  // not built here and nobody to tell: the coming build reads the database anyway
  if (!state().built && !feed()) return;
  try {
    await indexDocs(await threadDocs([questionId]));
  } catch (err) {
    console.error(`search: could not index thread ${questionId}:`, err instanceof Error ? err.message : err);
  }
}

/** Brings field log entries up to date after a write (record, import, hide, restore, delete). */
export async function indexFieldLog(ids: number[]): Promise<void> {
  if ((!state().built && !feed()) || ids.length === 0) return;
  try {
    await indexDocs(await fieldLogDocs(ids));
  } catch (err) {
    console.error(
      `search: could not index field log entries ${ids.join(', ')}:`,
      err instanceof Error ? err.message : err,
    );
  }
}

/** The search engine (a Meilisearch server) did not answer: a 503 with a plain message. */
export class SearchUnavailableError extends Error {
  constructor(cause: unknown) {
    super(
      'Search is not answering just now. Please try again in a minute; guides and questions can still be browsed.',
      { cause },
    );
  }
}

export interface SearchParams {
  q: string;
  kinds?: SearchKind[];
  tag?: string;
  solved?: boolean;
  level?: string;
  limit: number;
  offset: number;
}

export interface SearchItem {
  id: string;
  kind: SearchKind;
  url: string;
  title: Segment[];
  snippet: Segment[];
  tags: string[];
  solved: boolean | null;
  level: string | null;
  hidden: boolean;
  date: string;
}

export interface SearchResult {
  items: SearchItem[];
  total: number;
  engine: SearchEngine['name'];
  ms: number;
}

/**
 * `viewer.units`: the reader's unit system; every quantity in a title or snippet is shown in it
 * (the index keeps the words as typed, one copy for every reader).
 */
export async function search(
  params: SearchParams,
  viewer: { seeHidden: boolean; units?: UnitSystem },
): Promise<SearchResult> {
  const t0 = performance.now();
  const terms = queryTerms(params.q);
  const filters: SearchFilters = {
    kinds: params.kinds,
    tag: params.tag,
    solved: params.solved,
    level: params.level,
    includeHidden: viewer.seeHidden,
  };
  let found: Awaited<ReturnType<SearchEngine['search']>>;
  try {
    await ensureIndex();
    found = await searchEngine().search(terms, filters, params.limit, params.offset);
  } catch (err) {
    if (searchEngine().name === 'meilisearch') {
      console.error('search: Meilisearch failed:', err instanceof Error ? err.message : err);
      throw new SearchUnavailableError(err);
    }
    throw err;
  }
  const { docs, total } = found;
  const set = new Set(terms);
  const units = viewer.units;
  const items = docs.map((d) => ({
    id: d.id,
    kind: d.kind,
    url: d.url,
    title: highlight(units ? quantitiesInUnits(d.title, units) : d.title, set),
    snippet: snippet(units ? quantitiesInUnits(d.text, units) : d.text, set),
    tags: d.tags,
    solved: d.solved,
    level: d.level,
    hidden: d.hidden,
    date: d.date,
  }));
  return { items, total, engine: searchEngine().name, ms: performance.now() - t0 };
}

export const plain = (segments: Segment[]) => segments.map((s) => s.text).join('');
