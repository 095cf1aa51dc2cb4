import { test, expect } from '@playwright/test';

const verdictOf = (page: import('@playwright/test').Page) =>
  page.locator('[data-calculator="yield-estimate"]').getByTestId('verdict');

test('the yield estimate says works, marginal or won’t work here, and sets an impossible lift apart', async ({
  page,
}) => {
  // 29 ft ÷ 4 ft = 7.25, under 20 (common practice, no source) and 26 (Building Trades Pocketbook table ends at 26)
  await page.goto('/calculators/yield-estimate?fall=4+ft&lift=29+ft');
  await expect(verdictOf(page).getByTestId('verdict-words')).toHaveText(/Works/);
  await expect(verdictOf(page).getByTestId('beyond-range')).toHaveCount(0);

  // 88 ft ÷ 4 ft = 22: past 20 (common practice, no source), short of 26 (Building Trades Pocketbook)
  await page.goto('/calculators/yield-estimate?fall=4+ft&lift=88+ft');
  await expect(verdictOf(page).getByTestId('verdict-words')).toHaveText(/Marginal/);

  // 600 ft ÷ 4 ft = 150 > 26 (Building Trades Pocketbook table ends at 26)
  await page.goto('/calculators/yield-estimate?fall=4+ft&lift=600+ft');
  const v = verdictOf(page);
  await expect(v.getByTestId('verdict-words')).toHaveText(/Won’t work here/);
  await expect(v.getByTestId('beyond-range')).toHaveText(/Outside what the engine can vouch for/);
  await expect(v).toContainText('cannot vouch');
  // drawn apart from a trusted result: a dashed edge, not the calm fill
  expect(await v.evaluate((e) => getComputedStyle(e).borderTopStyle)).toBe('dashed');
  await expect(page.locator('[data-calculator="yield-estimate"]')).not.toContainText(/Engine \d/);
});

test('with the same calculator twice on a page, each label focuses its own field', async ({ page }) => {
  await page.goto('/guides/the-delivery-line');
  const cards = page.locator('[data-calculator="delivery-line"]');
  await expect(cards).toHaveCount(2);
  for (const i of [0, 1]) {
    const card = cards.nth(i);
    await card.scrollIntoViewIfNeeded();
    await card.locator('label', { hasText: /^Lift$/ }).click();
    const focusedIn = await card.evaluate((c) => c.contains(document.activeElement));
    expect(focusedIn).toBe(true);
    await expect(card.getByLabel('Lift', { exact: true })).toBeFocused();
  }
});
