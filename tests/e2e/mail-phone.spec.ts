import { test, expect, type Page } from '@playwright/test';
import mariadb from 'mariadb';
import { renderMail } from '@/lib/mail/templates';
import { MAIL_SAMPLES } from '../support/mail-samples';

/**
 * Every HTML message read on a phone (390 px): laid out at the phone's width rather
 * than a 980 px desktop page shrunk to fit, nothing wider than the screen, type big
 * enough to read and an action big enough to touch.
 */
const PHONE = 390;

async function checkOnPhone(page: Page, html: string, what: string) {
  await page.setContent(html);
  const m = await page.evaluate(() => {
    const texts = [...document.querySelectorAll('p, h1, h2, a, li, td')].filter(
      (el) => el.textContent?.trim() && (el as HTMLElement).offsetParent !== null,
    );
    const action = [...document.querySelectorAll('a')].find((a) => getComputedStyle(a).display === 'inline-block');
    return {
      viewport: document.querySelector('meta[name="viewport"]')?.getAttribute('content') ?? '',
      width: document.documentElement.scrollWidth,
      smallest: Math.min(...texts.map((el) => parseFloat(getComputedStyle(el).fontSize))),
      actionHeight: action ? action.getBoundingClientRect().height : null,
    };
  });
  expect(m.viewport, what).toContain('width=device-width');
  expect(m.width, `${what}: scrollWidth`).toBeLessThanOrEqual(PHONE);
  // 13 px is the smallest size mail guides advise for a phone's fine print: common practice, no source
  expect(m.smallest, `${what}: smallest type`).toBeGreaterThanOrEqual(13);
  // 44 px: the touch target Apple's Human Interface Guidelines ask for (from memory)
  if (m.actionHeight !== null) expect(m.actionHeight, `${what}: action height`).toBeGreaterThanOrEqual(44);
}

test('@phone-only every kind of e-mail reads at a phone’s width', async ({ page }) => {
  expect(page.viewportSize()?.width).toBe(PHONE);
  for (const { kind, content } of MAIL_SAMPLES) {
    const { html } = await renderMail(content);
    await checkOnPhone(page, html, kind);
  }
});

test('@phone-only the e-mails already queued read at a phone’s width', async ({ page }) => {
  const conn = await mariadb.createConnection({
    host: process.env.DB_HOST ?? '127.0.0.1',
    port: Number(process.env.DB_PORT ?? 3408),
    user: process.env.DB_USER ?? 'clackwater',
    password: process.env.DB_PASSWORD ?? 'clackwater',
    database: process.env.DB_NAME ?? 'clackwater_test',
  });
  let rows: { id: number; kind: string; html_body: string }[];
  try {
    // one of each kind, the newest: what this run's other tests had the site send
    rows = await conn.query(
      `SELECT o.id, o.kind, o.html_body FROM mail_outbox o
         JOIN (SELECT kind, MAX(id) AS id FROM mail_outbox WHERE html_body IS NOT NULL GROUP BY kind) k ON k.id = o.id`,
    );
  } finally {
    await conn.end();
  }
  test.skip(rows.length === 0, 'nothing with an HTML part has been queued in this database yet');
  for (const r of rows) await checkOnPhone(page, r.html_body, `${r.kind} #${r.id}`);
});
