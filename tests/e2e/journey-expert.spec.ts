import { test, expect } from '@playwright/test';
import { DEMO_PASSWORD, press, settled } from '../support/session';

/**
 * The expert answering, on a phone: a builder finds an open question while signed
 * out, signs in from the thread and is brought back to it, answers with a worked
 * calculation, is told the answer went up, and sees it open with their name and
 * expert label before the long calculator.
 */
const THREAD = 'Two small pumps side by side or one bigger one for the far paddock?';

test('@phone-only the expert signs in from a thread, answers it with a calculation and is told it is posted', async ({
  page,
}) => {
  await page.goto('/questions');
  await press(page.getByRole('link', { name: THREAD }));
  await expect(page.getByRole('heading', { level: 1, name: THREAD })).toBeVisible();
  const threadPath = new URL(page.url()).pathname;
  expect(threadPath).toMatch(/^\/questions\/\d+$/);
  await settled(page);

  // both ways in carry the way back: the thread's own line and the header's link
  await expect(page.getByRole('link', { name: 'Sign in', exact: true }).last()).toHaveAttribute(
    'href',
    `/sign-in?callbackUrl=${encodeURIComponent(threadPath)}`,
  );
  const headerSignIn = page.getByRole('banner').getByRole('link', { name: 'Sign in' });
  await expect(headerSignIn).toHaveAttribute('href', `/sign-in?callbackUrl=${encodeURIComponent(threadPath)}`);
  await press(headerSignIn);
  await expect(page).toHaveURL(/\/sign-in\?callbackUrl=/);
  const form = page.getByRole('form', { name: 'Sign in with a password' });
  await form.getByLabel('E-mail').fill('builds@ironwheel.example');
  await form.getByLabel('Password').fill(DEMO_PASSWORD);
  await press(form.getByRole('button', { name: 'Sign in' }));
  await expect(page).toHaveURL(new RegExp(`${threadPath}$`));
  await expect(page.getByRole('heading', { level: 1, name: THREAD })).toBeVisible();
  await settled(page);

  const composer = page.getByRole('form', { name: 'Your answer' });
  const words = `Two half-inch pumps share the pool well; here is one of them worked at your lift (${Date.now() % 100000}).`;
  await composer.getByLabel('Answer (Markdown; math between $ signs)').fill(words);
  await composer.getByLabel('Add a worked calculation').selectOption('yield-estimate');
  // what is shown is what goes: the form says the calculation will be posted, with no second step to miss
  await expect(composer.getByTestId('calculation-attached')).toContainText('goes in your answer when you post it');
  await expect(composer.getByRole('button', { name: 'Attach this calculation' })).toHaveCount(0);
  // the card's own save says something a person can tell apart from posting it
  await expect(composer.getByRole('button', { name: 'Also keep this calculation on its own page' })).toBeVisible();

  const posted = page.waitForResponse((r) => r.request().method() === 'POST' && r.url().endsWith('/answers'));
  await press(composer.getByRole('button', { name: 'Post the answer with the calculation' }));
  expect((await posted).status()).toBe(201);

  await expect(page.getByRole('status').filter({ hasText: 'Your answer is posted' })).toBeVisible();
  const answer = page.locator('[data-answer]').filter({ hasText: words });
  await expect(answer).toBeFocused();
  await expect(answer.getByTestId('answer-calculation')).toBeVisible();

  // who answered opens the answer, above the long calculator
  const byline = answer.getByTestId('answer-byline');
  await expect(byline).toContainText('Ironwheel Builds');
  await expect(byline.getByText('expert', { exact: true })).toBeVisible();
  const top = (await byline.boundingBox())!;
  const calc = (await answer.getByTestId('answer-calculation').boundingBox())!;
  const body = (await answer.getByText(words).boundingBox())!;
  expect(top.y).toBeLessThan(body.y);
  expect(top.y).toBeLessThan(calc.y);
  // nothing wider than the phone
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
});
