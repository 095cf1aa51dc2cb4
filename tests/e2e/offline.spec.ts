import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { test, expect, type Page } from '@playwright/test';
import { newContext, openAccountMenu, press, settled, signIn } from '../support/session';

/**
 * Issue 24's installable field kit: the service worker (app/sw.ts) keeps the public pages a
 * reader has opened, so they work with no signal, and never keeps a member's own pages.
 */

const GUIDE = '/guides/how-a-ram-pump-works';
const firstCard = (page: Page) => page.locator('[data-calculator="yield-estimate"]').first();
const delivered = (page: Page) => firstCard(page).locator('[data-result="Delivered"]');

/** Waits until the worker has installed (precache done) and controls this page. */
async function controlled(page: Page) {
  await page.waitForFunction(() => navigator.serviceWorker.controller?.state === 'activated');
}

/** Every URL in the page's Cache Storage, across caches. */
function cachedUrls(page: Page): Promise<string[]> {
  return page.evaluate(async () => {
    const out: string[] = [];
    for (const name of await caches.keys()) {
      for (const req of await (await caches.open(name)).keys()) out.push(new URL(req.url).pathname);
    }
    return out;
  });
}

test('after one visit a guide computes and the trial timer works with no signal', async ({
  page,
  context,
  baseURL,
}) => {
  await context.addCookies([{ name: 'cw_units', value: 'US', url: baseURL! }]);
  await page.goto(GUIDE);
  await controlled(page);
  // the first page loaded before the worker; opened again, it goes through it and is kept
  await page.reload();
  await page.goto('/field-kit/timer');
  await settled(page);
  await expect.poll(() => cachedUrls(page)).toEqual(expect.arrayContaining([GUIDE, '/field-kit/timer']));

  await context.setOffline(true);
  await page.goto(GUIDE);
  await expect(page.getByRole('heading', { level: 1, name: 'How a ram pump works' })).toBeVisible();
  const card = firstCard(page);
  await card.scrollIntoViewIfNeeded();
  const before = await delivered(page).textContent();
  await card.getByLabel('Lift (delivery head)', { exact: true }).fill('40');
  await expect(delivered(page)).not.toHaveText(before ?? '');

  await page.clock.install({ time: Date.UTC(2026, 5, 1, 9) });
  await page.goto('/field-kit/timer');
  await settled(page);
  await page.clock.pauseAt(Date.UTC(2026, 5, 1, 9, 1));
  const timer = page.getByTestId('trial-timer');
  await press(timer.getByRole('button', { name: '5 US gal' }));
  const tap = timer.getByTestId('trial-tap');
  await press(tap);
  await page.clock.runFor(12_000);
  await press(tap);
  await expect(timer.getByRole('list', { name: 'Trials' }).getByRole('listitem')).toHaveCount(1);
  // 5 US gal in 12 s is 25 US gal/min (5 × 60 / 12, arithmetic by hand)
  await expect(timer.getByTestId('trial-result')).toContainText('25 US gal/min');

  // a page never opened is not there: the worker itself is offline too, and says so
  await page.goto('/guides/the-delivery-line');
  await expect(page.getByRole('heading', { level: 1, name: /No signal/ })).toBeVisible();
  await context.setOffline(false);
});

test('the manifest and the worker pass Chromium’s installability checks', async ({ playwright, request }) => {
  // a profile on disk: Playwright's usual contexts are off the record, which Chromium
  // reports as an installability error no site can change
  const use = test.info().project.use;
  const profile = mkdtempSync(path.join(tmpdir(), 'cw-install-'));
  const context = await playwright.chromium.launchPersistentContext(profile, {
    ...use.launchOptions,
    baseURL: use.baseURL,
    viewport: use.viewport,
    deviceScaleFactor: use.deviceScaleFactor,
    isMobile: use.isMobile,
    hasTouch: use.hasTouch,
  });
  const page = await context.newPage();
  await page.goto('/field-kit');
  const href = await page.locator('link[rel="manifest"]').getAttribute('href');
  expect(href).toBe('/manifest.webmanifest');
  const res = await request.get(href!);
  expect(res.ok()).toBe(true);
  const manifest = await res.json();
  expect(manifest).toMatchObject({
    name: 'Clackwater',
    short_name: 'Clackwater',
    start_url: '/field-kit',
    display: 'standalone',
    // DESIGN.md "Look": deep creek slate and limestone
    theme_color: '#1f3a3d',
    background_color: '#f4f1ea',
  });
  const icons = manifest.icons as { src: string; sizes: string; purpose?: string; type: string }[];
  // Chromium's installability check asks for a 192 px and a 512 px icon (web.dev, "Install criteria")
  for (const [sizes, purpose] of [
    ['192x192', 'any'],
    ['512x512', 'any'],
    ['512x512', 'maskable'],
  ]) {
    const icon = icons.find((i) => i.sizes === sizes && i.purpose === purpose);
    expect(icon, `${sizes} ${purpose}`).toBeTruthy();
    const got = await request.get(icon!.src);
    expect(got.ok()).toBe(true);
    expect(got.headers()['content-type']).toBe('image/png');
  }

  await controlled(page);
  const script = await page.evaluate(async () => (await navigator.serviceWorker.getRegistration())?.active?.scriptURL);
  expect(new URL(script!).pathname).toBe('/sw.js');
  // the worker handles navigations once it controls the page
  const again = await page.reload();
  expect(again?.fromServiceWorker()).toBe(true);

  const cdp = await context.newCDPSession(page);
  const { errors } = (await cdp.send('Page.getAppManifest')) as { errors: unknown[] };
  expect(errors).toEqual([]);
  const { installabilityErrors } = (await cdp.send('Page.getInstallabilityErrors')) as {
    installabilityErrors: { errorId: string }[];
  };
  expect(installabilityErrors).toEqual([]);
  await context.close();
  rmSync(profile, { recursive: true, force: true });
});

/** The URLs in each cache of the page's Cache Storage, by the cache's name. */
function cachesByName(page: Page): Promise<Record<string, string[]>> {
  return page.evaluate(async () => {
    const out: Record<string, string[]> = {};
    for (const name of await caches.keys())
      out[name] = (await (await caches.open(name)).keys()).map((r) => new URL(r.url).pathname);
    return out;
  });
}
const memberCaches = async (page: Page) =>
  Object.entries(await cachesByName(page)).filter(([name]) => name.startsWith('clackwater-member-'));

test('one member’s pages are never kept for the next member on the same phone', async ({ browser }) => {
  const context = await newContext(browser);
  const page = await context.newPage();
  await signIn(page, 'tamsin@ferncombe.example');
  await controlled(page);
  await page.goto(GUIDE);
  await page.goto('/sites/FerncombeTop18');
  await expect(page.getByRole('heading', { level: 1, name: 'Ferncombe top garden' })).toBeVisible();
  await page.goto('/settings');
  await expect(page.getByText('Signed in as @ferncombe_tamsin').first()).toBeVisible();
  // opened again now the worker controls every navigation; her site kept for offline
  await page.goto('/sites/FerncombeTop18');
  await settled(page);
  const keep = page.getByTestId('keep-offline');
  await press(keep.getByRole('button', { name: 'Keep for offline' }));
  await expect(keep).toHaveAttribute('data-kept', 'kept');
  await page.goto('/settings');
  const whileIn = await cachesByName(page);
  const shared = Object.entries(whileIn).filter(([name]) => !name.startsWith('clackwater-member-'));
  expect(shared.flatMap(([, urls]) => urls)).toContain(GUIDE);
  // her site is in her own cache only, and /settings nowhere
  expect(shared.flatMap(([, urls]) => urls).filter((u) => /^\/(sites|settings)(\/|$)/.test(u))).toEqual([]);
  const mine = await memberCaches(page);
  expect(mine).toHaveLength(1);
  expect(mine[0]![1]).toContain('/sites/FerncombeTop18');
  expect(mine[0]![1].filter((u) => /^\/settings/.test(u))).toEqual([]);

  const menu = await openAccountMenu(page);
  await press(menu.getByRole('button', { name: 'Sign out' }));
  await expect(page.getByRole('banner').getByRole('link', { name: 'Sign in' })).toBeVisible();
  // signing out forgets the kept pages too, her own among them
  await expect.poll(() => cachedUrls(page)).not.toContain(GUIDE);
  await expect.poll(() => memberCaches(page)).toEqual([]);

  await signIn(page, 'cabin@sorrelcreek.example');
  await context.setOffline(true);
  for (const path of ['/sites/FerncombeTop18', '/settings']) {
    await page.goto(path);
    await expect(page.getByRole('heading', { level: 1, name: /No signal/ })).toBeVisible();
    await expect(page.getByText('Ferncombe top garden')).toHaveCount(0);
    await expect(page.getByText('ferncombe_tamsin')).toHaveCount(0);
  }
  expect((await cachedUrls(page)).filter((u) => /^\/(sites|settings|api)(\/|$)/.test(u))).toEqual([]);
  // online, her private site is not there for him either
  await context.setOffline(false);
  await page.goto('/sites/FerncombeTop18');
  await expect(page.getByText('Ferncombe top garden')).toHaveCount(0);
  await context.close();
});

test('a member’s kept site is dropped when another member signs in without a sign-out', async ({ browser }) => {
  const context = await newContext(browser);
  const page = await context.newPage();
  await signIn(page, 'tamsin@ferncombe.example');
  await controlled(page);
  await page.goto('/sites/FerncombeTop18');
  await settled(page);
  const keep = page.getByTestId('keep-offline');
  await press(keep.getByRole('button', { name: 'Keep for offline' }));
  await expect(keep).toHaveAttribute('data-kept', 'kept');
  await expect.poll(async () => (await memberCaches(page)).length).toBe(1);

  // her session ends with no sign-out on this phone (cookies cleared), and he signs in
  await context.clearCookies();
  await signIn(page, 'cabin@sorrelcreek.example');
  await settled(page);
  await expect.poll(() => memberCaches(page)).toEqual([]);
  await context.setOffline(true);
  await page.goto('/sites/FerncombeTop18');
  await expect(page.getByRole('heading', { level: 1, name: /No signal/ })).toBeVisible();
  await expect(page.getByText('Ferncombe top garden')).toHaveCount(0);
  await context.setOffline(false);
  await context.close();
});
