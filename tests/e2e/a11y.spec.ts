import { test, expect, type Browser, type Page } from '@playwright/test';
import AxeBuilder from '@axe-core/playwright';
import { CALCULATOR_IDS } from '../../lib/calculators/ids';
import { guideSlugs } from '../support/guides';
import { newContext, settled, signIn } from '../support/session';

/**
 * axe on every page, light and dark, in each project's screen (the phone's layout hides
 * and stacks things the desktop's does not). A page fails on any serious or critical
 * violation of WCAG 2.x A/AA; the message names the page, the theme, the rule and the nodes.
 */
const WCAG = ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa', 'wcag22a', 'wcag22aa'];
type Role = 'visitor' | 'member' | 'moderator' | 'admin';
const ACCOUNT: Record<Exclude<Role, 'visitor'>, string> = {
  member: 'tamsin@ferncombe.example',
  moderator: 'moss@clackwater.example',
  admin: 'admin@clackwater.example',
};

async function violations(page: Page, where: string): Promise<string[]> {
  const out: string[] = [];
  for (const scheme of ['light', 'dark'] as const) {
    await page.emulateMedia({ colorScheme: scheme });
    // let transitions settle on the new colours before measuring contrast
    await page.waitForTimeout(50);
    expect(await page.evaluate(() => matchMedia('(prefers-color-scheme: dark)').matches), `${where} in ${scheme}`).toBe(
      scheme === 'dark',
    );
    const results = await new AxeBuilder({ page }).withTags(WCAG).analyze();
    expect(results.passes.length, `axe ran on ${where}`).toBeGreaterThan(5);
    for (const v of results.violations) {
      if (v.impact !== 'serious' && v.impact !== 'critical') continue;
      for (const n of v.nodes.slice(0, 5)) {
        const why = (n.any[0] ?? n.all[0] ?? n.none[0])?.message ?? v.help;
        out.push(
          `${where} [${scheme}] ${v.id} (${v.impact}): ${n.target.join(' ')} — ${why}\n    ${n.html.slice(0, 160)}`,
        );
      }
      if (v.nodes.length > 5) out.push(`${where} [${scheme}] ${v.id}: … and ${v.nodes.length - 5} more nodes`);
    }
  }
  return out;
}

/** Ids the pages need, read from the API as a reader's browser would. */
async function demoIds(page: Page) {
  const search = await page.request.get(
    `/api/search?${new URLSearchParams({ q: 'Half-inch pump beats for a minute', kind: 'question', limit: '1' })}`,
  );
  const thread = ((await search.json()).items[0] as { url: string }).url;
  const log = (await (await page.request.get('/api/field-log?perPage=100&sort=testedOn&dir=asc')).json()).items as {
    id: number;
    siteName: string;
  }[];
  const [one, two] = log.filter((e) => e.siteName === 'Ferncombe lower meadow');
  return { thread: new URL(thread, 'http://x').pathname, entry: one.id, compare: `${one.id}/${two.id}` };
}

type Ids = Awaited<ReturnType<typeof demoIds>>;
/**
 * `phone: true`: checked in the phone project too. Pages share templates, so the phone
 * checks one page of each kind (its header, menus, tables and forms stack differently);
 * the desktop checks every page.
 */
const PAGES: { path: string | ((ids: Ids) => string); name?: string; as: Role; phone?: boolean }[] = [
  { path: '/', as: 'visitor', phone: true },
  { path: '/guides', as: 'visitor', phone: true },
  // the guide with the most calculators and charts stands for the others on the phone
  ...guideSlugs().map((slug) => ({
    path: `/guides/${slug}`,
    as: 'visitor' as const,
    phone: slug === 'pumps-in-parallel-and-in-stages',
  })),
  { path: '/calculators', as: 'visitor', phone: true },
  ...CALCULATOR_IDS.map((id) => ({
    path: `/calculators/${id}`,
    as: 'visitor' as const,
    phone: id === 'yield-estimate',
  })),
  { path: '/calculations/FerncombeY1', as: 'visitor' },
  // the planner with a wet month given, so its month-by-month table is drawn too
  { path: '/plan?wetFlow=25+gal%2Fmin', name: 'the site planner', as: 'visitor', phone: true },
  // the field kit: its big buttons and pole readings are made for a phone at the water
  { path: '/field-kit', as: 'visitor' },
  { path: '/field-kit/timer', as: 'visitor', phone: true },
  { path: '/field-kit/fall', as: 'visitor', phone: true },
  { path: '/questions', as: 'visitor', phone: true },
  { path: (ids) => ids.thread, name: 'a thread with a site sheet', as: 'visitor' },
  { path: (ids) => ids.thread, name: 'a thread with the answer form', as: 'member', phone: true },
  { path: '/questions/ask', as: 'member', phone: true },
  { path: '/search?q=drive+pipe', as: 'visitor', phone: true },
  { path: '/search?q=zzyzx+quixotic', as: 'visitor' },
  { path: '/tags/stall', as: 'visitor' },
  { path: '/field-log', as: 'visitor', phone: true },
  { path: (ids) => `/field-log/${ids.entry}`, name: 'a field log entry', as: 'visitor', phone: true },
  { path: (ids) => `/field-log/compare/${ids.compare}`, name: 'a field log comparison', as: 'visitor', phone: true },
  { path: '/field-log/new', as: 'member', phone: true },
  // a public demo site with its field log tests against the plan, and the form filled from a site's plan
  { path: '/sites/HcFarPaddock26', name: 'a public site with its tests', as: 'visitor', phone: true },
  { path: '/field-log/new?site=FerncombeTop18', name: 'a test recorded on a site', as: 'member', phone: true },
  { path: '/field-log/import', as: 'member' },
  { path: '/people/ferncombe_tamsin', as: 'visitor' },
  { path: '/safety', as: 'visitor' },
  { path: '/sign-in', as: 'visitor', phone: true },
  { path: '/sign-up', as: 'visitor' },
  { path: '/reset-password', as: 'visitor' },
  { path: '/no-such-page', as: 'visitor' },
  { path: '/settings', as: 'member', phone: true },
  { path: '/experts/apply', as: 'member' },
  { path: '/review', as: 'moderator', phone: true },
  { path: '/review/experts', as: 'moderator' },
  { path: '/admin/audit', as: 'admin', phone: true },
  { path: '/admin/users', as: 'admin', phone: true },
  { path: '/admin/outbox', as: 'admin' },
];

test.describe('no serious or critical accessibility violations', () => {
  const pages = new Map<Role, Page>();
  let ids: Ids;

  /**
   * One signed-in page per role, kept across the file's tests (one worker runs them in
   * order; after a failure the new worker signs in again): signing in for each page would
   * double the run.
   */
  async function pageAs(browser: Browser, role: Role): Promise<Page> {
    let page = pages.get(role);
    if (!page) {
      page = await (await newContext(browser)).newPage();
      if (role !== 'visitor') await signIn(page, ACCOUNT[role]);
      pages.set(role, page);
    }
    return page;
  }

  test.beforeAll(async ({ browser }) => {
    ids = await demoIds(await pageAs(browser, 'visitor'));
  });
  test.afterAll(async () => {
    for (const page of pages.values()) await page.context().close();
  });

  for (const p of PAGES) {
    // the phone project leaves out `@desktop-only` (playwright.config.ts)
    const tag = p.phone ? [] : ['@desktop-only'];
    test(`${p.name ?? p.path} as ${p.as}`, { tag }, async ({ browser }) => {
      const path = typeof p.path === 'string' ? p.path : p.path(ids);
      const page = await pageAs(browser, p.as);
      await page.emulateMedia({ colorScheme: 'light' });
      await page.goto(path);
      await page.waitForLoadState('networkidle');
      await settled(page);
      const found = await violations(page, `${path} (${p.as})`);
      expect(found, `axe violations:\n${found.join('\n')}`).toEqual([]);
    });
  }
});
