import { test, expect, type Page } from '@playwright/test';
import { press, settled, signIn } from '../support/session';

/**
 * Issue 24, recording with no signal: a field log test made while the phone is offline
 * is kept on it, says it is waiting, and reaches the server once when the signal is back;
 * a send cut off after the server wrote it, and sent again, is still one entry.
 */
const total = async (page: Page) =>
  ((await (await page.request.get('/api/field-log?perPage=1')).json()) as { total: number }).total;

async function fillTest(page: Page, notes: string) {
  // the member's own site (demo data): the pumps and pipes come filled from its plan
  await page.goto('/field-log/new?site=FerncombeTop18');
  await settled(page);
  const form = page.getByRole('form', { name: 'Record a field log test' });
  await expect(page.getByTestId('entry-site')).toBeVisible();
  await form.getByLabel('Drive flow (all pumps)').fill('5 gal/min');
  // three fills of a 1-gallon can (invented figures)
  for (const [i, s] of ['96', '100', '98'].entries()) {
    if (i > 0) await press(form.getByRole('button', { name: 'Add a trial' }));
    await form.getByLabel(`Trial ${i + 1} volume`).fill('1 gal');
    await form.getByLabel(`Trial ${i + 1} seconds`).fill(s);
  }
  await form.getByLabel('Notes').fill(notes);
  return form;
}

test('a test recorded with no signal waits on the phone and arrives once when it is back', async ({ page }) => {
  await signIn(page, 'tamsin@ferncombe.example');
  const before = await total(page);
  const form = await fillTest(page, 'recorded by the spring with no signal');
  await page.context().setOffline(true);
  await press(form.getByRole('button', { name: 'Save the test' }));
  const kept = page.getByTestId('entry-kept');
  await expect(kept).toContainText('No signal: the test is kept on this phone');
  await expect(kept.getByTestId('outbox')).toContainText('Waiting to send');
  expect(await total(page)).toBe(before);

  await page.context().setOffline(false);
  // the phone's "online" event sends it; the sent entry is linked from the outbox
  await expect(kept.getByTestId('outbox')).toContainText('Nothing waiting');
  await expect(kept.getByRole('link', { name: /^Field log: / })).toHaveAttribute('href', /\/field-log\/\d+$/);
  expect(await total(page)).toBe(before + 1);
});

test('a send cut off after the server wrote it, and sent again, is one entry', async ({ page }) => {
  await signIn(page, 'tamsin@ferncombe.example');
  const before = await total(page);
  let first = true;
  await page.route('**/api/field-log', async (route) => {
    if (route.request().method() !== 'POST' || !first) return route.continue();
    first = false;
    // the request reaches the server and is written; the answer never reaches the phone
    await route.fetch();
    await route.abort('connectionreset');
  });
  const form = await fillTest(page, 'the answer was lost on the way back');
  await press(form.getByRole('button', { name: 'Save the test' }));
  const kept = page.getByTestId('entry-kept');
  await expect(kept).toBeVisible();
  // the outbox sends it again at once, under the same key: the server answers with the first entry
  await expect(kept.getByTestId('outbox')).toContainText('Nothing waiting');
  await expect(kept.getByRole('link', { name: /^Field log: / })).toBeVisible();
  expect(await total(page)).toBe(before + 1);
});
