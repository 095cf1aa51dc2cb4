import { test, expect, type Locator } from '@playwright/test';

type Box = { x: number; y: number; width: number; height: number };
const overlap = (a: Box, b: Box) =>
  a.x < b.x + b.width && b.x < a.x + a.width && a.y < b.y + b.height && b.y < a.y + a.height;

/** Every piece of text the chart draws, as the browser measured it. */
async function textBoxes(svg: Locator) {
  return svg.locator('text').evaluateAll((els) =>
    els.map((e) => {
      const r = e.getBoundingClientRect();
      return { text: e.textContent ?? '', x: r.x, y: r.y, width: r.width, height: r.height };
    }),
  );
}

for (const scheme of ['light', 'dark'] as const) {
  test.describe(`charts on a phone, ${scheme}`, () => {
    test.use({ viewport: { width: 390, height: 844 }, colorScheme: scheme });

    test('the yield estimate draws round ticks, whole titles and the reader’s labelled point inside the chart', async ({
      page,
      baseURL,
    }) => {
      await page.context().addCookies([{ name: 'cw_units', value: 'US', url: baseURL! }]);
      await page.goto('/calculators/yield-estimate');
      const svg = page.getByRole('group', { name: 'Delivery against lift' });
      await expect(svg).toBeVisible();
      const box = (await svg.boundingBox())!;
      expect(box.x + box.width).toBeLessThanOrEqual(390);
      // round ticks (Heckbert, "Nice numbers for graph labels", 1990): whole multiples of 1, 2 or 5 × 10^n
      const ticks = (await svg.locator('[data-tick="x"]').allTextContents()).map((t) => Number(t.replace(/,/g, '')));
      const step = ticks[1]! - ticks[0]!;
      expect([1, 2, 5]).toContain(step / 10 ** Math.floor(Math.log10(step)));
      for (const t of ticks) expect(t % step).toBe(0);
      const mark = svg.getByRole('img', { name: /^yours: [\d.,]+ US gal\/(h|min) at lift [\d.,]+ ft$/ });
      await expect(mark).toBeVisible();
      const texts = await textBoxes(svg);
      for (const t of texts) {
        expect(t.x, t.text).toBeGreaterThanOrEqual(box.x - 0.5);
        expect(t.x + t.width, t.text).toBeLessThanOrEqual(box.x + box.width + 0.5);
      }
      expect(texts.map((t) => t.text).join(' ')).not.toMatch(/\de[+-]?\d/);
    });

    test('the drive pipe check’s bars keep every name and value apart', async ({ page, baseURL }) => {
      await page.context().addCookies([{ name: 'cw_units', value: 'metric', url: baseURL! }]);
      await page.goto('/calculators/drive-pipe-check');
      const svg = page.getByRole('group', { name: 'Surge against pipe material' });
      await expect(svg).toBeVisible();
      const texts = await textBoxes(svg);
      expect(texts.length).toBeGreaterThan(6);
      for (let i = 0; i < texts.length; i++)
        for (let j = i + 1; j < texts.length; j++)
          expect(overlap(texts[i]!, texts[j]!), `${texts[i]!.text} / ${texts[j]!.text}`).toBe(false);
      await expect(svg.getByRole('img', { name: /\(yours\): [\d.,]+ (kPa|MPa)$/ })).toHaveCount(1);
    });
  });
}
