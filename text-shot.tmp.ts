import { chromium } from '@playwright/test';
import { CHROMIUM_ARGS } from './playwright.config';
async function main() {
  const [url, prefix, units, scheme = 'light', width = '390'] = process.argv.slice(2);
  const browser = await chromium.launch({ executablePath: '/usr/bin/chromium', args: CHROMIUM_ARGS });
  const ctx = await browser.newContext({ viewport: { width: Number(width), height: 900 }, deviceScaleFactor: 2, colorScheme: scheme as 'light' | 'dark' });
  await ctx.addCookies([{ name: 'cw_units', value: units, url }]);
  const page = await ctx.newPage();
  await page.goto(url, { waitUntil: 'networkidle' });
  const summary = page.getByText('Show the working').first();
  await summary.click();
  await page.waitForSelector('[data-testid=working] .katex', { timeout: 15000 });
  const w = page.locator('[data-testid=working] li').nth(Number(process.env.LI ?? 0));
  await w.screenshot({ path: `${prefix}.png` });
  const overflow = await page.evaluate(() => [...document.querySelectorAll('[data-testid=working] .cw-scroll-x')].map((e) => e.scrollWidth > e.clientWidth).filter(Boolean).length);
  const docOverflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
  console.log(prefix, 'scrolling strips:', overflow, 'page overflow px:', docOverflow);
  await browser.close();
}
main().catch((e) => { console.error(e); process.exit(1); });
