import { test, expect, type Page } from '@playwright/test';
import { newContext, press } from '../support/session';
import { guideSlugs } from '../support/guides';

const firstCard = (page: Page) => page.locator('[data-calculator="yield-estimate"]').first();
const delivered = (page: Page) => firstCard(page).locator('[data-result="Delivered"]');

test('the beginner’s journey: a checked guide, its caution, a live calculator, units and a share link', async ({
  page,
  browser,
}) => {
  await page.goto('/guides/how-a-ram-pump-works');
  await expect(page.getByRole('heading', { level: 1, name: 'How a ram pump works' })).toBeVisible();
  const status = page.getByTestId('safety-check-status');
  await expect(status).toContainText('Safety checked');
  await expect(status).toContainText('checked by Ironwheel Builds on');
  await expect(page.getByRole('note').first()).toBeVisible();

  // Change an input and see the result change.
  const card = firstCard(page);
  await card.scrollIntoViewIfNeeded();
  const before = await delivered(page).textContent();
  await card.getByLabel('Lift (delivery head)', { exact: true }).fill('40');
  await expect(delivered(page)).not.toHaveText(before ?? '');
  await expect(delivered(page)).toContainText('US gal/h');

  // Switch units for the whole site: the same fall shows in metres, as a tape gives it (4 ft = 1.22 m).
  await press(page.getByRole('banner').getByText('Metric'));
  await expect(card.getByLabel('Fall (supply head)', { exact: true })).toHaveValue('1.22');
  await expect(card.getByLabel('Fall (supply head) unit')).toHaveValue('m');
  await expect(card.getByLabel('Lift (delivery head)', { exact: true })).toHaveValue('12.2');
  await expect(delivered(page)).toContainText('L/h');
  const metricResult = await delivered(page).textContent();

  // The share link opens the same inputs and result in a fresh page.
  const href = await card.getByTestId('yield-estimate-share').getAttribute('href');
  expect(href).toMatch(/^\/calculators\/yield-estimate\?/);
  const fresh = await newContext(browser);
  await fresh.addCookies([{ name: 'cw_units', value: 'metric', url: new URL(page.url()).origin }]);
  const other = await fresh.newPage();
  await other.goto(new URL(href!, page.url()).toString());
  const card2 = firstCard(other);
  await expect(card2.getByLabel('Fall (supply head)', { exact: true })).toHaveValue('1.22');
  await expect(card2.getByLabel('Lift (delivery head)', { exact: true })).toHaveValue('12.2');
  await expect(delivered(other)).toHaveText(metricResult ?? '');
  await fresh.close();
});

test('show the working opens the steps in KaTeX', async ({ page }) => {
  await page.goto('/calculators/yield-estimate?fall=4+ft&lift=29+ft&driveFlow=2+gal%2Fmin&efficiency=0.6');
  await page.getByText('Show the working').click();
  await expect(page.getByTestId('working').locator('.katex').first()).toBeVisible();
});

test('a guide changed since its last safety check says so, with the history', async ({ page }) => {
  await page.goto('/guides/the-drive-pipe');
  const status = page.getByTestId('safety-check-status');
  await expect(status).toContainText('Changed since its last safety check');
  await status.getByText(/History of safety checks/).click();
  await expect(status).toContainText('an earlier version');
  await page.goto('/guides/surveying-fall-and-flow');
  await expect(page.getByTestId('safety-check-status')).toContainText('Not yet checked');
});

test('the guide index filters by level and tag', async ({ page }) => {
  await page.goto('/guides');
  // every guide in content/guides is listed
  await expect(page.getByTestId('guide-list').getByRole('listitem')).toHaveCount(guideSlugs().length);
  await page.getByRole('navigation', { name: 'Filter guides' }).getByRole('link', { name: 'advanced' }).click();
  await expect(page.getByTestId('guide-list').getByRole('listitem')).toHaveCount(1);
  await expect(page.getByRole('link', { name: 'Pumps in parallel and in stages' })).toBeVisible();
});

test('a saved worked calculation recomputes with the current engine', async ({ page }) => {
  await page.goto('/calculations/FerncombeY1');
  await expect(page.locator('[data-testid="calc-unchanged"]:visible')).toBeVisible();
  await expect(page.locator('[data-calculator="yield-estimate"]')).toBeVisible();
});

// accessibility of these pages: tests/e2e/a11y.spec.ts
test('at phone width a guide with calculators fits the screen', { tag: '@phone-only' }, async ({ page }) => {
  for (const path of ['/guides/pumps-in-parallel-and-in-stages', '/guides/when-it-stops-cycling', '/questions']) {
    await page.goto(path);
    await page.waitForLoadState('networkidle');
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
    expect(overflow, `${path} is wider than the phone`).toBeLessThanOrEqual(0);
  }
});

/** How many of one system's passages a reader can see (display:none hides them from sight and screen readers). */
const shown = (page: Page, system: 'US' | 'metric') =>
  page
    .locator(`[data-units-only="${system}"]`)
    .evaluateAll((els) => els.filter((e) => getComputedStyle(e).display !== 'none').length);

test('a guide shows only the reader’s units, from the first paint, and follows the switch', async ({
  browser,
  baseURL,
}) => {
  const ctx = await browser.newContext({ baseURL });
  const page = await ctx.newPage();
  await ctx.addCookies([{ name: 'cw_units', value: 'metric', url: new URL(baseURL!).origin }]);
  // scripts other than the first-paint one never run here: the units must not wait for hydration
  await page.route('**/_next/static/**/*.js', (route) => route.abort());
  await page.goto('/guides/how-a-ram-pump-works');
  await expect(page.locator('html')).toHaveAttribute('data-units', 'metric');
  const body = page.locator('.guide-body');
  await expect(body.getByText('8.84 × 9.81 ≈ 87 kPa')).toBeVisible();
  await expect(body.getByText('29 × 0.434 ≈ 12.6 psi')).toBeHidden();
  expect(await shown(page, 'US')).toBe(0);
  expect(await shown(page, 'metric')).toBeGreaterThan(5);
  await page.unrouteAll();

  // hydrated, the switch in the header brings the US text back without a reload
  await page.goto('/guides/how-a-ram-pump-works');
  await page.waitForLoadState('networkidle');
  await page.getByRole('banner').getByText('US', { exact: true }).click();
  await expect(page.locator('html')).toHaveAttribute('data-units', 'US');
  await expect(body.getByText('29 × 0.434 ≈ 12.6 psi')).toBeVisible();
  expect(await shown(page, 'metric')).toBe(0);
  expect(await shown(page, 'US')).toBeGreaterThan(5);
  await ctx.close();
});
