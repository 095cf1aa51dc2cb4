import { test, expect } from '@playwright/test';
import { signIn } from '../support/session';

// A demo account no other spec reads units from; the last step puts it back on US.
const EMAIL = 'cabin@sorrelcreek.example';

test('one unit preference: the header’s switch saves it, Settings shows it, a new browser signs in to it', async ({
  browser,
  baseURL,
}) => {
  const first = await browser.newContext();
  const page = await first.newPage();
  await signIn(page, EMAIL);
  const banner = page.getByRole('banner');
  await expect(banner.getByRole('radio', { name: 'US' })).toBeChecked();

  // Switching in the header while signed in saves the choice on the account.
  const saved = page.waitForResponse((r) => r.url().endsWith('/api/account/units') && r.request().method() === 'PUT');
  await banner.getByText('Metric').click();
  expect((await saved).status()).toBe(200);
  await page.goto('/settings');
  await expect(page.getByRole('radio', { name: 'Metric (m, L)' })).toBeChecked();
  await expect(page.getByRole('radio', { name: 'US (ft, gal)' })).not.toBeChecked();
  await first.close();

  // A fresh browser that last read the site in US units signs in: the saved choice wins,
  // on the server-drawn pages as well as in the browser.
  const second = await browser.newContext();
  await second.addCookies([{ name: 'cw_units', value: 'US', url: baseURL! }]);
  const other = await second.newPage();
  await signIn(other, EMAIL);
  await expect.poll(async () => (await second.cookies()).find((c) => c.name === 'cw_units')?.value).toBe('metric');
  await expect(other.getByRole('banner').getByRole('radio', { name: 'Metric' })).toBeChecked();

  await other.goto('/calculators/yield-estimate');
  const card = other.locator('[data-calculator="yield-estimate"]');
  // the card's default 4 ft opens as a metric tape gives it: 1.22 m (4 × 0.3048 m, NIST SP 811; to the cm,
  // common practice, no source)
  await expect(card.getByLabel('Fall (supply head) unit')).toHaveValue('m');
  await expect(card.getByLabel('Fall (supply head)', { exact: true })).toHaveValue('1.22');

  // the field log is drawn on the server from the cookie: its flows are in litres, not US gallons
  const html = await (await other.request.get('/field-log')).text();
  expect(html).toMatch(/L\/(min|h)/);
  expect(html).not.toMatch(/US gal\//);

  // put the account back as the seed has it, through the same switch
  const back = other.waitForResponse((r) => r.url().endsWith('/api/account/units') && r.request().method() === 'PUT');
  await other.getByRole('banner').getByText('US', { exact: true }).click();
  expect((await back).status()).toBe(200);
  await second.close();
});
