/**
 * Load benchmark (loopback only, bounded): autocannon against every public page —
 * home, the questions list with each filter and a deep page, a tag page, a thread, a
 * guide, the field log list, search — and a static file served by the same server as
 * the baseline. Then 100 connections for 60 s over the same pages in turn.
 *   bash bench/load.sh            (seeds, builds if needed, serves, runs this)
 *   node --import tsx bench/load.ts http://127.0.0.1:3300 <threadId> [deep list path]
 * ONLY=a,b runs only the targets whose names contain one of the words (the baseline always).
 */
import { loadavg } from 'node:os';
import autocannon, { type Result } from 'autocannon';

const base = process.argv[2] ?? 'http://127.0.0.1:3300';
const thread = process.argv[3] ?? '1';
// a page far back in the newest-first list (bench/load.sh finds one 50,000 questions back)
const deep = process.argv[4] ?? '/questions?page=2500';
const SECONDS = Number(process.env.LOAD_SECONDS ?? 10);
const SOAK_SECONDS = Number(process.env.SOAK_SECONDS ?? 60);
// a page must answer at this share of the static file's rate with p99 under this (issue 23)
const TARGET_RATIO = 0.25;
const TARGET_P99_MS = 100;

const pages = [
  { name: 'home', path: '/' },
  { name: 'questions list, newest, page 3', path: '/questions?page=3' },
  { name: 'questions list, waiting for an answer', path: '/questions?show=unanswered' },
  { name: 'questions list, 50,000 back', path: deep },
  { name: 'tag page', path: '/tags/frost' },
  { name: 'tag page, page 3', path: '/tags/drive-pipe?page=3' },
  { name: 'thread page', path: `/questions/${thread}` },
  { name: 'guide page', path: '/guides/the-drive-pipe' },
  { name: 'field log list', path: '/field-log' },
  { name: 'search page', path: '/search?q=waste%20valve%20stops%20when%20the%20creek%20drops' },
  { name: 'GET /api/search', path: '/api/search?q=waste%20valve%20stops%20when%20the%20creek%20drops&limit=10' },
];
const only = process.env.ONLY?.split(',').filter(Boolean);
const chosen = only ? pages.filter((p) => only.some((w) => p.name.includes(w))) : pages;
const targets = [{ name: 'static file (baseline)', path: '/static-baseline.txt' }, ...chosen];

function run(opts: autocannon.Options): Promise<Result> {
  return new Promise((resolve, reject) => {
    autocannon(opts, (err, res) => (err ? reject(err) : resolve(res)));
  });
}

async function main() {
  // warm every route (compiles nothing in production, but fills caches and the search index)
  // (a few tries: while the server builds its search index at start-up a database
  // connection can time out on a busy machine, and that one answer is a 500)
  for (const t of targets) {
    for (let attempt = 1; ; attempt++) {
      const res = await fetch(base + t.path);
      if (res.ok) break;
      if (attempt === 3) throw new Error(`${t.path} answered ${res.status} before the run`);
      console.error(`${t.path} answered ${res.status} while warming up; trying again`);
      await new Promise((r) => setTimeout(r, 5_000));
    }
  }
  const rows: { name: string; rps: number; p50: number; p99: number; errors: number; non2xx: number }[] = [];
  for (const t of targets) {
    const r = await run({ url: base + t.path, connections: 20, duration: SECONDS });
    rows.push({
      name: t.name,
      rps: r.requests.average,
      p50: r.latency.p50,
      p99: r.latency.p99,
      errors: r.errors + r.timeouts,
      non2xx: r.non2xx,
    });
  }
  const baseline = rows[0].rps;
  // the machine is shared: the load average says how much else ran beside the server
  console.log(
    `\n20 connections, ${SECONDS} s each, ${base}; load average ${loadavg()
      .map((l) => l.toFixed(1))
      .join(', ')}`,
  );
  console.log('| page | req/s | × static | p50 ms | p99 ms | errors | non-2xx | target met |');
  console.log('|---|---|---|---|---|---|---|---|');
  for (const [i, r] of rows.entries()) {
    const met = i === 0 ? '' : r.rps / baseline >= TARGET_RATIO && r.p99 < TARGET_P99_MS ? 'yes' : 'no';
    console.log(
      `| ${r.name} (\`${targets[i].path}\`) | ${r.rps.toFixed(0)} | ${(r.rps / baseline).toFixed(2)} | ${r.p50} | ${r.p99} | ${r.errors} | ${r.non2xx} | ${met} |`,
    );
  }
  if (!SOAK_SECONDS) return;
  const soak = await run({
    url: base,
    connections: 100,
    duration: SOAK_SECONDS,
    requests: targets.slice(1).map((t) => ({ method: 'GET', path: t.path })),
  });
  console.log(
    `\n100 connections for ${SOAK_SECONDS} s over the ${targets.length - 1} pages in turn: ${soak.requests.total} requests, ${soak.requests.average.toFixed(0)} req/s, p50 ${soak.latency.p50} ms, p99 ${soak.latency.p99} ms, errors ${soak.errors}, timeouts ${soak.timeouts}, non-2xx ${soak.non2xx} (target: p99 < 1,000 ms; 0, 0, 0)`,
  );
  console.log(
    `load average after the soak: ${loadavg()
      .map((l) => l.toFixed(1))
      .join(', ')}`,
  );
  if (soak.errors || soak.timeouts || soak.non2xx) process.exitCode = 1;
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
