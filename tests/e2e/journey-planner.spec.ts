import { test, expect } from '@playwright/test';
import { press, settled, signIn } from '../support/session';

/**
 * Issue 22, a newcomer on a phone: from the home page to a verdict in at most three taps,
 * the units switched midway (every number follows), the plan saved as a site and found
 * again, printed on at most three pages with no controls, and a question asked from it: the
 * site's numbers in its site sheet, the thread linking back to the site, the site listing it.
 */
test('@phone-only the planner’s journey: a verdict in three taps, units that follow, a saved site, a printable plan', async ({
  page,
}) => {
  await signIn(page, 'tamsin@ferncombe.example');
  await page.goto('/');
  await settled(page);
  // tap 1: Plan a site
  await press(page.getByTestId('plan-a-site'));
  await expect(page).toHaveURL(/\/plan/);
  await settled(page);
  const verdict = page.getByTestId('plan-verdict');
  // the verdict sits above the survey on a phone, in view without scrolling
  await expect(verdict).toBeInViewport();
  await expect(verdict).toHaveAttribute('data-verdict', 'works');

  // the reader's own site: 3 ft of fall and 45 ft of lift (invented); 2 US gal/min spare is
  // too little for two people at 80 US gal a day (USGS, common practice)
  await page.getByLabel('Fall', { exact: true }).fill('3');
  await page.getByLabel('Lift', { exact: true }).fill('45');
  await page.getByLabel('Flow the source can spare in the driest month', { exact: true }).fill('2');
  await expect(verdict).not.toHaveAttribute('data-verdict', 'works');
  await expect(verdict.getByText('What would change it')).toBeVisible();

  // switching units: the boxes and the plan follow (3 ft × 0.3048 = 0.914 m, NIST SP 811)
  await press(page.getByRole('banner').getByText('Metric'));
  await expect(page.getByLabel('Fall', { exact: true })).toHaveValue('0.91');
  const plan = page.getByTestId('plan');
  await expect(plan.getByTestId('parts-list')).toContainText(' m long');
  await expect(plan.getByTestId('parts-list')).not.toContainText(' ft long');
  await press(page.getByRole('banner').getByText('US'));
  await expect(page.getByLabel('Fall', { exact: true })).toHaveValue('3');

  // saving the plan as a site, and finding it again at its own address
  await page.getByLabel('Fall', { exact: true }).fill('5');
  await page.getByLabel('Flow the source can spare in the driest month', { exact: true }).fill('12');
  await expect(verdict).toHaveAttribute('data-verdict', 'works');
  await page.getByLabel('Name the site').fill('Ridge spring');
  await press(page.getByRole('button', { name: 'Save as my site' }));
  await expect(page).toHaveURL(/\/sites\/[0-9A-Za-z]+$/);
  await expect(page.getByRole('heading', { level: 1, name: 'Ridge spring' })).toBeVisible();
  await expect(page.getByTestId('site-visibility')).toHaveText('Private: only you');
  await settled(page);
  await expect(page.getByLabel('Fall', { exact: true })).toHaveValue('5');

  // a changed survey is version 2; version 1 stays as it was
  await page.getByLabel('Lift', { exact: true }).fill('40');
  await press(page.getByRole('button', { name: 'Save as a new version of this site' }));
  await expect(page).toHaveURL(/version=2$/);
  await expect(page.getByRole('navigation', { name: 'Versions' })).toBeVisible();

  // printed: no controls, the plan on at most three pages
  await page.emulateMedia({ media: 'print' });
  await expect(page.getByRole('button', { name: 'Print the plan' })).toBeHidden();
  await expect(page.getByRole('form', { name: 'Your survey' })).toBeHidden();
  await expect(page.getByTestId('parts-list')).toBeVisible();
  const pdf = await page.pdf({ format: 'Letter', printBackground: false });
  const pages = (pdf.toString('latin1').match(/\/Type\s*\/Page[^s]/g) ?? []).length;
  expect(pages).toBeGreaterThan(0);
  expect(pages).toBeLessThanOrEqual(3);

  // asking a question from the saved site: the plan fills the site sheet, the thread links back
  await page.emulateMedia({ media: 'screen' });
  const siteAddress = new URL(page.url()).pathname;
  await press(page.getByTestId('ask-about-site'));
  await expect(page).toHaveURL(/\/questions\/ask\?site=[0-9A-Za-z]+$/);
  await settled(page);
  await expect(page.getByTestId('from-site')).toContainText('Ridge spring');
  const sheet = page.locator('section', { has: page.getByRole('heading', { name: 'Site sheet' }) });
  // the newest survey as typed in the reader's US units: 5 ft of fall, 40 ft of lift, 12 US gal/min
  await expect(sheet.getByLabel('Fall', { exact: true })).toHaveValue('5 ft');
  await expect(sheet.getByLabel('Lift', { exact: true })).toHaveValue('40 ft');
  await expect(sheet.getByLabel('Source flow the source can spare', { exact: true })).toHaveValue('12 gal/min');
  // and the plan's design: its pump and drive pipe, in feet
  await expect(sheet.getByLabel('Pump size', { exact: true })).not.toHaveValue('');
  await expect(sheet.getByLabel('Drive pipe size', { exact: true })).not.toHaveValue('');
  await expect(sheet.getByLabel('Drive pipe length', { exact: true })).toHaveValue(/^\d+(\.\d)? ft$/);
  const title = `Ridge spring: one pump or two for a dry summer? (${Date.now() % 100000})`;
  await page.getByLabel('Title', { exact: true }).fill(title);
  await page
    .getByLabel('What happened')
    .fill('The plan for my spring says one pump will do. Is a second worth building before the dry months?');
  await press(page.getByLabel('Drive pipe', { exact: true }));
  await press(page.getByRole('button', { name: 'Post my question' }));
  await expect(page).toHaveURL(/\/questions\/\d+$/);
  // the site is private: its owner's own view names it
  const about = page.getByTestId('thread-site');
  await expect(about).toContainText('Ridge spring');
  await press(about.getByRole('link', { name: 'Ridge spring' }));
  await expect(page).toHaveURL(new RegExp(`${siteAddress}$`));
  await expect(page.getByTestId('site-questions')).toContainText(title);
});
