import { test, expect } from '@playwright/test';
import { onPhone, press, signIn } from '../support/session';

test('the community page shows the demo entries on the chart and in the table', async ({ page, request }) => {
  const api = await (await request.get('/api/field-log?perPage=100')).json();
  expect(api.total).toBeGreaterThanOrEqual(30);
  await page.goto('/field-log');
  await expect(page.getByRole('heading', { level: 1, name: 'Field log' })).toBeVisible();
  const chart = page.getByTestId('field-log-chart');
  await expect(chart.locator('[data-entry-id]')).toHaveCount(api.total);
  // on a phone the entries are cards (the sorts and pages are checked by the phone test below)
  if (onPhone()) {
    await expect(page.getByRole('list', { name: 'Field log entries, as cards' }).getByRole('listitem')).toHaveCount(20);
    return;
  }
  // the entries' table, not the chart's own table of its points for screen readers
  const entries = page.getByRole('table', { name: 'Field log entries', exact: true });
  await expect(entries.locator('tbody tr')).toHaveCount(20);
  // sorting by efficiency, highest first, puts the API's best entry on top
  const best = (await (await request.get('/api/field-log?sort=efficiency&dir=desc&perPage=1')).json()).items[0];
  await entries.getByRole('link', { name: 'Efficiency', exact: true }).click();
  await expect(page).toHaveURL(/sort=efficiency/);
  await expect(entries.locator('tbody tr').first()).toHaveAttribute('data-entry-row', String(best.id));
  // the next page keeps the sort
  await page.getByRole('link', { name: 'Next →' }).click();
  await expect(page).toHaveURL(/sort=efficiency.*page=2|page=2.*sort=efficiency/);
  const second = (await (await request.get('/api/field-log?sort=efficiency&dir=desc&perPage=20&page=2')).json())
    .items[0];
  await expect(entries.locator('tbody tr').first()).toHaveAttribute('data-entry-row', String(second.id));
});

test('record a test with three bucket trials, see it on the chart, link it as the after of an earlier test and read the ratio', async ({
  page,
  request,
}) => {
  await signIn(page, 'tamsin@ferncombe.example');
  // signing in applies the member's saved units (US); the header's switch makes them metric, as a member would
  await page.goto('/field-log/new');
  await press(page.getByRole('banner').getByText('Metric'));
  await expect(page.getByText('A bare number is litres')).toBeVisible();
  const form = page.getByRole('form', { name: 'Record a field log test' });
  await form.getByLabel('Site name').fill('Ferncombe top garden');
  await form.getByLabel('Pump size').selectOption('3/4');
  await form.getByLabel('Fall', { exact: true }).fill('1.8 m');
  await form.getByLabel('Lift', { exact: true }).fill('5.4 m');
  await form.getByLabel('Drive pipe length').fill('10 m');
  await form.getByLabel('Drive pipe size').selectOption('3/4');
  await form.getByLabel('Drive pipe material').selectOption('pvc');
  await form.getByLabel('Drive flow (all pumps)').fill('14 L/min');
  const trials = [
    ['2.5', '45'],
    ['2.5', '46'],
    ['2.5', '44'],
  ];
  for (const [i, [vol, s]] of trials.entries()) {
    if (i > 0) await form.getByRole('button', { name: 'Add a trial' }).click();
    await form.getByLabel(`Trial ${i + 1} volume`).fill(vol);
    await form.getByLabel(`Trial ${i + 1} seconds`).fill(s);
  }
  await form.getByRole('button', { name: 'Save the test' }).click();
  await expect(page).toHaveURL(/\/field-log\/\d+$/);
  const id = Number(page.url().split('/').pop());
  // 2.5 L in 45, 46 and 44 s: mean of 3.333, 3.261 and 3.409 L/min = 3.33 L/min (hand calculation)
  await expect(page.getByTestId('delivered')).toHaveText('3.33 L/min');
  // D'Aubuisson q·h/(Q·H) = 3.3344 × 5.4 / (14 × 1.8) = 0.715 (hand calculation from the definition: 18.006 ÷ 25.2 = 0.7145)
  await expect(page.getByTestId('efficiency-d')).toHaveText('0.715');

  await page.goto('/field-log');
  const chart = page.getByTestId('field-log-chart');
  await expect(chart.locator(`[data-entry-id="${id}"]`)).toHaveCount(1);
  // the reader's newest entry carries its own label on the chart, and the key names the reader's points
  await expect(chart.locator(`[data-chart-label="pinned-${id}"]`)).toHaveText(
    /^yours, Ferncombe top garden: 0\.71 at h\/H 3\.0$/,
  );
  await expect(chart.getByRole('list', { name: 'Key' })).toContainText('your entries');

  await page.goto(`/field-log/${id}`);
  const linkForm = page.getByRole('form', { name: 'Link as the after of an earlier test' });
  const beforeId = Number(await linkForm.getByLabel('Before (an earlier test on this site)').inputValue());
  await linkForm.getByLabel('What changed').fill('drive pipe re-laid straighter');
  await linkForm.getByRole('button', { name: 'Link and compare' }).click();
  await expect(page).toHaveURL(new RegExp(`/field-log/compare/${beforeId}/${id}$`));
  const before = await (await request.get(`/api/field-log/${beforeId}`)).json();
  const after = await (await request.get(`/api/field-log/${id}`)).json();
  // the ratio of mean trial flows, after ÷ before
  await expect(page.getByTestId('measured-ratio')).toHaveText(
    `${(after.deliveredFlowM3s / before.deliveredFlowM3s).toFixed(2)}×`,
  );
  await expect(page.getByText('What changed: drive pipe re-laid straighter')).toBeVisible();
  // put the member's saved units back for the tests after this one
  const saved = page.waitForResponse((r) => r.url().endsWith('/api/account/units') && r.ok());
  await press(page.getByRole('banner').getByText('US', { exact: true }));
  await saved;
});

test('the demo one-pump against two-pump comparison shows both ratios', async ({ page, request }) => {
  const list = (await (await request.get('/api/field-log?perPage=100&sort=testedOn&dir=asc')).json()).items as {
    id: number;
    siteName: string;
  }[];
  const [one, two] = list.filter((e) => e.siteName === 'Ferncombe lower meadow');
  await page.goto(`/field-log/compare/${one.id}/${two.id}`);
  const measured = Number((await page.getByTestId('measured-ratio').textContent())?.replace('×', ''));
  // two pumps on one intake and one delivery line: more than one pump gives, less than double (common practice, no source)
  expect(measured).toBeGreaterThan(1.3);
  expect(measured).toBeLessThan(2);
  await expect(page.getByTestId('planner-ratio')).toBeVisible();
});

test('an entry opens the ask form with the site sheet filled from it', async ({ page, request }) => {
  const list = (await (await request.get('/api/field-log?perPage=100&sort=testedOn&dir=asc')).json()).items as {
    id: number;
    siteName: string;
  }[];
  const one = list.find((e) => e.siteName === 'Ferncombe lower meadow')!;
  await signIn(page, 'tamsin@ferncombe.example');
  await page.goto(`/field-log/${one.id}`);
  // this member reads in US units (the header's switch saves it, whatever an earlier test left)
  await press(page.getByRole('banner').getByText('US', { exact: true }));
  await page.getByRole('link', { name: 'Ask a question about this test' }).click();
  await expect(page).toHaveURL(new RegExp(`/questions/ask\\?fieldLog=${one.id}$`));
  await expect(page.getByTestId('from-field-log')).toContainText(`field log entry ${one.id}`);
  // the demo entry's fall and lift (2.4 m and 12 m) in the asker's saved units, US: 2.4 ÷ 0.3048 = 7.87 ft and
  // 12 ÷ 0.3048 = 39.4 ft (NIST SP 811, 2008), rounded as a tape gives them (common practice, no source)
  await expect(page.getByLabel('Fall', { exact: true })).toHaveValue('7.9 ft');
  await expect(page.getByLabel('Lift', { exact: true })).toHaveValue('39 ft');
});

test('on a phone the chart fits, its points answer focus, and the entries are cards with their numbers in view', async ({
  page,
  baseURL,
}) => {
  await page.setViewportSize({ width: 390, height: 844 });
  await page.context().addCookies([{ name: 'cw_units', value: 'metric', url: baseURL! }]);
  await page.goto('/field-log');
  const chart = page.getByTestId('field-log-chart');
  const svg = chart.getByRole('group', { name: 'Field log: efficiency against lift ratio' });
  // laid out at the box's own width once measured: nothing wider than the phone, so no sideways scrolling
  const box = (await svg.boundingBox())!;
  expect(box.x).toBeGreaterThanOrEqual(0);
  expect(box.x + box.width).toBeLessThanOrEqual(390);
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
  // ticks are round numbers (Heckbert 1990): the efficiency axis reads 0.0 to 1.0 in steps of 0.2
  await expect(svg.locator('[data-tick="y"]')).toHaveText(['0.0', '0.2', '0.4', '0.6', '0.8', '1.0']);
  // every axis title whole, inside the svg
  for (const title of await svg.locator('[data-axis-title]').all()) {
    const t = (await title.boundingBox())!;
    expect(t.x).toBeGreaterThanOrEqual(box.x);
    expect(t.x + t.width).toBeLessThanOrEqual(box.x + box.width + 0.5);
  }
  // a point reached by the keyboard shows its numbers beside it; its target is at least 24 px (WCAG 2.2 SC 2.5.8)
  const point = svg.locator('a[data-entry-id]').first();
  const target = (await point.boundingBox())!;
  expect(Math.min(target.width, target.height)).toBeGreaterThanOrEqual(24);
  await point.focus();
  await expect(svg.locator('[data-chart-label="active"]')).toHaveText(/: \d\.\d\d at h\/H\s*\d+\.\d$/);

  // the table gives way to cards that keep the delivery (in the reader's units), efficiency and h/H
  await expect(page.getByRole('table', { name: 'Field log entries' })).toBeHidden();
  const cards = page.getByRole('list', { name: 'Field log entries, as cards' }).getByRole('listitem');
  await expect(cards).toHaveCount(20);
  await expect(cards.first()).toContainText(/Delivered\s*[\d.,]+ L\/(min|h)/);
  await expect(cards.first()).toContainText(/Efficiency\s*0\.\d\d/);
  // the sort row keeps the table's sorts
  await page.getByRole('navigation', { name: 'Sort the field log' }).getByRole('link', { name: 'Efficiency' }).click();
  await expect(page).toHaveURL(/sort=efficiency/);
});
