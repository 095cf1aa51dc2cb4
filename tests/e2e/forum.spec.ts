import { test, expect } from '@playwright/test';
import sharp from 'sharp';
import { newContext, settled, signIn } from '../support/session';

test.describe.serial('the forum', () => {
  let questionUrl = '';
  // each project asks its own question on the shared database
  const title = () =>
    `Pump stops after a few beats since the creek dropped (${test.info().project.name} ${Date.now() % 100000})`;
  let TITLE = '';

  test('the asking journey: a site sheet, the stall check, a photo, posted and listed', async ({ page }) => {
    TITLE = title();
    await signIn(page, 'cabin@sorrelcreek.example');
    await page.goto('/questions/ask');
    await settled(page);
    await page.getByLabel('Title', { exact: true }).fill(TITLE);
    await page
      .getByLabel('What happened')
      .fill('It beats about a dozen times, then the waste valve stays shut until I push it down again.');
    await page.getByLabel('Stops cycling', { exact: true }).check();
    const sheet = page.locator('section', { has: page.getByRole('heading', { name: /site sheet/i }) });
    await sheet.getByLabel('Fall', { exact: true }).fill('5 ft');
    await sheet.getByLabel('Lift', { exact: true }).fill('45 ft');
    await sheet.getByLabel('Drive pipe length', { exact: true }).fill('12 ft');
    await sheet.getByLabel('Drive pipe size', { exact: true }).selectOption('3/4');
    await sheet.getByLabel('Drive pipe material', { exact: true }).selectOption('pvc-sch40');
    await sheet.getByLabel('Pump size', { exact: true }).selectOption('3/4');
    await sheet.getByLabel('Pumps', { exact: true }).fill('1');
    await sheet.getByLabel('stops after some beats').check();

    const before = page.getByTestId('before-you-post');
    await expect(before).toContainText(/Drive pipe length outside the usual range/i);

    const png = await sharp({ create: { width: 64, height: 48, channels: 3, background: { r: 95, g: 122, b: 58 } } })
      .png()
      .toBuffer();
    await page.getByLabel('Photos (optional)').setInputFiles({ name: 'pump.png', mimeType: 'image/png', buffer: png });
    await expect(page.getByRole('list', { name: 'Photos added' }).getByRole('listitem')).toHaveCount(1);

    await page.getByRole('button', { name: 'Post my question' }).click();
    await expect(page.getByRole('heading', { level: 1, name: TITLE })).toBeVisible();
    questionUrl = page.url();
    await expect(page.getByRole('region', { name: 'Site sheet' })).toContainText('Drive pipe length');
    await expect(page.locator('img[src*="/api/photos/"]').first()).toBeVisible();

    await page.goto('/questions?show=unanswered');
    await expect(page.getByRole('link', { name: TITLE })).toBeVisible();
  });

  test('the expert’s journey: an answer with a worked calculation, fixed it, and try with my numbers', async ({
    page,
    browser,
  }) => {
    await signIn(page, 'builds@ironwheel.example');
    await page.goto(questionUrl);
    await settled(page);
    const composer = page.getByRole('form', { name: 'Your answer' });
    await composer
      .getByLabel('Answer (Markdown; math between $ signs)')
      .fill(
        'Twelve feet is short for five feet of fall: the pulse comes back too soon. Here is the drive pipe check for your site.',
      );
    await composer.getByLabel('Add a worked calculation').selectOption('drive-pipe-check');
    const card = composer.locator('[data-calculator="drive-pipe-check"]');
    // prefilled from the site sheet
    await expect(card.getByLabel('Drive pipe length', { exact: true })).toHaveValue('12');
    await card.getByLabel('Drive pipe length', { exact: true }).fill('30');
    // a chosen calculator goes with the answer; the form says so
    await expect(composer.getByTestId('calculation-attached')).toContainText('goes in your answer');
    await composer.getByRole('button', { name: 'Post the answer' }).click();
    const answer = page.locator('[data-answer]').filter({ hasText: 'Twelve feet is short' });
    await expect(answer).toBeVisible();
    await expect(answer.getByText('expert', { exact: true })).toBeVisible();
    await expect(answer.getByTestId('answer-calculation')).toBeVisible();

    // The asker marks it fixed it.
    const asker = await newContext(browser);
    const askerPage = await asker.newPage();
    await signIn(askerPage, 'cabin@sorrelcreek.example');
    await askerPage.goto(questionUrl);
    await settled(askerPage);
    // wait for the server to save the choice and its line before closing the context
    const saved = askerPage.waitForResponse((r) => r.request().method() !== 'GET' && r.url().endsWith('/fixed'));
    await askerPage
      .locator('[data-answer]')
      .filter({ hasText: 'Twelve feet is short' })
      .getByRole('button', { name: 'This fixed it' })
      .click();
    await askerPage
      .getByLabel('What fixed it, in one line')
      .fill('A drive pipe long enough for the fall: 30 ft, not 12');
    await askerPage.getByRole('button', { name: 'Save what fixed it' }).click();
    expect((await saved).ok()).toBe(true);
    await expect(askerPage.locator('[data-answer]').first()).toContainText('What fixed it · chosen by');
    await expect(askerPage.getByRole('region', { name: 'What fixed it' })).toContainText('30 ft, not 12');
    await asker.close();

    // A visitor tries the worked calculation with their own numbers.
    const visitor = await newContext(browser);
    const v = await visitor.newPage();
    await v.goto(questionUrl);
    await settled(v);
    const calc = v.locator('[data-answer]').first().locator('[data-calculator="drive-pipe-check"]');
    await expect(calc.getByLabel('Drive pipe length', { exact: true })).toHaveValue('30');
    const before = await calc.locator('[data-result="Length ÷ fall (L/H)"]').textContent();
    await calc.getByLabel('Drive pipe length', { exact: true }).fill('50');
    await expect(calc.locator('[data-result="Length ÷ fall (L/H)"]')).not.toHaveText(before ?? '');
    await expect(v.getByRole('link', { name: 'Sign in', exact: true }).last()).toBeVisible();
    await visitor.close();
  });
});
