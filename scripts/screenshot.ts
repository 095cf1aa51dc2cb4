/**
 * Screenshots a page at phone and desktop width for a look by eye.
 *   npx tsx scripts/screenshot.ts http://localhost:3000/questions out-prefix
 */
import { chromium } from '@playwright/test';
import { CHROMIUM_ARGS } from '../playwright.config';

async function main() {
  const [url = 'http://localhost:3000/', prefix = '/tmp/shot', scheme = 'light'] = process.argv.slice(2);
  const browser = await chromium.launch({ executablePath: '/usr/bin/chromium', args: CHROMIUM_ARGS });
  try {
    for (const [name, width, height] of [
      ['phone', 390, 844],
      ['desktop', 1280, 900],
    ] as const) {
      const page = await browser.newPage({ viewport: { width, height }, colorScheme: scheme as 'light' | 'dark' });
      await page.goto(url, { waitUntil: 'networkidle' });
      await page.screenshot({ path: `${prefix}-${name}.png`, fullPage: true });
      await page.close();
      console.log(`${prefix}-${name}.png`);
    }
  } finally {
    await browser.close();
  }
}

main().catch((e) => {
  console.error(e);
  process.exit(1);
});
