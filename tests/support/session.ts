import {
  expect,
  test,
  type Browser,
  type BrowserContext,
  type BrowserContextOptions,
  type Locator,
  type Page,
} from '@playwright/test';

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

/**
 * A browser context with the running project's screen and base URL: `browser.newContext()`
 * alone opens a 1280-wide desktop whatever the project, so a phone test would turn into a
 * desktop one half-way through.
 */
export function newContext(browser: Browser, options: BrowserContextOptions = {}): Promise<BrowserContext> {
  const use = test.info().project.use;
  return browser.newContext({
    baseURL: use.baseURL,
    viewport: use.viewport,
    isMobile: use.isMobile,
    hasTouch: use.hasTouch,
    deviceScaleFactor: use.deviceScaleFactor,
    ...options,
  });
}

/** Whether this test runs in the phone project (a touch screen). */
export function onPhone(): boolean {
  return Boolean(test.info().project.use.hasTouch);
}

/** Presses a control as this screen's reader would: a tap on a touch screen, a click elsewhere. */
export async function press(target: Locator) {
  if (onPhone()) await target.tap();
  else await target.click();
}

/** Opens the account menu in the header (a tap on a phone) and hands it back. */
export async function openAccountMenu(page: Page): Promise<Locator> {
  const menu = page.getByTestId('account-menu');
  await press(menu.locator('summary'));
  return menu;
}

/** Searches from the header's search box as a reader would: type, then Enter (the phone keyboard's Go). */
export async function headerSearch(page: Page, query: string) {
  // on a phone the field sits behind the header's "Search" button
  if (onPhone()) await press(page.getByRole('banner').locator('summary', { hasText: 'Search' }));
  const box = page.getByRole('banner').getByRole('searchbox', { name: 'Search Clackwater' });
  await box.fill(query);
  await box.press('Enter');
}

/** A page in a browser context of its own, signed in as a demo account. */
export async function signedIn(browser: Browser, email: string): Promise<Page> {
  const page = await (await newContext(browser)).newPage();
  await signIn(page, email);
  return page;
}

/** Waits until streamed content has replaced its loading fallback (no hidden copies left). */
export async function settled(page: Page) {
  await page.waitForFunction(() => !document.querySelector('div[hidden][id^="S:"]'));
}
