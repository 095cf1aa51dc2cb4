import { expect, type Browser, type Page } from '@playwright/test';

/** Every demo account's password (demo only; README lists the accounts). */
export const DEMO_PASSWORD = 'lift-with-falling-water';

/** Signs a demo account in with its password on this page. */
export async function signIn(page: Page, email: string) {
  await page.goto('/sign-in');
  const form = page.getByRole('form', { name: 'Sign in with a password' });
  await form.getByLabel('E-mail').fill(email);
  await form.getByLabel('Password').fill(DEMO_PASSWORD);
  await form.getByRole('button', { name: 'Sign in' }).click();
  await expect(page).toHaveURL(/\/$/);
}

/** A page in a browser context of its own, signed in as a demo account. */
export async function signedIn(browser: Browser, email: string): Promise<Page> {
  const page = await (await browser.newContext()).newPage();
  await signIn(page, email);
  return page;
}

/** Waits until streamed content has replaced its loading fallback (no hidden copies left). */
export async function settled(page: Page) {
  await page.waitForFunction(() => !document.querySelector('div[hidden][id^="S:"]'));
}
