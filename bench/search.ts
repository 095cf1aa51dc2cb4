/**
 * Search benchmark: 100,000 invented posts (bench/generate.ts) plus the guides.
 *   in-process:   node --expose-gc --import tsx bench/search.ts [posts]
 *   through HTTP: node --import tsx bench/search.ts --api http://127.0.0.1:3200
 * (bash bench/search.sh runs both, seeding a bench database for the server.)
 * Reports index build time, resident memory and p50/p95/p99 over 1,000 mixed queries.
 */
import { allGuideDocs, type SearchDoc } from '@/lib/search/documents';
import { FlexEngine } from '@/lib/search/flex-engine';
import { search, setSearchEngine } from '@/lib/search';
import { benchQueries, generatePosts, type BenchPost } from './generate';

const QUERIES = 1000;

function toDoc(p: BenchPost): SearchDoc {
  const sheet = p.siteSheet
    ? Object.entries(p.siteSheet)
        .map(([k, v]) => `${k} ${v}`)
        .join('; ')
    : '';
  return {
    id: `${p.kind}-${p.id}`,
    kind: p.kind,
    title: p.title,
    head: p.kind === 'question' ? `${p.title}\n${p.tags.join(' ')}` : '',
    url: `/questions/${p.questionId}${p.kind === 'question' ? '' : `#${p.kind}-${p.id}`}`,
    text: sheet ? `${sheet}\n${p.body}` : p.body,
    tags: p.tags,
    solved: p.solved,
    level: null,
    hidden: p.hidden,
    date: new Date(Date.now() - p.daysAgo * 86_400_000).toISOString(),
    threadId: p.questionId,
  };
}

const pct = (xs: number[], p: number) => {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.ceil((p / 100) * s.length) - 1)];
};
const mb = (n: number) => `${(n / 1024 / 1024).toFixed(0)} MB`;
const ms = (n: number) => `${n.toFixed(2)} ms`;
const gc = () => (globalThis as { gc?: () => void }).gc?.();

function report(label: string, times: number[]) {
  console.log(
    `${label}: p50 ${ms(pct(times, 50))}, p95 ${ms(pct(times, 95))}, p99 ${ms(pct(times, 99))} over ${times.length} queries`,
  );
}

async function inProcess(count: number) {
  gc();
  const before = process.memoryUsage();
  const engine = new FlexEngine();
  const t0 = performance.now();
  await engine.upsert(allGuideDocs());
  let batch: SearchDoc[] = [];
  for (const p of generatePosts(count)) {
    batch.push(toDoc(p));
    if (batch.length === 5000) {
      await engine.upsert(batch);
      batch = [];
    }
  }
  await engine.upsert(batch);
  const buildMs = performance.now() - t0;
  gc();
  const after = process.memoryUsage();
  console.log(
    `index: ${await engine.count()} documents (${count} posts and the guides) built in ${(buildMs / 1000).toFixed(1)} s`,
  );
  console.log(
    `memory: resident ${mb(after.rss)} (+${mb(after.rss - before.rss)} for the index), heap used +${mb(after.heapUsed - before.heapUsed)}${(globalThis as { gc?: unknown }).gc ? '' : ' (run with --expose-gc for steadier figures)'}`,
  );
  setSearchEngine(engine, { filled: true });
  const queries = benchQueries(QUERIES);
  for (const q of queries.slice(0, 50)) await search({ q: q.q, limit: 10, offset: 0 }, { seeHidden: false }); // warm-up
  const times: number[] = [];
  let hits = 0;
  for (const q of queries) {
    const t = performance.now();
    const r = await search(
      {
        q: q.q,
        kinds: q.kind ? [q.kind as 'question'] : undefined,
        tag: q.tag,
        solved: q.solved,
        limit: 10,
        offset: 0,
      },
      { seeHidden: false },
    );
    times.push(performance.now() - t);
    if (r.items.length) hits++;
  }
  report('in-process search (with snippets)', times);
  console.log(`queries with results: ${hits} of ${queries.length}`);
}

async function throughApi(base: string) {
  const queries = benchQueries(QUERIES);
  const url = (q: (typeof queries)[number]) => {
    const p = new URLSearchParams({ q: q.q, limit: '10' });
    if (q.kind) p.set('kind', q.kind);
    if (q.tag) p.set('tag', q.tag);
    if (q.solved !== undefined) p.set('solved', String(q.solved));
    return `${base}/api/search?${p}`;
  };
  const t0 = performance.now();
  const first = await fetch(url(queries[0])); // the server builds its index on start; this waits for it
  if (!first.ok) throw new Error(`GET /api/search answered ${first.status}: ${await first.text()}`);
  console.log(
    `first search (waits for the server's index build from the database): ${((performance.now() - t0) / 1000).toFixed(1)} s`,
  );
  for (const q of queries.slice(0, 50)) await (await fetch(url(q))).arrayBuffer();
  const times: number[] = [];
  let errors = 0;
  for (const q of queries) {
    const t = performance.now();
    const res = await fetch(url(q));
    await res.arrayBuffer();
    times.push(performance.now() - t);
    if (!res.ok) errors++;
  }
  report(`GET /api/search on loopback (${base})`, times);
  console.log(`non-2xx answers: ${errors}`);
}

const args = process.argv.slice(2);
const api = args.indexOf('--api');
(api >= 0 ? throughApi(args[api + 1]) : inProcess(Number(args[0] ?? 100_000)))
  .then(() => process.exit(0))
  .catch((err) => {
    console.error(err);
    process.exit(1);
  });
