import { test, expect, type Locator } from '@playwright/test';
import { press, settled, signIn } from '../support/session';

/**
 * The beginner asking why it stopped, on a phone: the stall check and similar questions are
 * read before the post button, the draft survives a guide opened from "How to fix it", a
 * drive pipe outside its length rule ranks first, a bare number is asked about, and posting
 * clears the draft.
 */
test('@phone-only the asker’s journey: read before posting, a draft that survives a guide, a unit prompt', async ({
  page,
}) => {
  const TITLE = `Ram stops after a few beats on a 5 ft fall (${Date.now() % 100000})`;
  await signIn(page, 'cabin@sorrelcreek.example');
  await page.goto('/questions/ask');
  await settled(page);

  await page.getByLabel('Title', { exact: true }).fill(TITLE);
  await page
    .getByLabel('What happened')
    .fill('It beats about a dozen times, then the waste valve stays shut. The drive pipe is 20 ft of 1 inch PVC.');
  await press(page.getByLabel('Drive pipe', { exact: true }));
  const sheet = page.locator('section', { has: page.getByRole('heading', { name: 'Site sheet' }) });
  // an invented beginner's site: 20 ft of drive pipe on a 5 ft fall, L/H = 4, below the 5–10 the
  // engine's practice rules give (PRACTICE.driveLengthToFall*, common practice, no published source)
  await sheet.getByLabel('Fall', { exact: true }).fill('5 ft');
  await sheet.getByLabel('Lift', { exact: true }).fill('30 ft');
  await sheet.getByLabel('Drive pipe length', { exact: true }).fill('20 ft');
  await sheet.getByLabel('Drive pipe size', { exact: true }).selectOption('1');
  await sheet.getByLabel('Drive pipe material', { exact: true }).selectOption('pvc-sch40');
  await press(sheet.getByLabel('stops after some beats'));

  const before = page.getByTestId('before-you-post');
  const causes = before.getByRole('list', { name: 'Likely causes' });
  await expect(causes.getByRole('listitem').first()).toHaveAttribute('data-cause', 'drive-pipe-outside-range');
  await expect(causes.getByRole('listitem').first()).toContainText('strong sign');
  await expect(causes.getByRole('listitem').first()).toContainText('20 ft');

  // both are read before the post button: above it on a 390 px screen
  const post = page.getByRole('button', { name: 'Post my question' });
  const similar = page.locator('section', { has: page.getByRole('heading', { name: 'Similar questions' }) });
  await expect(similar.getByRole('link').first()).toBeVisible();
  const bottom = async (l: Locator) => {
    const b = await l.boundingBox();
    return b!.y + b!.height;
  };
  const postTop = (await post.boundingBox())!.y;
  expect(await bottom(before)).toBeLessThanOrEqual(postTop);
  expect(await bottom(similar)).toBeLessThanOrEqual(postTop);

  // "How to fix it" opens the guide in this tab; Back finds the draft as it was
  await press(causes.getByRole('listitem').first().getByRole('link', { name: 'How to fix it' }));
  await expect(page).toHaveURL(/\/guides\/the-drive-pipe$/);
  await page.goBack();
  await expect(page).toHaveURL(/\/questions\/ask$/);
  await settled(page);
  const checkDraft = async () => {
    await expect(page.getByLabel('Title', { exact: true })).toHaveValue(TITLE);
    await expect(page.getByLabel('Drive pipe', { exact: true })).toBeChecked();
    await expect(sheet.getByLabel('Fall', { exact: true })).toHaveValue('5 ft');
    await expect(sheet.getByLabel('Drive pipe length', { exact: true })).toHaveValue('20 ft');
    await expect(sheet.getByLabel('Drive pipe material', { exact: true })).toHaveValue('pvc-sch40');
    await expect(sheet.getByLabel('stops after some beats')).toBeChecked();
  };
  await checkDraft();
  // and from the device's storage, not only the browser's page cache
  await page.reload();
  await settled(page);
  await checkDraft();
  await expect(page.getByTestId('draft-restored')).toContainText('Discard this draft');

  // a bare number: the form says which unit it will be read in and writes it in on request
  const delivery = sheet.getByLabel('Delivery pipe length', { exact: true });
  await delivery.fill('300');
  const prompt = sheet.getByTestId('unit-prompt');
  await expect(prompt).toContainText(/read in (ft|m), your units/);
  await press(prompt.getByRole('button', { name: /^Add/ }));
  await expect(delivery).toHaveValue(/^300 (ft|m)$/);
  await expect(prompt).toHaveCount(0);

  await press(post);
  await expect(page.getByRole('heading', { level: 1, name: TITLE })).toBeVisible();
  expect(await page.evaluate(() => localStorage.getItem('cw-ask-draft'))).toBeNull();

  // a new question starts empty
  await page.goto('/questions/ask');
  await settled(page);
  await expect(page.getByLabel('Title', { exact: true })).toHaveValue('');
  await expect(page.getByTestId('draft-restored')).toHaveCount(0);
});
