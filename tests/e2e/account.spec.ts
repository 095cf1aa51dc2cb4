import { test, expect } from '@playwright/test';
import { SmtpCatcher, linkIn } from '../support/smtp-catcher';
import { E2E_SMTP_PORT } from '../../playwright.config';
import { openAccountMenu } from '../support/session';

const catcher = new SmtpCatcher(E2E_SMTP_PORT);
test.beforeAll(() => catcher.start());
test.afterAll(() => catcher.stop());

test('sign up, confirm the e-mail from the catcher, sign in with a link, sign out', async ({ page }) => {
  const email = `heron${Date.now()}@linnetmill.example`;
  await page.goto('/sign-up');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Handle (public, on your posts)').fill(`heron_${Date.now() % 100000}`);
  await page.getByLabel('Display name').fill('Heron at Linnet Mill');
  await page.getByLabel('Password (10 characters or more)').fill('weir plank thistle ember');
  await page.getByRole('button', { name: 'Sign up' }).click();
  await expect(page.getByRole('status')).toContainText('Check your e-mail');

  const verify = linkIn(await catcher.waitFor(email, /Confirm your e-mail/), '/verify-email?token=');
  await page.goto(verify.url);
  await expect(page.getByText('Your e-mail is confirmed')).toBeVisible();
  // The link works once.
  await page.goto(verify.url);
  await expect(page.locator('#main').getByRole('alert')).toContainText('already been used');

  await page.goto('/sign-in');
  await page.getByRole('form', { name: 'Sign in with an e-mailed link' }).getByLabel('E-mail').fill(email);
  await page.getByRole('button', { name: 'E-mail me a link' }).click();
  await expect(page.getByText('a sign-in link is on its way')).toBeVisible();
  const link = linkIn(await catcher.waitFor(email, /sign-in link/), '/api/auth/callback/email?');
  await page.goto(link.url);
  await expect(page).toHaveURL(/\/$/);
  await expect(page.getByTestId('account-menu')).toContainText('Heron at Linnet Mill');

  const menu = await openAccountMenu(page);
  await menu.getByRole('button', { name: 'Sign out' }).click();
  await expect(page.getByRole('banner').getByRole('link', { name: 'Sign in' })).toBeVisible();
});

test('a wrong password gets a plain message', async ({ page }) => {
  await page.goto('/sign-in');
  const form = page.getByRole('form', { name: 'Sign in with a password' });
  await form.getByLabel('E-mail').fill('admin@clackwater.example');
  await form.getByLabel('Password').fill('not the right one at all');
  await form.getByRole('button', { name: 'Sign in' }).click();
  await expect(form.getByRole('alert')).toContainText('do not match an account');
});

test('every page carries the security headers', { tag: '@desktop-only' }, async ({ request }) => {
  const res = await request.get('/guides');
  const h = res.headers();
  expect(h['content-security-policy']).toContain("frame-ancestors 'none'");
  expect(h['x-content-type-options']).toBe('nosniff');
  expect(h['referrer-policy']).toBe('strict-origin-when-cross-origin');
});

const DEMO = [
  { email: 'tamsin@ferncombe.example', name: 'Tamsin at Ferncombe', extra: null },
  { email: 'builds@ironwheel.example', name: 'Ironwheel Builds', extra: null },
  { email: 'moss@clackwater.example', name: 'Moss (moderator)', extra: 'Expert applications' },
  { email: 'admin@clackwater.example', name: 'Clackwater admin', extra: 'Members and roles' },
];

async function signInWithPassword(page: import('@playwright/test').Page, email: string) {
  await page.goto('/sign-in');
  const form = page.getByRole('form', { name: 'Sign in with a password' });
  await form.getByLabel('E-mail').fill(email);
  await form.getByLabel('Password').fill('lift-with-falling-water');
  await form.getByRole('button', { name: 'Sign in' }).click();
  await expect(page).toHaveURL(/\/$/);
}

for (const d of DEMO) {
  test(`the demo ${d.name} signs in with the demo password`, async ({ page }) => {
    await signInWithPassword(page, d.email);
    await expect(page.getByTestId('account-menu')).toContainText(d.name);
    if (d.extra) {
      const menu = await openAccountMenu(page);
      await expect(menu.getByRole('link', { name: d.extra })).toBeVisible();
    }
  });
}

test('a signed-in member saves a worked calculation and opens its permalink; a visitor is asked to sign in', async ({
  page,
}) => {
  await page.goto('/calculators/yield-estimate?fall=4+ft&lift=29+ft&driveFlow=2+gal%2Fmin');
  await expect(
    page.locator('[data-calculator="yield-estimate"]').getByRole('link', { name: 'Sign in to save' }),
  ).toBeVisible();
  await signInWithPassword(page, 'tamsin@ferncombe.example');
  await page.goto('/calculators/yield-estimate?fall=4+ft&lift=29+ft&driveFlow=2+gal%2Fmin');
  await page.getByRole('button', { name: 'Save as a worked calculation' }).click();
  await page.getByTestId('saved-calculation').click();
  await expect(page).toHaveURL(/\/calculations\/[0-9A-Za-z]{10}$/);
  await expect(page.getByText('saved by Tamsin at Ferncombe')).toBeVisible();
  await expect(page.locator('[data-testid="calc-unchanged"]:visible')).toBeVisible();
});
