import { execFileSync } from 'node:child_process';
import { test, expect } from '@playwright/test';
import { demoQuestions as baseQuestions } from '../../migrations/seed/demo-data';
import { demoThreads } from '../../migrations/seed/demo-forum-data';
import { headerSearch } from '../support/session';

const demoQuestions = [...baseQuestions, ...demoThreads];

const newestFirst = [...demoQuestions].sort((a, b) => a.daysAgo - b.daysAgo);

test('the questions page lists seeded titles, newest first, and pages on', async ({ page, request }) => {
  await page.goto('/questions?perPage=100');
  await expect(page.getByRole('heading', { level: 1, name: 'Questions' })).toBeVisible();
  const list = page.getByTestId('question-list');
  // every seeded title is there (other browser tests may have asked more)
  for (const q of newestFirst) await expect(list.getByRole('heading', { name: q.title })).toBeVisible();
  const total = Number((await page.getByText(/\d+ questions, newest first/).textContent())?.match(/\d+/)?.[0]);
  expect(total).toBeGreaterThanOrEqual(demoQuestions.length);

  // Paging: the page shows what the API says is newest, five at a time.
  const newest = (await (await request.get('/api/questions?perPage=10')).json()).items as { title: string }[];
  await page.goto('/questions?perPage=5');
  await expect(list.getByRole('heading', { name: newest[4].title })).toBeVisible();
  await expect(list.getByRole('heading', { name: newest[5].title })).toHaveCount(0);
  await page.getByRole('link', { name: 'Older →' }).click();
  await expect(page).toHaveURL(/page=2/);
  await expect(list.getByRole('heading', { name: newest[5].title })).toBeVisible();
  await expect(page.getByText(`Page 2 of ${Math.ceil(total / 5)}`)).toBeVisible();
});

test('the header carries the site sections, a search box and the safety notice', async ({ page }) => {
  await page.goto('/');
  const nav = page.getByRole('navigation', { name: 'Main' });
  for (const name of ['Guides', 'Calculators', 'Questions', 'Field log']) {
    await expect(nav.getByRole('link', { name })).toBeVisible();
  }
  await headerSearch(page, 'winter');
  await expect(page).toHaveURL(/\/search\?q=winter/);
  await expect(page.locator('#main').getByText(/drain the pump for winter/)).toBeVisible();
  await page.getByRole('link', { name: 'safety notice' }).last().click();
  await expect(page.getByRole('heading', { name: 'Safety notice' })).toBeVisible();
});

test('an unknown page gets the not-found page', async ({ page }) => {
  const res = await page.goto('/no-such-page');
  expect(res?.status()).toBe(404);
  await expect(page.getByRole('heading', { name: 'Nothing here' })).toBeVisible();
});

// the server's answer to an outage, not the screen's: once is enough
test(
  'with the database stopped, pages explain in plain words and recover when it returns',
  { tag: '@desktop-only' },
  async ({ page, request }) => {
    const db = (action: string) =>
      execFileSync('bash', ['scripts/db.sh', action], {
        env: { ...process.env, CLACKWATER_ENV: 'test' },
        stdio: 'pipe',
      });
    db('stop');
    try {
      // a list no reader has had in the last minute: one kept by the server's response cache
      // (scripts/response-cache.mjs) would still be served from memory, which is as it should be
      await page.goto('/questions?perPage=7');
      await expect(page.getByRole('alert').filter({ hasText: 'can’t reach the database' })).toBeVisible();
      await expect(page.locator('body')).not.toContainText(/at \S+\.(js|ts):\d+/);
      const health = await request.get('/api/health');
      expect(health.status()).toBe(503);
      const api = await request.get('/api/questions');
      expect(api.status()).toBe(503);
      expect((await api.json()).error.code).toBe('database_unavailable');
    } finally {
      db('start');
    }
    await page.goto('/questions');
    await expect(page.getByTestId('question-list').getByRole('heading').first()).toBeVisible();
  },
);
