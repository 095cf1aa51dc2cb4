/**
 * First-load JavaScript of a guide page, gzipped.
 *   npx next build && node scripts/server.mjs -p 3000 &   then
 *   npx tsx bench/guide-first-load.ts http://localhost:3000/guides/the-delivery-line [--files]
 * "First load" is what Next counts: the scripts the page's HTML names (script tags and
 * script preloads). The live calculator cards (engine, zod, charts) load after hydration
 * and KaTeX on "show the working"; the bench reports those separately, as a browser
 * fetches them. Target (issue 23): 150 kB or less. What each chunk holds: bench/chunk-sources.ts.
 */
import { gzipSync } from 'node:zlib';
import { chromium } from '@playwright/test';
import { CHROMIUM_ARGS } from '../playwright.config';

async function gz(url: string): Promise<number> {
  const res = await fetch(url);
  return gzipSync(Buffer.from(await res.arrayBuffer()), { level: 9 }).length;
}

async function main() {
  const url = process.argv[2] ?? 'http://localhost:3000/guides/the-delivery-line';
  const html = await (await fetch(url)).text();
  const named = new Set<string>();
  // nomodule scripts are polyfills that current browsers never fetch
  for (const m of html.matchAll(/<script([^>]+)src="([^"]+)"([^>]*)>/g)) {
    if (!/nomodule/i.test(m[1] + m[3])) named.add(new URL(m[2], url).toString());
  }
  for (const m of html.matchAll(
    /<link[^>]+rel="preload"[^>]+as="script"[^>]*href="([^"]+)"|<link[^>]+href="([^"]+\.js)"[^>]+rel="preload"/g,
  )) {
    named.add(new URL(m[1] ?? m[2], url).toString());
  }
  const firstSizes = await Promise.all([...named].map(async (u) => [u, await gz(u)] as const));
  const first = firstSizes.reduce((a, [, n]) => a + n, 0);

  const browser = await chromium.launch({ executablePath: '/usr/bin/chromium', args: CHROMIUM_ARGS });
  const page = await browser.newPage();
  const seen = new Set<string>();
  page.on('request', (r) => {
    if (r.resourceType() === 'script') seen.add(r.url());
  });
  await page.goto(url, { waitUntil: 'networkidle' });
  const calculators = await page.locator('[data-calculator]').count();
  const afterIdle = [...seen].filter((u) => !named.has(u));
  await page
    .locator('details:has(> summary:text("Show the working"))')
    .first()
    .evaluate((d: HTMLDetailsElement) => (d.open = true));
  await page.waitForLoadState('networkidle');
  await page.waitForTimeout(500);
  const onWorking = [...seen].filter((u) => !named.has(u) && !afterIdle.includes(u));
  await browser.close();

  const sum = async (list: string[]) => (await Promise.all(list.map(gz))).reduce((a, b) => a + b, 0);
  const kb = (n: number) => (n / 1024).toFixed(1);
  console.log(`${url} (${calculators} calculators)`);
  console.log(`first-load JS (scripts the HTML names): ${kb(first)} kB gzipped in ${named.size} files`);
  console.log(
    `loaded after hydration (the live cards: engine, zod, charts): ${kb(await sum(afterIdle))} kB gzipped in ${afterIdle.length} files`,
  );
  console.log(
    `loaded on "show the working" (KaTeX): ${kb(await sum(onWorking))} kB gzipped in ${onWorking.length} files`,
  );
  if (process.argv.includes('--files'))
    for (const [u, n] of firstSizes.sort((a, b) => b[1] - a[1])) console.log(`  ${kb(n)} kB  ${new URL(u).pathname}`);
}

main().catch((e) => {
  console.error(e);
  process.exit(1);
});
