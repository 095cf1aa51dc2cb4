import { test, expect, type Page } from '@playwright/test';
import { XSS_HOST, XSS_PAYLOADS, XSS_TEXT } from '../support/fixtures/xss-payloads';
import { signedIn } from '../support/session';

const STAMP = Date.now() % 100000;

/**
 * Opens a page and fails on any sign that injected code ran or reached out: a dialog
 * (alert, confirm, prompt), window.__xss set, a page error, a console error, or a
 * request to the payloads' host or any other origin.
 */
async function visitSafely(page: Page, url: string, expectText?: RegExp | string) {
  const problems: string[] = [];
  const origin = new URL(page.url() === 'about:blank' ? 'http://127.0.0.1' : page.url()).origin;
  const onDialog = (d: { message(): string; dismiss(): Promise<void> }) => {
    problems.push(`dialog: ${d.message()}`);
    void d.dismiss();
  };
  const onConsole = (m: { type(): string; text(): string }) => {
    if (m.type() === 'error') problems.push(`console error: ${m.text()}`);
  };
  const onPageError = (e: Error) => problems.push(`page error: ${e.message}`);
  const onRequest = (r: { url(): string }) => {
    const u = r.url();
    if (u.startsWith(XSS_HOST) || (/^https?:/.test(u) && new URL(u).origin !== origin)) problems.push(`request: ${u}`);
  };
  page.on('dialog', onDialog);
  page.on('console', onConsole);
  page.on('pageerror', onPageError);
  page.on('request', onRequest);
  try {
    await page.goto(url);
    if (expectText) await expect(page.locator('#main')).toContainText(expectText);
    // hover and focus everything so on-hover and on-focus handlers would fire if any survived
    for (const el of await page.locator('#main a, #main img, #main div, #main svg').all())
      await el.hover({ timeout: 200 }).catch(() => {});
    await page.waitForTimeout(300);
    if (await page.evaluate(() => (window as unknown as { __xss?: unknown }).__xss !== undefined))
      problems.push('script ran: window.__xss was set');
  } finally {
    page.off('dialog', onDialog);
    page.off('console', onConsole);
    page.off('pageerror', onPageError);
    page.off('request', onRequest);
  }
  expect(problems, `${url}\n${problems.join('\n')}`).toEqual([]);
}

test('OWASP filter-evasion payloads in every field a member fills run no script anywhere they are shown', async ({
  browser,
}) => {
  test.setTimeout(120_000);
  const tamsin = await signedIn(browser, 'tamsin@ferncombe.example');
  const api = tamsin.request;
  const before = await (await api.get('/api/account/settings')).json();
  try {
    // profile: display name, region, bio
    const settings = await api.put('/api/account/settings', {
      data: {
        displayName: `<img src=x onerror=alert(1)> T${STAMP}`,
        region: `<svg/onload=alert('XSS')>`,
        bio: XSS_TEXT.slice(0, 2000),
        units: 'US',
      },
    });
    expect(settings.status()).toBe(200);

    // a question: title and Markdown body; a site sheet whose text fields carry payloads is refused or stored as text
    const ask = await api.post('/api/questions', {
      data: { title: `Drive pipe <script>alert(1)</script> ${STAMP}`, body: XSS_TEXT, tags: ['stall'] },
    });
    expect(ask.status()).toBe(201);
    const { id: qid, url } = await ask.json();
    const sheet = await api.post('/api/questions', {
      data: {
        title: `Site sheet payloads ${STAMP}`,
        body: 'The fields of the site sheet carry the payloads this time.',
        tags: ['stall'],
        siteSheet: { fall: XSS_PAYLOADS[0], lift: '29 ft', symptoms: XSS_PAYLOADS[18] },
      },
    });
    expect([201, 400, 422]).toContain(sheet.status());

    // an answer and a reply
    const answer = await api.post(`/api/questions/${qid}/answers`, { data: { body: XSS_TEXT } });
    expect(answer.status()).toBe(201);
    const { id: aid } = await answer.json();
    expect(
      (
        await api.post(`/api/questions/${qid}/replies`, { data: { body: XSS_TEXT.slice(0, 5000), answerId: aid } })
      ).status(),
    ).toBe(201);

    // a saved worked calculation's title, an expert application's text
    const calc = await api.post('/api/calculations', {
      data: {
        tool: 'yield-estimate',
        inputs: { fall: '4 ft', lift: '29 ft', driveFlow: '2 gal/min', pumpType: 'homemade' },
        title: `<IMG SRC=/ onerror="alert(1)"> ${STAMP}`,
      },
    });
    expect(calc.status()).toBe(201);
    const calcUrl = (await calc.json()).url as string;
    const apply = await api.post('/api/expert-applications', {
      data: {
        pumpsBuilt: 3,
        years: 2,
        region: `<svg/onload=alert('XSS')>`,
        experience: XSS_TEXT.slice(0, 4000),
        links: [],
      },
    });
    expect([201, 409]).toContain(apply.status());

    // a flag's note, from another member
    const shepherd = await signedIn(browser, 'shepherd@highcrag.example');
    const flag = await shepherd.request.post('/api/flags', {
      data: { postType: 'answer', postId: aid, reason: 'other', note: XSS_PAYLOADS[19] },
    });
    expect(flag.status()).toBe(201);

    // everywhere the text is shown, to members, moderators and admins
    await visitSafely(tamsin, url, `${STAMP}`);
    await visitSafely(tamsin, '/questions', `${STAMP}`);
    await visitSafely(tamsin, '/people/ferncombe_tamsin');
    await visitSafely(tamsin, `/search?q=${encodeURIComponent('xxs link')}`);
    await visitSafely(tamsin, calcUrl, `${STAMP}`);
    const moss = await signedIn(browser, 'moss@clackwater.example');
    await visitSafely(moss, '/review');
    const admin = await signedIn(browser, 'admin@clackwater.example');
    await visitSafely(admin, '/review/experts');
    await visitSafely(admin, '/admin/users');
  } finally {
    await api.put('/api/account/settings', {
      data: { displayName: before.displayName, region: before.region, bio: before.bio, units: before.units },
    });
  }
});

test('the watch itself catches a script that runs, a request that reaches out and a console error', async ({
  page,
}) => {
  await page.route('**/__probe*', (route) =>
    route.fulfill({
      contentType: 'text/html',
      body: `<main id="main"><p>probe</p><img src="${XSS_HOST}/x.png"><script>window.__xss = 1; alert('XSS'); console.error('injected')</script></main>`,
    }),
  );
  await page.goto('/');
  const failure = await visitSafely(page, '/__probe').then(
    () => null,
    (err: Error) => err.message,
  );
  for (const sign of ['window.__xss was set', 'dialog: XSS', `request: ${XSS_HOST}/x.png`, 'console error: injected'])
    expect(failure).toContain(sign);
});
