import { test, expect, type APIRequestContext } from '@playwright/test';
import { signedIn } from '../support/session';

/**
 * The production server's response cache (scripts/response-cache.mjs): a signed-out
 * reader's second load of a public page is served from it, a member's never is, and a
 * moderator's hide is gone from the very next signed-out load of every page that showed
 * the question (the write empties the cache when its response finishes).
 */
const STAMP = Date.now() % 100000;
const TITLE = `Snifter whistles at the cistern every dawn ${STAMP}`;

async function load(request: APIRequestContext, path: string) {
  const res = await request.get(path);
  return {
    status: res.status(),
    cache: res.headers()['x-clackwater-cache'],
    text: await res.text(),
    csp: res.headers()['content-security-policy'],
  };
}

test(
  'signed-out pages are kept; a hide is gone from the next signed-out load of the home page, the lists, the thread and search',
  {
    tag: '@desktop-only',
  },
  async ({ browser, request }) => {
    test.setTimeout(90_000);
    const member = await signedIn(browser, 'tamsin@ferncombe.example');
    const ask = await member.request.post('/api/questions', {
      data: {
        title: TITLE,
        body: 'A short whistle from the snifter, then the ram settles into its beat.',
        tags: ['stall'],
      },
    });
    expect(ask.status()).toBe(201);
    const { id } = (await ask.json()) as { id: number };
    const q = encodeURIComponent(TITLE);
    const pages = [
      '/',
      '/questions',
      '/questions?show=unanswered',
      '/tags/stall',
      `/questions/${id}`,
      `/search?q=${q}`,
      `/api/search?q=${q}&limit=10`,
    ];
    // the thread by its title; the others by a link to it (the search page repeats the title as its query)
    const link = new RegExp(`/questions/${id}(?!\\d)`);
    const shows = (path: string, text: string) =>
      path === `/questions/${id}` ? text.includes(TITLE) : link.test(text);

    for (const path of pages) {
      await load(request, path);
      const again = await load(request, path);
      expect(again.status, path).toBe(200);
      expect(again.cache, path).toBe('hit');
      expect(shows(path, again.text), path).toBe(true);
    }
    // a member's pages are rendered for them, every time
    for (const path of ['/', '/questions']) {
      await member.request.get(path);
      const mine = await member.request.get(path);
      expect(mine.headers()['x-clackwater-cache'], path).toBeUndefined();
    }

    const moderator = await signedIn(browser, 'moss@clackwater.example');
    const hide = await moderator.request.post('/api/review/actions', {
      data: { action: 'hide', postType: 'question', postId: id, reason: 'checking the response cache' },
    });
    expect(hide.status()).toBe(200);
    for (const path of pages) {
      const after = await load(request, path);
      if (path === `/questions/${id}`) expect(after.status, path).toBe(404);
      else expect(shows(path, after.text), path).toBe(false);
      expect(after.cache, path).not.toBe('hit');
    }

    const restore = await moderator.request.post('/api/review/actions', {
      data: { action: 'restore', postType: 'question', postId: id, reason: 'done checking' },
    });
    expect(restore.status()).toBe(200);
    expect(shows('/questions', (await load(request, '/questions')).text)).toBe(true);
    expect((await load(request, `/questions/${id}`)).status).toBe(200);
    await member.context().close();
    await moderator.context().close();
  },
);

test(
  'a page served from the cache carries no nonce, allows its own scripts by hash and runs with no CSP violation',
  {
    tag: '@desktop-only',
  },
  async ({ page, request }) => {
    await load(request, '/tags/stall');
    const a = await load(request, '/tags/stall');
    const b = await load(request, '/tags/stall');
    expect([a.cache, b.cache]).toEqual(['hit', 'hit']);
    for (const copy of [a, b]) {
      expect(copy.csp).not.toContain('nonce-');
      expect(/script-src ([^;]+)/.exec(copy.csp)![1]).not.toContain("'unsafe-inline'");
      expect(copy.text).not.toMatch(/\snonce="/);
    }
    const violations: string[] = [];
    page.on('console', (m) => {
      if (/Content Security Policy/i.test(m.text())) violations.push(m.text());
    });
    const res = await page.goto('/tags/stall');
    expect(res!.headers()['x-clackwater-cache']).toBe('hit');
    // hydrated: React has attached to the header's unit switch
    await expect(page.getByRole('banner').getByText('Metric')).toBeVisible();
    await page.waitForLoadState('networkidle');
    expect(violations).toEqual([]);
  },
);
