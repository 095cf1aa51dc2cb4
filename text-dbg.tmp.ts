import { chromium } from '@playwright/test';
import { CHROMIUM_ARGS } from './playwright.config';
(async () => {
  const browser = await chromium.launch({ executablePath: '/usr/bin/chromium', args: CHROMIUM_ARGS });
  const page = await browser.newPage({ viewport: { width: 390, height: 900 } });
  await page.goto('http://127.0.0.1:3112/calculators/delivery-line', { waitUntil: 'networkidle' });
  await page.getByText('Show the working').first().click();
  await page.waitForSelector('[data-testid=working] .katex');
  console.log(await page.evaluate(() => {
    const el = [...document.querySelectorAll('[data-testid=working] .cw-scroll-x')].find((e) => e.scrollWidth > e.clientWidth)!;
    const cs = getComputedStyle(el);
    return [cs.backgroundImage.slice(0, 300), cs.backgroundAttachment, getComputedStyle(document.documentElement).getPropertyValue('--color-limestone-100'), cs.getPropertyValue('--cw-scroll-bg'), el.scrollWidth, el.clientWidth].join('\n');
  }));
  await browser.close();
})();
