import { test, expect } from '@playwright/test';
import AxeBuilder from '@axe-core/playwright';

const seriousViolations = async (page: import('@playwright/test').Page, include: string) => {
  const results = await new AxeBuilder({ page }).include(include).analyze();
  return results.violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map((v) => `${v.id}: ${v.nodes[0]?.target.join(' ')}`);
};

for (const [width, scheme] of [
  [390, 'light'],
  [1280, 'dark'],
] as const) {
  test(`the ram diagram sits beside the steps, fits and reads at ${width} px (${scheme})`, async ({ page }) => {
    await page.setViewportSize({ width, height: 900 });
    await page.emulateMedia({ colorScheme: scheme });
    await page.goto('/guides/how-a-ram-pump-works');
    const phase = page.locator('[data-ram-diagram="2"]');
    await phase.scrollIntoViewIfNeeded();
    const img = phase.getByRole('img', { name: 'Step 2: the waste valve slams shut' });
    await expect(img).toBeVisible();
    for (const part of ['waste valve', 'snifter', 'air chamber', 'delivery line', 'drive pipe'])
      await expect(img.getByText(part, { exact: true })).toBeVisible();
    // no wider than the page, and the labels no smaller than about 11 px on a phone
    const box = await img.boundingBox();
    expect(box!.x + box!.width).toBeLessThanOrEqual(width);
    const label = await img.getByText('snifter', { exact: true }).boundingBox();
    expect(label!.height).toBeGreaterThanOrEqual(11);
    await expect(page.locator('[data-ram-diagram]')).toHaveCount(5);
    expect(await seriousViolations(page, '[data-ram-diagram]')).toEqual([]);
  });
}

test('the site sketch shows the calculator’s values in the reader’s units and follows the inputs', async ({
  page,
  context,
  baseURL,
}) => {
  await context.addCookies([{ name: 'cw_units', value: 'metric', url: baseURL! }]);
  await page.goto('/calculators/array-planner?fall=4%20ft&lift=29%20ft&driveLength=24%20ft&deliveryLength=150%20ft');
  const card = page.locator('[data-calculator="array-planner"]');
  const sketch = card.getByRole('img', { name: /^Site sketch:/ });
  // 1 ft = 0.3048 m exactly (NIST SP 811, 2008): 4 ft = 1.219 m, 24 ft = 7.315 m, 29 ft = 8.839 m, 150 ft = 45.72 m,
  // re-expressed as a tape gives them: to the cm under 5 m, to 0.1 m under 100 m (common practice, no source)
  for (const text of ['1.22 m', '7.3 m', '8.8 m', '45.7 m'])
    await expect(sketch.getByText(text, { exact: true })).toBeVisible();
  await card.getByLabel('Fall', { exact: true }).fill('2 m');
  await expect(sketch).toHaveAttribute('aria-label', /fall 2 m from the source’s surface/);
  await card.getByLabel('Fall', { exact: true }).fill('');
  await expect(sketch).toHaveAttribute('aria-label', /^Site sketch: fall from the source’s surface/);
  expect(await seriousViolations(page, '[data-site-sketch]')).toEqual([]);
});
