import { test, expect } from '@playwright/test';
import { openAccountMenu, press, settled, signIn } from '../support/session';

/**
 * The moderator's journey on a phone: a member flags one answer as spam and then
 * another as unsafe advice; the moderator opens the review queue from the account menu,
 * finds the unsafe one first with no action chosen for them, and hides it as unsafe.
 * Its author sees it marked with the reason and a notice badge, and asks for a review,
 * which waits in the queue as an item of its own. Needs a freshly seeded database.
 */
const QUESTION = 'What weight on the waste valve for 4 ft of fall?';
const UNSAFE = 'Change one thing at a time and time the beats';
const SPAM_QUESTION = 'Two small pumps side by side or one bigger one for the far paddock?';
const SPAM = 'We run two side by side at Ferncombe';
const REASON = `Hidden as unsafe while the weight advice is checked (${Date.now() % 100000})`;
const APPEAL = 'The advice is to change one thing at a time; please read it again.';

async function flag(
  page: import('@playwright/test').Page,
  tag: string,
  question: string,
  answerText: string,
  reason: string,
) {
  await page.goto(`/tags/${tag}`);
  await settled(page);
  await press(page.getByRole('link', { name: question }).first());
  await expect(page.getByRole('heading', { level: 1, name: question })).toBeVisible();
  await settled(page);
  const answer = page.locator('[data-answer]').filter({ hasText: answerText });
  await press(answer.getByRole('button', { name: 'Flag', exact: true }));
  const form = answer.getByRole('form', { name: 'Flag this answer' });
  await form.getByLabel(reason, { exact: true }).check();
  await press(form.getByRole('button', { name: 'Send flag' }));
  await expect(answer.getByRole('status')).toHaveText('Flagged — a moderator will look at it');
}

test.describe.serial('the moderator @phone-only', () => {
  test('a member flags an answer as spam, then another as unsafe advice', async ({ page }) => {
    await signIn(page, 'cabin@sorrelcreek.example');
    await flag(page, 'parallel', SPAM_QUESTION, SPAM, 'spam');
    await flag(page, 'tuning', QUESTION, UNSAFE, 'unsafe advice');
  });

  test('the moderator finds the unsafe flag first, chooses an action and hides it as unsafe', async ({ page }) => {
    await signIn(page, 'moss@clackwater.example');
    const menu = await openAccountMenu(page);
    await press(menu.getByRole('link', { name: 'Review queue' }));
    await expect(page.getByRole('heading', { level: 1, name: 'Review queue' })).toBeVisible();
    await settled(page);

    const items = page.locator('[data-review-item]');
    await expect(items.first().getByRole('region', { name: 'Flags' })).toContainText('unsafe advice');
    const texts = await items.allInnerTexts();
    const unsafeAt = texts.findIndex((t) => t.includes(UNSAFE));
    const spamAt = texts.findIndex((t) => t.includes(SPAM));
    expect(unsafeAt).toBeGreaterThanOrEqual(0);
    expect(spamAt).toBeGreaterThan(unsafeAt);

    const item = items.filter({ hasText: UNSAFE });
    const panel = item.getByRole('form', { name: 'Act on this answer' });
    const action = panel.getByLabel('Action', { exact: true });
    await expect(action).toHaveValue('');
    // the post is shown to readers: there is nothing to restore
    await expect(action.locator('option', { hasText: 'Restore the post' })).toHaveCount(0);
    await panel.getByLabel('Reason for this action').fill(REASON);
    await press(panel.getByRole('button', { name: 'Apply' }));
    await expect(panel.getByRole('alert')).toContainText('Action: choose what to do');

    await action.selectOption('hide');
    await press(panel.getByRole('button', { name: 'Apply' }));
    await expect(page.getByRole('status').filter({ hasText: 'Hide the post: done' })).toBeVisible();
    await expect(page.locator('[data-review-item][data-review-kind="flags"]').filter({ hasText: UNSAFE })).toHaveCount(
      0,
    );
  });

  test('the author sees their answer marked with the reason and a notice badge, and appeals', async ({ page }) => {
    await signIn(page, 'valves@quarrylane.example');
    await settled(page);
    await expect(page.getByTestId('notice-badge')).toBeVisible();

    await page.goto('/tags/tuning');
    await settled(page);
    await press(page.getByRole('link', { name: QUESTION }).first());
    await expect(page.getByRole('heading', { level: 1, name: QUESTION })).toBeVisible();
    await settled(page);
    const answer = page.locator('[data-answer]').filter({ hasText: UNSAFE });
    await expect(answer.getByTestId('moderation-state')).toContainText('only you and the moderators');
    await expect(answer.getByTestId('hidden-reason')).toContainText(REASON);

    await press(answer.getByRole('button', { name: 'Ask for a review' }));
    const form = answer.getByRole('form', { name: 'Ask for a review' });
    await form.getByLabel('Why should the moderators look again?').fill(APPEAL);
    await press(form.getByRole('button', { name: 'Send to the moderators' }));
    await expect(answer.getByRole('status').filter({ hasText: 'a moderator will review the decision' })).toBeVisible();

    // reading the notices clears the badge
    const menu = await openAccountMenu(page);
    await press(menu.getByRole('link', { name: /Settings and notices/ }));
    await expect(page.getByRole('region', { name: 'Notices' }).getByText(REASON)).toBeVisible();
    await expect(page.getByTestId('notice-badge')).toHaveCount(0);
  });

  test('the appeal waits in the review queue as an item of its own', async ({ page }) => {
    await signIn(page, 'moss@clackwater.example');
    await page.goto('/review');
    await settled(page);
    const appeal = page.locator('[data-review-item][data-review-kind="appeal"]').filter({ hasText: UNSAFE });
    await expect(appeal).toHaveCount(1);
    await expect(appeal.getByRole('region', { name: 'Appeal' })).toContainText(APPEAL);
    await expect(appeal.getByLabel('Action', { exact: true })).toHaveValue('');
  });
});
