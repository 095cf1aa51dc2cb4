import { test, expect } from '@playwright/test';
import { SmtpCatcher } from '../support/smtp-catcher';
import { E2E_SMTP_PORT } from '../../playwright.config';
import { signIn } from '../support/session';
import { outboxFor } from '../support/outbox';

const catcher = new SmtpCatcher(E2E_SMTP_PORT);
test.beforeAll(() => catcher.start());
test.afterAll(() => catcher.stop());

test('an answer in the browser reaches the asker’s inbox within a minute; its unsubscribe link works signed out', async ({
  page,
  browser,
}) => {
  test.setTimeout(120_000);
  const title = `Mail check: ram slows every afternoon ${Date.now() % 100000}`;
  await signIn(page, 'tamsin@ferncombe.example');
  await page.goto('/questions/ask');
  await page.getByLabel('Title', { exact: true }).fill(title);
  await page
    .getByLabel('What happened')
    .fill('By mid afternoon the beat slows from sixty to forty a minute, and delivery falls with it.');
  await page.getByLabel('Tuning', { exact: true }).check();
  await page.getByRole('button', { name: 'Post my question' }).click();
  await expect(page.getByRole('heading', { level: 1, name: title })).toBeVisible();
  const questionUrl = page.url();

  const expert = await browser.newContext();
  const ep = await expert.newPage();
  await signIn(ep, 'valves@quarrylane.example');
  await ep.goto(questionUrl);
  const composer = ep.getByRole('form', { name: 'Your answer' });
  await composer
    .getByLabel('Answer (Markdown; math between $ signs)')
    .fill('Warm water in the afternoon holds less air; check the snifter and the air chamber cushion.');
  // wait for the answer to be saved and shown in the thread: the words alone also match
  // the composer's own textarea, and closing the context too soon would abort the post
  const saved = ep.waitForResponse((r) => r.request().method() === 'POST' && r.url().endsWith(`/answers`));
  await composer.getByRole('button', { name: 'Post the answer' }).click();
  expect((await saved).status()).toBe(201);
  await expect(
    ep.locator('[data-answer]').filter({ hasText: 'check the snifter and the air chamber cushion' }),
  ).toBeVisible();
  await expert.close();

  // the server's worker sends it after the answer commits: no script run by hand
  const mail = await catcher
    .waitFor('tamsin@ferncombe.example', new RegExp(`^New answer: ${title}$`), 60_000)
    .catch(async (err: Error) => {
      throw new Error(
        `${err.message}\nthe outbox for this address at ${new Date().toISOString()}:\n${await outboxFor('tamsin@ferncombe.example')}\ncaught: ${catcher.messages.map((m) => `${m.to.join(',')} ${m.subject}`).join('; ') || 'nothing'}`,
      );
    });
  expect(mail.text).toContain('Quarry Lane Valves wrote:');
  expect(mail.html).toContain('check the snifter and the air chamber cushion');
  const unsubscribe = /Stop these e-mails: (\S+)/.exec(mail.text)![1];

  const stranger = await browser.newContext();
  const sp = await stranger.newPage();
  await sp.goto(unsubscribe);
  await expect(sp.getByRole('heading', { level: 1, name: 'Stop e-mail' })).toBeVisible();
  await sp.getByRole('button', { name: 'Switch off e-mail about answers to your questions' }).click();
  await expect(sp.getByRole('status')).toContainText('switched off');
  // one character changed: refused, and says so
  await sp.goto(unsubscribe.replace(/t=(.)/, (_, c: string) => `t=${c === 'A' ? 'B' : 'A'}`));
  await expect(sp.locator('#main').getByRole('alert')).toContainText('does not check out');
  await stranger.close();

  // the asker's settings show the switch off, and can turn it back on
  await page.goto('/settings');
  // by role, not label: while the page streams in, React holds a hidden copy of the form for a moment
  const box = page.getByRole('checkbox', { name: 'An answer to one of my questions' });
  await expect(box).not.toBeChecked();
  await box.check();
  // by role: while the page streams in, React keeps a hidden copy of the form that a label lookup counts
  await page.getByRole('radio', { name: 'Weekly' }).check();
  await page.getByRole('button', { name: 'Save e-mail settings' }).click();
  await expect(page.getByRole('status').filter({ hasText: 'Saved.' })).toBeVisible();
  await page.reload();
  await expect(page.getByRole('checkbox', { name: 'An answer to one of my questions' })).toBeChecked();
});

test('an admin sees the outbox, with what was sent', async ({ page }) => {
  await signIn(page, 'admin@clackwater.example');
  await page.goto('/admin/outbox?status=sent');
  await expect(page.getByRole('heading', { level: 1, name: 'E-mail outbox' })).toBeVisible();
  const sent = page.locator('[data-outbox-status="sent"]').filter({ hasText: 'tamsin@ferncombe.example' }).first();
  await expect(sent)
    .toBeVisible()
    .catch(async (err: Error) => {
      throw new Error(`${err.message}\nthe outbox for this address:\n${await outboxFor('tamsin@ferncombe.example')}`);
    });
});
