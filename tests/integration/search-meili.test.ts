import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { GET as searchGET } from '@/app/api/search/route';
import { POST as actionPOST } from '@/app/api/review/actions/route';
import { createEngine, rebuildIndex, search, setSearchEngine } from '@/lib/search';
import { FlexEngine } from '@/lib/search/flex-engine';
import { MeiliEngine } from '@/lib/search/meili-engine';
import type { SearchParams } from '@/lib/search';
import { initModels } from '@/models';
import { startFakeMeilisearch, type FakeMeili } from '../support/fake-meilisearch';
import { freshDemoDatabase } from '../support/db';
import { actAs } from '../support/act-as';

const { call } = actAs('10.8.1');

/** A fixed set of builders' queries, with and without filters. */
type Query = Omit<SearchParams, 'limit' | 'offset'> & { tiesOnly?: boolean };
const QUERIES: Query[] = [
  { q: 'Has anyone had a 1-inch pump stop when the creek drops?' },
  { q: 'impulse valve weight' },
  { q: 'pressure tank water-logged' },
  { q: '19 mm drive line' },
  { q: 'frost drain' },
  // read as "fall" (a synonym), which scores of documents name as often as each other: the
  // first places are ties, which the two engines break differently by design, so only the
  // set of matches is compared
  { q: 'supply head', tiesOnly: true },
  { q: 'pumps in parallel one delivery line' },
  { q: 'snifter', kinds: ['question'] },
  { q: 'drive pipe length', kinds: ['guide'], level: 'first build' },
  { q: 'waste valve', solved: true },
  { q: 'tank', tag: 'storage' },
];

/** The search parameters of a query, without the test's own marks. */
const paramsOf = (q: Query): Omit<SearchParams, 'limit' | 'offset'> =>
  Object.fromEntries(Object.entries(q).filter(([k]) => k !== 'tiesOnly')) as Omit<SearchParams, 'limit' | 'offset'>;

async function topIds(query: Query, n: number, seeHidden = false) {
  const params = paramsOf(query);
  return (await search({ ...params, limit: n, offset: 0 }, { seeHidden })).items.map((i) => i.id);
}
/** How many documents match, and which (when they fit in one page of 50). */
async function matches(query: Query) {
  const params = paramsOf(query);
  const r = await search({ ...params, limit: 50, offset: 0 }, { seeHidden: false });
  return { total: r.total, ids: r.total <= 50 ? r.items.map((i) => i.id).sort() : null };
}

describe('the Meilisearch adapter against a fake server gives the in-process results', () => {
  let fake: FakeMeili;
  const flexTop = new Map<string, string[]>();
  const flexAll = new Map<string, Awaited<ReturnType<typeof matches>>>();

  beforeAll(async () => {
    await freshDemoDatabase();
    setSearchEngine(new FlexEngine());
    await rebuildIndex();
    for (const q of QUERIES) {
      flexTop.set(JSON.stringify(q), await topIds(q, 3));
      flexAll.set(JSON.stringify(q), await matches(q));
    }
    fake = await startFakeMeilisearch();
  });
  afterAll(async () => {
    setSearchEngine(new FlexEngine());
    await fake?.close();
  });

  it('MEILISEARCH_URL picks the adapter', () => {
    expect(createEngine({ MEILISEARCH_URL: fake.url }).name).toBe('meilisearch');
    expect(createEngine({}).name).toBe('flexsearch');
  });

  it('builds the index through the API: create, settings, documents', async () => {
    setSearchEngine(new MeiliEngine(fake.url, undefined, 'clackwater_test'));
    const { documents } = await rebuildIndex();
    const idx = fake.indexes.get('clackwater_test')!;
    expect(idx.docs.size).toBe(documents);
    expect(idx.settings).toMatchObject({
      searchableAttributes: ['headTerms', 'bodyTerms'],
      filterableAttributes: expect.arrayContaining(['kind', 'tags', 'solved', 'level', 'hidden']),
    });
    expect(fake.requests).toEqual(
      expect.arrayContaining([
        'POST /indexes',
        'PATCH /indexes/clackwater_test/settings',
        'POST /indexes/clackwater_test/documents',
      ]),
    );
  });

  // Both rank by words, then title/tag matches; their last tie-breaks differ (Meilisearch's
  // proximity and document order against our rarity of the matched terms). Two sections
  // can tie on words and title matches (two parts of one guide that both name every
  // word), and then either may come first: so each engine's first result must be among
  // the other's first three, and the whole set of matches must be the same.
  it('returns the same top results and the same matches as flexsearch for each query', async () => {
    for (const q of QUERIES) {
      const key = JSON.stringify(q);
      const top = await topIds(q, 3);
      const expected = flexTop.get(key)!;
      expect(top.length, key).toBeGreaterThan(0);
      if (!q.tiesOnly) {
        expect(expected, key).toContain(top[0]);
        expect(top, key).toContain(expected[0]);
      }
      expect(await matches(q), key).toEqual(flexAll.get(key));
    }
  });

  it('keeps hidden posts from everyone but moderators, through GET /api/search', async () => {
    const q = (await initModels().Question.findOne({ where: { title: 'Using a pressure tank as the air chamber' } }))!;
    const res = await call(actionPOST, 'POST', '/api/review/actions', 'moss_moderator', {
      action: 'hide',
      postType: 'question',
      postId: q.id,
      reason: 'checking the adapter',
    });
    expect(res.status).toBe(200);
    const found = async (who: string | null) =>
      (await call(searchGET, 'GET', '/api/search?q=old%20well%20pressure%20tank&limit=20', who)).body;
    const member = await found('highcrag_shepherd');
    expect(member.engine).toBe('meilisearch');
    expect(member.items.map((i: { id: string }) => i.id)).not.toContain(`question-${q.id}`);
    expect((await found('moss_moderator')).items.map((i: { id: string }) => i.id)).toContain(`question-${q.id}`);
    expect(fake.requests.filter((r) => r === 'POST /indexes/clackwater_test/search').length).toBeGreaterThan(0);
  });

  it('a Meilisearch that stops answering gives a readable 503, and writes still stand', async () => {
    await fake.close();
    const res = await call(searchGET, 'GET', '/api/search?q=pump', null);
    expect(res.status).toBe(503);
    expect(res.body.error).toMatchObject({
      code: 'search_unavailable',
      message: expect.stringMatching(/^Search is not answering just now/),
    });
    expect(res.body.error.message).not.toMatch(/fetch|ECONNREFUSED|stack/i);
    const q = (await initModels().Question.findOne({ order: [['id', 'ASC']] }))!;
    const hide = await call(actionPOST, 'POST', '/api/review/actions', 'moss_moderator', {
      action: 'lock',
      postType: 'question',
      postId: q.id,
      reason: 'search is down',
    });
    expect(hide.status).toBe(200);
    expect((await initModels().Question.findByPk(q.id))!.lockedAt).not.toBeNull();
    fake = await startFakeMeilisearch();
  });
});
