import { test, expect } from '@playwright/test';
import { headerSearch } from '../support/session';

test('the header search finds the thread and the guide section for a builder’s question, with the words marked', async ({
  page,
}) => {
  await page.goto('/guides');
  await headerSearch(page, 'Has anyone had a 1-inch pump stop when the creek drops?');
  await expect(page).toHaveURL(/\/search\?q=Has\+anyone/);
  const results = page.getByRole('list', { name: 'Results' });
  const first = results.getByRole('link').first();
  await expect(first).toContainText('1-inch pump stops every dry spell when the creek drops');
  await expect(first.locator('mark').first()).toBeVisible();
  await expect(
    results
      .getByRole('link')
      .filter({ hasText: /^Guide/ })
      .first(),
  ).toBeVisible();
});

test('results follow each keystroke; arrows and Enter open one; filters narrow them', async ({ page }) => {
  await page.goto('/search');
  await expect(page.getByText('Results appear as you type')).toBeVisible();
  const box = page.getByRole('searchbox', { name: 'Search', exact: true });
  await box.pressSequentially('impulse valve', { delay: 30 });
  const results = page.getByRole('list', { name: 'Results' });
  // another name for the waste valve still finds the thread about its weight
  await expect(
    results.getByRole('link').filter({ hasText: 'What weight on the waste valve for 4 ft of fall?' }),
  ).toBeVisible();
  await expect(page).toHaveURL(/q=impulse\+valve/);

  await page.getByLabel('Show').selectOption({ label: 'Guides' });
  await expect(results.getByRole('link').first()).toContainText('Guide');
  await expect(results.getByRole('link').filter({ hasText: /^Question/ })).toHaveCount(0);
  await expect(page).toHaveURL(/kind=guide/);

  await box.focus();
  await page.keyboard.press('ArrowDown');
  await expect(results.getByRole('link').first()).toBeFocused();
  await page.keyboard.press('ArrowDown');
  await expect(results.getByRole('link').nth(1)).toBeFocused();
  await page.keyboard.press('ArrowUp');
  await page.keyboard.press('ArrowUp');
  await expect(box).toBeFocused();
  await page.keyboard.press('ArrowDown');
  // each result is one link, named by its kind and title
  const title = (await results.getByRole('link').first().locator('[id$="t0"]').textContent())!;
  await page.keyboard.press('Enter');
  await expect(page).toHaveURL(/\/guides\//);
  await expect(page.getByRole('heading', { level: 1 })).toContainText(title.split(':')[0]);
});

test('sizes match however they are written; nothing found suggests guides and the ask form', async ({ page }) => {
  await page.goto('/search?q=19%20mm%20drive%20line&kind=question');
  // the demo thread's drive pipe is written ¾" (19.05 mm: ASME B36.10M-2018 nominal sizes)
  const thread = page
    .getByRole('list', { name: 'Results' })
    .getByRole('link')
    .filter({ hasText: 'drive pipe too short?' });
  await expect(thread).toBeVisible();
  await expect(
    thread
      .locator('mark')
      .filter({ hasText: /¾"|3\/4 inch/ })
      .first(),
  ).toBeVisible();

  await page.goto('/search?q=zzyzx%20quixotic');
  const none = page.getByRole('region', { name: 'No results' });
  await expect(none).toContainText('Nothing matched');
  await expect(none.getByRole('link', { name: 'ask the community' })).toHaveAttribute('href', '/questions/ask');

  await page.goto('/search?q=pump&limit=5&level=expert');
  await expect(page.getByRole('alert').filter({ hasText: 'level: one of' })).toBeVisible();
});
