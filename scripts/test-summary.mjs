// Prints one closing line over both runners: "tests: N passed, N failed, N skipped".
import { readFileSync, existsSync } from 'node:fs';

let passed = 0,
  failed = 0,
  skipped = 0,
  missing = 0;
for (const file of process.argv.slice(2)) {
  if (!existsSync(file)) {
    missing++;
    continue;
  }
  const r = JSON.parse(readFileSync(file, 'utf8'));
  if (typeof r.numPassedTests === 'number') {
    // vitest
    passed += r.numPassedTests;
    failed += r.numFailedTests;
    skipped += (r.numPendingTests ?? 0) + (r.numTodoTests ?? 0);
  } else if (r.stats) {
    // playwright
    passed += r.stats.expected ?? 0;
    failed += (r.stats.unexpected ?? 0) + (r.stats.flaky ?? 0);
    skipped += r.stats.skipped ?? 0;
  }
}
if (missing) console.log(`(${missing} runner report(s) missing: a runner did not finish)`);
console.log(`tests: ${passed} passed, ${failed} failed, ${skipped} skipped`);
process.exit(failed > 0 || missing > 0 ? 1 : 0);
