import { test, expect, type Page } from '@playwright/test';
import { signedIn } from '../support/session';

const TITLE = 'Second pump added, delivery only went up a little';

async function questionId(page: Page, title: string): Promise<number> {
  const res = await page.request.get(`/api/search?${new URLSearchParams({ q: title, kind: 'question', limit: '1' })}`);
  const hit = (await res.json()).items[0] as { url: string; title: { text: string }[] };
  expect(hit.title.map((p) => p.text).join('')).toBe(title);
  return Number(/\/questions\/(\d+)/.exec(hit.url)![1]);
}

test.describe.serial('thread pages from the page cache', () => {
  let id = 0;

  test('the page is kept and served again, with nothing of any reader in it; units are the reader’s', async ({
    page,
    browser,
    baseURL,
  }) => {
    id = await questionId(page, TITLE);
    const first = await page.request.get(`/questions/${id}`);
    expect(first.status()).toBe(200);
    const again = await page.request.get(`/questions/${id}`);
    // kept by Next's page cache, or, for a signed-out reader, by the server's response cache in front of it
    expect(again.headers()['x-nextjs-cache'] ?? again.headers()['x-clackwater-cache']).toMatch(/HIT|STALE|hit/);
    const html = await again.text();
    expect(html).toContain(TITLE);
    expect(html).not.toContain('shepherd@highcrag.example');

    // the demo site sheet says 4 ft of fall; 1 ft = 0.3048 m exactly (international foot, 1959), so 1.22 m
    const metric = await browser.newContext();
    await metric.addCookies([{ name: 'cw_units', value: 'metric', url: baseURL! }]);
    const mp = await metric.newPage();
    await mp.goto(`/questions/${id}`);
    await expect(mp.getByTestId('site-sheet')).toContainText('1.22 m');
    await metric.close();
    await page.goto(`/questions/${id}`);
    await expect(page.getByTestId('site-sheet')).toContainText('4 ft');
  });

  test('a signed-in reader gets their own controls on the same page; a hidden question is gone for readers and shown to moderators', async ({
    browser,
  }) => {
    const member = await signedIn(browser, 'shepherd@highcrag.example');
    await member.goto(`/questions/${id}`);
    await expect(member.getByRole('form', { name: 'Your answer' })).toBeVisible();

    const moderator = await signedIn(browser, 'moss@clackwater.example');
    const hide = await moderator.request.post('/api/review/actions', {
      data: { action: 'hide', postType: 'question', postId: id, reason: 'checking the page cache' },
    });
    expect(hide.status()).toBe(200);
    const gone = await member.request.get(`/questions/${id}`);
    expect(gone.status()).toBe(404);
    expect(await gone.text()).not.toContain('delivery only went up a little</h1>');
    await moderator.goto(`/questions/${id}`);
    await expect(moderator.getByRole('status').filter({ hasText: 'You see it as a moderator' })).toBeVisible();
    await expect(moderator.getByRole('heading', { level: 1, name: TITLE })).toBeVisible();

    const restore = await moderator.request.post('/api/review/actions', {
      data: { action: 'restore', postType: 'question', postId: id, reason: 'done checking' },
    });
    expect(restore.status()).toBe(200);
    expect((await member.request.get(`/questions/${id}`)).status()).toBe(200);
    await member.context().close();
    await moderator.context().close();
  });
});
