import { test, expect, type Page } from '@playwright/test';
import { SmtpCatcher } from '../support/smtp-catcher';
import { E2E_SMTP_PORT } from '../../playwright.config';
import { newContext, settled, signIn } from '../support/session';
import { wrongUnits, type System } from '../support/unit-words';

/**
 * A US reader sees no metric-only unit and a metric reader no US-only one, anywhere the
 * site draws a number: guides and their calculators, the working, chart axes, questions,
 * site sheets, the ask form's hints, search snippets, the field log and e-mail. Every
 * page's offending strings are listed before the test fails. What is excused (pipe sizes'
 * inch names, a member's own quoted words) is explained in tests/support/unit-words.ts.
 */
const catcher = new SmtpCatcher(E2E_SMTP_PORT);
test.beforeAll(() => catcher.start());
test.afterAll(() => catcher.stop());

/** The reader whose preference is set, both on the account (for e-mail) and by the cookie. */
const READER = 'shepherd@highcrag.example';

/**
 * The text a reader sees, one entry per block: visible text nodes joined by their nearest
 * block (or SVG text) so "4" and "ft" in neighbouring spans read as "4 ft"; the selected
 * option of each select; input values and placeholders; KaTeX by its MathML (the drawn
 * copy splits every glyph). Members' Markdown (.member-text) is their own words; a member's
 * words quoted with the reader's readings in brackets ([data-member-words]) come apart, as
 * `quoted`.
 */
async function visibleBlocks(page: Page): Promise<{ blocks: string[]; quoted: string[] }> {
  return page.evaluate(() => {
    const blocks = new Map<Element, string>();
    const quoted = new Map<Element, string>();
    const skip = 'script, style, noscript, template, option, .member-text, .katex-html, .katex-mathml';
    const blockOf = (el: Element): Element => {
      for (let e: Element | null = el; e; e = e.parentElement) {
        if (e instanceof SVGTextElement) return e;
        if (!(e instanceof SVGElement) && getComputedStyle(e).display !== 'inline') return e;
      }
      return document.body;
    };
    const walker = document.createTreeWalker(document.body, NodeFilter.SHOW_TEXT);
    for (let n = walker.nextNode(); n; n = walker.nextNode()) {
      const parent = n.parentElement;
      if (!parent || !n.textContent?.trim() || parent.closest(skip)) continue;
      if (!parent.checkVisibility({ visibilityProperty: true, opacityProperty: false })) continue;
      const words = parent.closest('[data-member-words]');
      if (words) {
        quoted.set(words, (quoted.get(words) ?? '') + n.textContent);
        continue;
      }
      const block = blockOf(parent);
      blocks.set(block, (blocks.get(block) ?? '') + n.textContent);
    }
    const out = [...blocks.values()];
    // KaTeX by its MathML, written out as a person would type it: 10^(−4) m^(3)/s, so an
    // exponent is never read as a number before a unit
    const tex = (e: Element): string => {
      const kids = [...e.children];
      switch (e.localName) {
        case 'annotation':
          return '';
        case 'mi':
          // a letter in math italic is a variable (L, h_m), not a unit: units are set upright
          return !e.getAttribute('mathvariant') && (e.textContent ?? '').length === 1
            ? `_${e.textContent}`
            : (e.textContent ?? '');
        case 'mn':
        case 'mo':
        case 'mtext':
          return e.textContent ?? '';
        case 'msup': {
          const sup = tex(kids[1]);
          // squares and cubes as a unit writes them (m³), other powers bracketed
          return `${tex(kids[0])}${{ '2': '²', '3': '³' }[sup] ?? `^(${sup})`}`;
        }
        case 'msub':
          return `${tex(kids[0])}_(${tex(kids[1])})`;
        case 'mfrac': {
          // one symbol or number needs no brackets: L/D, as a person types it
          const side = (k: Element) => {
            const t = tex(k);
            return /^[\p{L}\p{N}.,]+$/u.test(t) ? t : `(${t})`;
          };
          return `${side(kids[0])}/${side(kids[1])}`;
        }
        default:
          return kids.map(tex).join(' ');
      }
    };
    // a formula in the other system's passage (ForUnits) is hidden with it
    for (const math of document.querySelectorAll('.katex-mathml math'))
      if (math.closest('.katex')?.checkVisibility()) out.push(tex(math));
    for (const el of document.querySelectorAll('select, input, textarea')) {
      if (!(el as HTMLElement).checkVisibility()) continue;
      if (el instanceof HTMLSelectElement) out.push(el.selectedOptions[0]?.textContent ?? '');
      else if (el instanceof HTMLInputElement || el instanceof HTMLTextAreaElement) {
        // what the reader typed into search is their own words
        if (!['checkbox', 'radio', 'hidden', 'password', 'search'].includes(el.type)) out.push(el.value);
        if (el.placeholder) out.push(el.placeholder);
      }
    }
    const tidy = (list: string[]) => list.map((t) => t.replace(/\s+/g, ' ').trim()).filter(Boolean);
    return { blocks: tidy(out), quoted: tidy([...quoted.values()]) };
  });
}

async function check(page: Page, where: string, system: System, found: string[]) {
  await settled(page);
  await page.waitForLoadState('networkidle');
  // A guide's calculators are shells in its HTML and live cards once React has fetched them:
  // read the page when every card is live and hydrated, not the first paint before it.
  await page.waitForFunction(
    () =>
      !document.querySelector('[data-calculator-shell]') &&
      [...document.querySelectorAll('header[data-site-header] button, [data-calculator]')].every((el) =>
        Object.keys(el).some((k) => k.startsWith('__reactFiber')),
      ),
  );
  await page.evaluate(() => new Promise((done) => requestAnimationFrame(() => requestAnimationFrame(done))));
  const { blocks, quoted } = await visibleBlocks(page);
  for (const block of blocks) for (const hit of wrongUnits(block, system)) found.push(`${where}: ${hit}`);
  for (const words of quoted)
    for (const hit of wrongUnits(words, system, { quoted: true })) found.push(`${where} (quoted): ${hit}`);
}

/** Ids of demo pages, from the API as the pages themselves get them. */
async function demo(page: Page) {
  const search = await page.request.get(
    `/api/search?${new URLSearchParams({ q: 'Second pump added, delivery only went up a little', kind: 'question', limit: '1' })}`,
  );
  const thread = new URL(((await search.json()).items[0] as { url: string }).url, 'http://x').pathname;
  const log = (await (await page.request.get('/api/field-log?perPage=100&sort=testedOn&dir=asc')).json()).items as {
    id: number;
  }[];
  return { thread, entry: log[0].id };
}

/** The reader's account preference, through the settings form as they would set it. */
async function setAccountUnits(page: Page, system: System) {
  await page.goto('/settings');
  await settled(page);
  // the settings form's choice, not the header's switch
  await page
    .locator('#main')
    .getByRole('radio', { name: system === 'US' ? /^US/ : /^Metric/ })
    .check();
  await page.getByRole('button', { name: 'Save settings' }).click();
  await expect(page.getByRole('status').filter({ hasText: 'Saved' }).first()).toBeVisible();
}

/** A site sheet in the reader's own units: 5 ft ≈ 1.5 m of fall, 45 ft ≈ 14 m of lift (common practice, no source). */
const SHEET = {
  US: { fall: '5 ft', lift: '45 ft', length: '30 ft' },
  metric: { fall: '1.5 m', lift: '14 m', length: '9 m' },
};

for (const system of ['US', 'metric'] as const) {
  test(`a ${system} reader sees only ${system} units`, async ({ browser, baseURL }) => {
    test.setTimeout(240_000);
    const found: string[] = [];
    const context = await newContext(browser);
    const page = await context.newPage();
    await signIn(page, READER);
    await setAccountUnits(page, system);
    await context.addCookies([{ name: 'cw_units', value: system, url: baseURL! }]);
    try {
      const ids = await demo(page);

      // guides with calculators and charts
      for (const slug of [
        'how-a-ram-pump-works',
        'pumps-in-parallel-and-in-stages',
        'the-delivery-line',
        'surveying-fall-and-flow',
        'choosing-a-pump-size',
        'the-intake-and-supply',
        'building-a-ram-from-fittings',
      ]) {
        await page.goto(`/guides/${slug}`);
        await check(page, `/guides/${slug}`, system, found);
      }

      // a calculator with an input changed and the working open
      await page.goto('/calculators/yield-estimate');
      await settled(page);
      const card = page.locator('[data-calculator="yield-estimate"]').first();
      const lift = card.getByLabel('Lift (delivery head)', { exact: true });
      await lift.fill(String(Number(await lift.inputValue()) * 1.5));
      await page.getByText('Show the working').first().click();
      await expect(page.getByTestId('working').locator('.katex').first()).toBeVisible();
      await check(page, '/calculators/yield-estimate (lift changed, working open)', system, found);
      for (const id of ['array-planner', 'delivery-line', 'drive-pipe-check', 'source-flow', 'demand-and-storage']) {
        await page.goto(`/calculators/${id}`);
        await check(page, `/calculators/${id}`, system, found);
      }

      // the site planner, its month-by-month table and working open
      await page.goto(`/plan?${new URLSearchParams({ wetFlow: '25 gal/min' })}`);
      await settled(page);
      await page.getByText('Show the working').first().click();
      await check(page, '/plan (working open)', system, found);

      // the field kit: the buckets offered, and a hose-level stage read in the reader's pole marks
      await page.goto('/field-kit/timer');
      await check(page, '/field-kit/timer', system, found);
      await page.goto('/field-kit/fall');
      await settled(page);
      await page.getByLabel('Uphill pole reads').fill('10');
      await page.getByLabel('Downhill pole reads').fill('28');
      await expect(page.getByTestId('fall-total')).toBeVisible();
      await check(page, '/field-kit/fall (one stage read)', system, found);

      // questions, a thread with a site sheet, the ask form's hints
      for (const path of ['/questions', ids.thread, '/questions/ask']) {
        await page.goto(path);
        await check(page, path, system, found);
      }

      // search snippets: sizes and lengths in posts and guides
      for (const q of ['drive pipe length', '19 mm drive line']) {
        await page.goto(`/search?${new URLSearchParams({ q })}`);
        // results mark the words they matched
        await expect(page.locator('#main mark').first()).toBeVisible();
        await check(page, `/search?q=${q}`, system, found);
      }

      // the field log: the list with its chart, an entry
      for (const path of ['/field-log', `/field-log/${ids.entry}`]) {
        await page.goto(path);
        await check(page, path, system, found);
      }

      // an e-mail: the reader asks with a site sheet, an expert answers with a worked
      // calculation, and the notice of the answer reaches the reader in their units
      found.push(...(await answerMail(page, browser, system)));
    } finally {
      await setAccountUnits(page, 'US');
      await context.close();
    }
    expect(found, `units of the other system shown to a ${system} reader:\n${found.join('\n')}`).toEqual([]);
  });
}

async function answerMail(page: Page, browser: import('@playwright/test').Browser, system: System): Promise<string[]> {
  // no units in the words the members type: what the mail says about sizes is the site's
  const title = `Units check for the ${system} reader ${Date.now() % 100000}`;
  await page.goto('/questions/ask');
  await settled(page);
  await page.getByLabel('Title', { exact: true }).fill(title);
  await page
    .getByLabel('What happened')
    .fill('It beats for a while and then stops, and the tank is filling slower than before.');
  await page.getByLabel('Stops cycling', { exact: true }).check();
  const sheet = page.locator('section', { has: page.getByRole('heading', { name: /site sheet/i }) });
  await sheet.getByLabel('Fall', { exact: true }).fill(SHEET[system].fall);
  await sheet.getByLabel('Lift', { exact: true }).fill(SHEET[system].lift);
  await sheet.getByLabel('Drive pipe length', { exact: true }).fill(SHEET[system].length);
  await sheet.getByLabel('Drive pipe size', { exact: true }).selectOption('3/4');
  await sheet.getByLabel('Drive pipe material', { exact: true }).selectOption('pvc-sch40');
  await sheet.getByLabel('Pump size', { exact: true }).selectOption('3/4');
  await sheet.getByLabel('Pumps', { exact: true }).fill('1');
  await page.getByRole('button', { name: 'Post my question' }).click();
  await expect(page.getByRole('heading', { level: 1, name: title })).toBeVisible();
  const url = page.url();

  const expert = await newContext(browser);
  const ep = await expert.newPage();
  await signIn(ep, 'builds@ironwheel.example');
  await ep.goto(url);
  await settled(ep);
  const composer = ep.getByRole('form', { name: 'Your answer' });
  await composer
    .getByLabel('Answer (Markdown; math between $ signs)')
    .fill('Here is the drive pipe check for your site, worked with the numbers on your sheet.');
  await composer.getByLabel('Add a worked calculation').selectOption('drive-pipe-check');
  // a chosen calculator goes with the answer; the form says so
  await expect(composer.getByTestId('calculation-attached')).toContainText('goes in your answer');
  const saved = ep.waitForResponse((r) => r.request().method() === 'POST' && r.url().endsWith('/answers'));
  await composer.getByRole('button', { name: 'Post the answer' }).click();
  expect((await saved).status()).toBe(201);
  await expert.close();

  const mail = await catcher.waitFor(READER, new RegExp(`^New answer: ${title}$`), 60_000);
  const html = mail.html
    .replace(/<(style|head)[\s\S]*?<\/\1>/gi, ' ')
    .replace(/<[^>]+>/g, '\n')
    .replace(/&nbsp;/g, ' ')
    .replace(/&quot;/g, '"')
    .replace(/&#x27;|&#39;/g, "'")
    .replace(/&amp;/g, '&');
  const hits: string[] = [];
  for (const [part, text] of [
    ['text', mail.text],
    ['html', html],
  ] as const) {
    // links carry tokens, not quantities ("…1e5…" in a token is no e-notation)
    for (const line of text.replace(/https?:\/\/\S+/g, ' ').split('\n')) {
      for (const hit of wrongUnits(line, system)) hits.push(`e-mail “${mail.subject}” (${part}): ${hit}`);
    }
  }
  return hits;
}
