/**
 * Largest Contentful Paint of guides on a phone-sized screen with the CPU slowed four
 * times (Chrome DevTools Protocol `Emulation.setCPUThrottlingRate`), read from the page's
 * own Performance API (`largest-contentful-paint` entries). Loopback: the network is not
 * slowed, so this measures the work the page gives a slow phone's processor.
 *   npx next build, serve the build (node scripts/server.mjs -p 3000), then
 *   npm run bench:lcp -- http://localhost:3000/guides/the-delivery-line [more URLs] [--runs=5]
 * Each run is a fresh browser context (empty cache, as a first visit); the median and
 * the slowest of the runs are reported with the element that was largest.
 */
import { chromium } from '@playwright/test';
import { CHROMIUM_ARGS } from '../playwright.config';

const RATE = 4;
const TARGET_MS = 1500;

interface Paint {
  lcp: number;
  fcp: number;
  element: string;
}

async function main() {
  const args = process.argv.slice(2);
  const runs = Number(args.find((a) => a.startsWith('--runs='))?.slice(7) ?? 5);
  const urls = args.filter((a) => !a.startsWith('--'));
  if (urls.length === 0) urls.push('http://localhost:3000/guides/the-delivery-line');

  const browser = await chromium.launch({ executablePath: '/usr/bin/chromium', args: CHROMIUM_ARGS });
  let worst = 0;
  for (const url of urls) {
    const paints: Paint[] = [];
    // one unmeasured visit first, so the server's own first render of the page is not counted
    await (await fetch(url)).text();
    for (let i = 0; i < runs; i++) {
      const context = await browser.newContext({
        viewport: { width: 390, height: 844 },
        deviceScaleFactor: 3,
        isMobile: true,
        hasTouch: true,
      });
      const page = await context.newPage();
      const cdp = await context.newCDPSession(page);
      await cdp.send('Emulation.setCPUThrottlingRate', { rate: RATE });
      await page.goto(url, { waitUntil: 'load' });
      await page.waitForLoadState('networkidle');
      paints.push(
        await page.evaluate(
          () =>
            new Promise<Paint>((resolve) => {
              let last: (PerformanceEntry & { element?: Element | null }) | undefined;
              new PerformanceObserver((list) => {
                const entries = list.getEntries();
                last = entries[entries.length - 1] as typeof last;
              }).observe({ type: 'largest-contentful-paint', buffered: true });
              // the observer delivers buffered entries in a task of its own
              setTimeout(() => {
                const fcp = performance.getEntriesByName('first-contentful-paint')[0]?.startTime ?? NaN;
                const el = last?.element;
                const element = el
                  ? `<${el.localName}${el.id ? `#${el.id}` : ''}> ${(el.textContent ?? '').trim().slice(0, 50)}`
                  : '(none)';
                resolve({ lcp: last?.startTime ?? NaN, fcp, element });
              }, 200);
            }),
        ),
      );
      await context.close();
    }
    paints.sort((a, b) => a.lcp - b.lcp);
    const median = paints[Math.floor(paints.length / 2)]!;
    const slowest = paints[paints.length - 1]!;
    worst = Math.max(worst, median.lcp);
    const ms = (n: number) => `${Math.round(n)} ms`;
    console.log(`${url} (CPU ÷${RATE}, 390 px, ${runs} cold loads)`);
    console.log(`  LCP median ${ms(median.lcp)}, slowest ${ms(slowest.lcp)}; FCP median ${ms(median.fcp)}`);
    console.log(`  largest element: ${median.element}`);
  }
  await browser.close();
  console.log(worst < TARGET_MS ? `every median under ${TARGET_MS} ms` : `a median is over ${TARGET_MS} ms`);
  if (worst >= TARGET_MS) process.exitCode = 1;
}

main().catch((e) => {
  console.error(e);
  process.exit(1);
});
