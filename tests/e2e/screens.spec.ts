import { test, expect, type Locator, type Page } from '@playwright/test';
import AxeBuilder from '@axe-core/playwright';
import { DEMO_PASSWORD, settled } from '../support/session';

/**
 * The header on a phone and a desktop, the account menu's tools by role, the search
 * results' structure, the forms' messages. Reads the seeded demo; signs up one new
 * account of its own per run.
 */
const PHONE = { width: 390, height: 844 };
const DESKTOP = { width: 1280, height: 900 };

/** Signs a demo account in; the wait allows for a busy test machine (argon2 takes its time on purpose). */
async function signIn(page: Page, email: string) {
  await page.goto('/sign-in');
  const form = page.getByRole('form', { name: 'Sign in with a password' });
  await form.getByLabel('E-mail').fill(email);
  await form.getByLabel('Password').fill(DEMO_PASSWORD);
  await form.getByRole('button', { name: 'Sign in' }).click();
  await expect(page).toHaveURL(/\/$/, { timeout: 20_000 });
}

type Box = { x: number; y: number; width: number; height: number };
const box = async (l: Locator): Promise<Box> => {
  const b = await l.boundingBox();
  expect(b, `${l} has a box`).not.toBeNull();
  return b!;
};
const overlap = (a: Box, b: Box) =>
  a.x < b.x + b.width && b.x < a.x + a.width && a.y < b.y + b.height && b.y < a.y + a.height;

/** The header's parts a reader sees, by what they are. */
function headerParts(page: Page, signedIn: boolean) {
  const banner = page.getByRole('banner');
  const nav = banner.getByRole('navigation', { name: 'Main' });
  return {
    logo: banner.getByRole('link', { name: 'Clackwater', exact: true }),
    links: ['Guides', 'Calculators', 'Questions', 'Field log'].map((name) => nav.getByRole('link', { name })),
    units: banner.getByRole('group', { name: 'Units' }),
    account: signedIn
      ? page.getByTestId('account-menu').locator('summary')
      : banner.getByRole('link', { name: 'Sign in' }),
    search: banner.getByRole('search').or(banner.locator('summary[title="Search"]')).filter({ visible: true }),
  };
}

async function allBoxes(page: Page, signedIn: boolean) {
  const p = headerParts(page, signedIn);
  // a member's menu arrives after hydration and moves the header's other parts as it does:
  // measure the header once it is there, not the parts on either side of that moment
  await expect(p.account, 'account').toBeVisible();
  const named: [string, Locator][] = [
    ['logo', p.logo],
    ...p.links.map((l, i) => [`nav ${i}`, l] as [string, Locator]),
    ['units', p.units],
    ['account', p.account],
    ['search', p.search],
  ];
  const out: [string, Box][] = [];
  for (const [name, l] of named) {
    await expect(l, name).toBeVisible();
    out.push([name, await box(l)]);
  }
  return out;
}

function expectNoOverlap(boxes: [string, Box][], width: number) {
  for (const [name, b] of boxes) {
    expect(b.x, `${name} starts on screen`).toBeGreaterThanOrEqual(0);
    expect(b.x + b.width, `${name} ends on screen`).toBeLessThanOrEqual(width);
  }
  for (let i = 0; i < boxes.length; i++)
    for (let j = i + 1; j < boxes.length; j++)
      expect(overlap(boxes[i][1], boxes[j][1]), `${boxes[i][0]} and ${boxes[j][0]} overlap`).toBe(false);
}

test.describe('the header', () => {
  test('signed in at 1280 px: one row', async ({ page }) => {
    await page.setViewportSize(DESKTOP);
    await signIn(page, 'moss@clackwater.example');
    await settled(page);
    const boxes = await allBoxes(page, true);
    expectNoOverlap(boxes, DESKTOP.width);
    // one row: every part's middle within a few pixels of the logo's (common practice, no source)
    const mid = (b: Box) => b.y + b.height / 2;
    const logoMid = mid(boxes[0][1]);
    for (const [name, b] of boxes) expect(Math.abs(mid(b) - logoMid), `${name} is on the logo's row`).toBeLessThan(6);
  });

  for (const signedIn of [true, false]) {
    test(`${signedIn ? 'signed in' : 'signed out'} at 390 px: nothing overlaps, search is a labelled control`, async ({
      page,
    }) => {
      await page.setViewportSize(PHONE);
      if (signedIn) await signIn(page, 'tamsin@ferncombe.example');
      else await page.goto('/');
      await settled(page);
      expectNoOverlap(await allBoxes(page, signedIn), PHONE.width);

      // touch targets at least 24 px (WCAG 2.2, 2.5.8 Target Size (Minimum))
      const p = headerParts(page, signedIn);
      for (const l of [p.search, p.account, ...p.links, p.units.locator('label').first()]) {
        const b = await box(l);
        expect(b.height).toBeGreaterThanOrEqual(24);
        expect(b.width).toBeGreaterThanOrEqual(24);
      }

      // the search opens under the header as a labelled field and sends its words to /search
      const open = page.getByRole('banner').locator('summary[title="Search"]');
      await expect(open).toHaveAccessibleName('Search');
      await open.click();
      const field = page.getByRole('banner').getByRole('searchbox', { name: 'Search Clackwater' });
      await expect(field).toBeFocused();
      await field.fill('winter');
      await page.keyboard.press('Enter');
      await expect(page).toHaveURL(/\/search\?q=winter/);
    });
  }

  for (const scheme of ['light', 'dark'] as const) {
    test(`focus rings in the header show whole, at 3:1 or more (${scheme})`, async ({ page }) => {
      await page.emulateMedia({ colorScheme: scheme });
      await page.setViewportSize(DESKTOP);
      await page.goto('/');
      await settled(page);
      const header = page.getByRole('banner');
      const link = header.getByRole('link', { name: 'Guides' });
      await link.focus();
      // the ring and the header's background, as the browser computes them
      const seen = await link.evaluate((el) => {
        const s = getComputedStyle(el);
        const bg = getComputedStyle(el.closest('header')!).backgroundColor;
        const r = el.getBoundingClientRect();
        const h = el.closest('header')!.getBoundingClientRect();
        const ring = parseFloat(s.outlineWidth) + parseFloat(s.outlineOffset);
        return {
          style: s.outlineStyle,
          color: s.outlineColor,
          bg,
          inside: r.top - ring >= h.top && r.bottom + ring <= h.bottom && r.left - ring >= h.left,
          clipped: [...document.querySelectorAll('header *')].some(
            (a) => a.contains(el) && a !== el && getComputedStyle(a).overflowX !== 'visible',
          ),
        };
      });
      expect(seen.style).not.toBe('none');
      expect(seen.inside).toBe(true);
      expect(seen.clipped).toBe(false);
      // WCAG 2.x relative luminance and contrast ratio (W3C, WCAG 2.2, 1.4.11 Non-text Contrast: 3:1)
      expect(contrast(seen.color, seen.bg)).toBeGreaterThanOrEqual(3);

      // the unit switch's choice shows focus too, though its radio is visually hidden
      await header.getByRole('radio', { name: 'Metric' }).focus();
      await page.keyboard.press('ArrowLeft');
      const label = header
        .getByRole('group', { name: 'Units' })
        .locator('label')
        .filter({ has: page.locator(':focus') });
      const ring = await label.evaluate((el) => ({
        style: getComputedStyle(el).outlineStyle,
        color: getComputedStyle(el).outlineColor,
        bg: getComputedStyle(el.closest('header')!).backgroundColor,
      }));
      expect(ring.style).not.toBe('none');
      expect(contrast(ring.color, ring.bg)).toBeGreaterThanOrEqual(3);
    });
  }
});

/** Contrast ratio of two CSS rgb() colours: WCAG 2.2's relative luminance formula. */
function contrast(a: string, b: string): number {
  const lum = (c: string) => {
    const [r, g, bl] = c
      .match(/[\d.]+/g)!
      .slice(0, 3)
      .map(Number);
    const lin = (v: number) => {
      const s = v / 255;
      return s <= 0.03928 ? s / 12.92 : ((s + 0.055) / 1.055) ** 2.4;
    };
    return 0.2126 * lin(r) + 0.7152 * lin(g) + 0.0722 * lin(bl);
  };
  const [hi, lo] = [lum(a), lum(b)].sort((x, y) => y - x);
  return (hi + 0.05) / (lo + 0.05);
}

test.describe('the account menu', () => {
  test('a moderator finds the review queue there; the menu closes after going to it', async ({ page }) => {
    await page.setViewportSize(PHONE);
    await signIn(page, 'moss@clackwater.example');
    const menu = page.getByTestId('account-menu');
    await menu.locator('summary').click();
    await expect(menu.getByRole('link', { name: 'Review queue' })).toBeVisible();
    await expect(menu.getByRole('link', { name: 'Expert applications' })).toBeVisible();
    // the admin's rows of the policy table
    await expect(menu.getByRole('link', { name: 'Audit log' })).toHaveCount(0);
    await expect(menu.getByRole('link', { name: 'E-mail outbox' })).toHaveCount(0);
    await menu.getByRole('link', { name: 'Review queue' }).click();
    await expect(page).toHaveURL(/\/review$/);
    await expect(page.getByRole('heading', { level: 1, name: 'Review queue' })).toBeVisible();
    await expect(menu).not.toHaveAttribute('open');
    await expect(menu.getByRole('link', { name: 'Review queue' })).toBeHidden();

    // the review pages carry KaTeX's stylesheet, so a flagged post's math draws once
    const katexStyled = await page.evaluate(() =>
      [...document.styleSheets].some((sheet) => {
        try {
          return [...sheet.cssRules].some((r) => (r as CSSStyleRule).selectorText?.includes('.katex-mathml'));
        } catch {
          return false;
        }
      }),
    );
    expect(katexStyled).toBe(true);
  });

  test('an admin finds members, the audit log and the outbox', async ({ page }) => {
    await signIn(page, 'admin@clackwater.example');
    const menu = page.getByTestId('account-menu');
    await menu.locator('summary').click();
    for (const name of ['Review queue', 'Members and roles', 'Audit log', 'E-mail outbox'])
      await expect(menu.getByRole('link', { name })).toBeVisible();
    await menu.getByRole('link', { name: 'Audit log' }).click();
    await expect(page).toHaveURL(/\/admin\/audit/);
    await expect(menu).not.toHaveAttribute('open');
  });

  test('a member has none of the tools', async ({ page }) => {
    await signIn(page, 'tamsin@ferncombe.example');
    const menu = page.getByTestId('account-menu');
    await menu.locator('summary').click();
    await expect(menu.getByRole('link', { name: 'Settings and notices' })).toBeVisible();
    for (const name of ['Review queue', 'Expert applications', 'Members and roles', 'Audit log', 'E-mail outbox'])
      await expect(menu.getByRole('link', { name })).toHaveCount(0);
    await menu.getByRole('link', { name: 'Settings and notices' }).click();
    await expect(page).toHaveURL(/\/settings$/);
    await expect(menu).not.toHaveAttribute('open');
  });
});

test('search results are one link each: axe finds no nested interactive controls', async ({ page }) => {
  await page.goto('/search?q=drive%20pipe');
  const results = page.getByRole('list', { name: 'Results' });
  await expect(results.getByRole('link').first()).toBeVisible();
  const scan = await new AxeBuilder({ page }).include('#main').analyze();
  expect(scan.violations.filter((v) => v.id === 'nested-interactive')).toEqual([]);
  // and each result item holds exactly one interactive element
  const counts = await results
    .locator(':scope > li')
    .evaluateAll((lis) => lis.map((li) => li.querySelectorAll('a, button, input, select, [tabindex]').length));
  expect(counts.length).toBeGreaterThan(0);
  expect(new Set(counts)).toEqual(new Set([1]));
});

test.describe('forms say our rules', () => {
  test("sign-up gives the handle's rule, not the browser's", async ({ page }) => {
    await page.goto('/sign-up');
    const form = page.getByRole('form', { name: 'Sign up' });
    const handle = form.getByLabel(/Handle/);
    await expect(handle).toHaveAccessibleDescription(/3 to 30 characters: lower-case letters, digits or underscores/);
    await form.getByLabel('E-mail').fill(`rule-${Date.now()}@example.test`);
    await handle.fill('Bad Handle!');
    await form.getByLabel('Display name').fill('Rule Reader');
    await form.getByLabel(/Password/).fill('kettle moss heron ladder');
    await form.getByRole('button', { name: 'Sign up' }).click();
    await expect(form.getByRole('alert')).toHaveText(
      'handle must be 3 to 30 characters: lower-case letters, digits or underscores (_)',
    );
    expect(await handle.evaluate((el: HTMLInputElement) => el.validationMessage)).toBe('');
    await expect(handle).toBeFocused();
  });

  test('"confirm your e-mail first" offers a new link', async ({ page }) => {
    const stamp = Date.now();
    const email = `confirm-${stamp}@example.test`;
    await page.goto('/sign-up');
    const form = page.getByRole('form', { name: 'Sign up' });
    await form.getByLabel('E-mail').fill(email);
    await form.getByLabel(/Handle/).fill(`confirm_${stamp % 1_000_000}`);
    await form.getByLabel('Display name').fill('Waiting Reader');
    await form.getByLabel(/Password/).fill('kettle moss heron ladder');
    await form.getByRole('button', { name: 'Sign up' }).click();
    await expect(page.getByRole('status')).toContainText('Check your e-mail');

    await page.goto('/sign-in');
    const signInForm = page.getByRole('form', { name: 'Sign in with a password' });
    await signInForm.getByLabel('E-mail').fill(email);
    await signInForm.getByLabel('Password').fill('kettle moss heron ladder');
    await signInForm.getByRole('button', { name: 'Sign in' }).click();
    await expect(signInForm.getByRole('alert')).toContainText('Confirm your e-mail first');
    await signInForm.getByRole('button', { name: /E-mail me a new one/ }).click();
    await expect(signInForm.getByRole('status')).toContainText('a new link is on its way');
  });
});
