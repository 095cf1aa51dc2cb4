/**
 * Load benchmark (loopback only, bounded): autocannon against a thread page, the
 * questions list, a guide page and GET /api/search, and a static file served by the
 * same server as the baseline. Then 100 connections for 60 s over the same mix.
 *   bash bench/load.sh            (seeds, builds if needed, serves, runs this)
 *   node --import tsx bench/load.ts http://127.0.0.1:3300 <threadId>
 */
import autocannon, { type Result } from 'autocannon';

const base = process.argv[2] ?? 'http://127.0.0.1:3300';
const thread = process.argv[3] ?? '1';
const SECONDS = Number(process.env.LOAD_SECONDS ?? 10);
const SOAK_SECONDS = Number(process.env.SOAK_SECONDS ?? 60);

const targets = [
  { name: 'static file (baseline)', path: '/static-baseline.txt' },
  { name: 'thread page', path: `/questions/${thread}` },
  { name: 'questions list', path: '/questions?page=3' },
  { name: 'guide page', path: '/guides/the-drive-pipe' },
  { name: 'GET /api/search', path: '/api/search?q=waste%20valve%20stops%20when%20the%20creek%20drops&limit=10' },
];

function run(opts: autocannon.Options): Promise<Result> {
  return new Promise((resolve, reject) => {
    autocannon(opts, (err, res) => (err ? reject(err) : resolve(res)));
  });
}

async function main() {
  // warm every route (compiles nothing in production, but fills caches and the search index)
  for (const t of targets) await fetch(base + t.path);
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
  console.log(`\n20 connections, ${SECONDS} s each, ${base}`);
  console.log('| target | req/s | × static | p50 ms | p99 ms | errors | non-2xx |');
  console.log('|---|---|---|---|---|---|---|');
  for (const r of rows)
    console.log(
      `| ${r.name} | ${r.rps.toFixed(0)} | ${(r.rps / baseline).toFixed(2)} | ${r.p50} | ${r.p99} | ${r.errors} | ${r.non2xx} |`,
    );
  const threadRow = rows[1];
  console.log(
    `thread page: ${((threadRow.rps / baseline) * 100).toFixed(0)}% of the static file's rate (target ≥ 20%), p99 ${threadRow.p99} ms (target < 100 ms)`,
  );

  const soak = await run({
    url: base,
    connections: 100,
    duration: SOAK_SECONDS,
    requests: targets.slice(1).map((t) => ({ method: 'GET', path: t.path })),
  });
  console.log(
    `\n100 connections for ${SOAK_SECONDS} s over the four pages in turn: ${soak.requests.total} requests, ${soak.requests.average.toFixed(0)} req/s, p50 ${soak.latency.p50} ms, p99 ${soak.latency.p99} ms, errors ${soak.errors}, timeouts ${soak.timeouts}, non-2xx ${soak.non2xx} (target: 0, 0, 0)`,
  );
  if (soak.errors || soak.timeouts || soak.non2xx) process.exitCode = 1;
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
