import { test, expect } from '@playwright/test';
import { settled, signedIn } from '../support/session';

const STAMP = Date.now() % 100000;
const TITLE = `Ram stalls at dusk when the pool drops ${STAMP}`;
const LINE = `Set the intake box a foot below the dry-week level (${STAMP})`;

test('the asker marks the fix with one line; the thread opens with it and the list shows it, in US and metric', async ({
  browser,
}) => {
  test.setTimeout(120_000);
  const tamsin = await signedIn(browser, 'tamsin@ferncombe.example');
  const ask = await tamsin.request.post('/api/questions', {
    data: {
      title: TITLE,
      body: 'The half-inch ram beats all day and stops around dusk, when the pool is at its lowest.',
      tags: ['stall'],
      siteSheet: {
        fall: '4 ft',
        lift: '29 ft',
        driveFlow: '2 gal/min',
        pumpSize: '1/2',
        symptoms: 'stops-after-some-beats',
      },
    },
  });
  expect(ask.status()).toBe(201);
  const { id: qid } = (await ask.json()) as { id: number };

  // The list: the site at a glance in the reader's units, and where the question stands.
  const visitor = await (await browser.newContext()).newPage();
  await visitor.goto('/questions');
  const item = visitor.locator(`[data-question="${qid}"]`);
  await expect(item.getByRole('heading', { name: TITLE })).toBeVisible();
  await expect(item.locator('[data-state="waiting"]')).toHaveText('waiting for a first answer');
  const glance = item.getByTestId('site-glance');
  // 4 ft and 29 ft as typed; 2 US gal/min as typed
  await expect(glance.locator('[data-glance="fall"]')).toContainText('4 ft');
  await expect(glance.locator('[data-glance="lift"]')).toContainText('29 ft');
  await expect(glance.locator('[data-glance="driveFlow"]')).toContainText('2 US gal/min');
  await expect(glance.locator('[data-glance="pumpSize"]')).toContainText('½"');
  await expect(glance.locator('[data-glance="symptom"]')).toHaveText('stops after some beats');
  await visitor.context().addCookies([{ name: 'cw_units', value: 'metric', url: new URL(visitor.url()).origin }]);
  await visitor.reload();
  // 4 ft × 0.3048 = 1.22 m, 29 ft = 8.84 m (international yard and pound agreement, 1959);
  // 2 US gal/min × 3.785411784 L = 7.57 L/min (NIST Handbook 44, appendix C)
  await expect(glance.locator('[data-glance="fall"]')).toContainText('1.22 m');
  await expect(glance.locator('[data-glance="lift"]')).toContainText('8.84 m');
  await expect(glance.locator('[data-glance="driveFlow"]')).toContainText('7.57 L/min');
  await expect(glance.locator('dl')).not.toContainText(/\d ft\b|gal/);

  const valves = await signedIn(browser, 'valves@quarrylane.example');
  const answer = await valves.request.post(`/api/questions/${qid}/answers`, {
    data: { body: 'A vortex at the intake pulls air in when the pool drops; set the intake deeper.' },
  });
  expect(answer.status()).toBe(201);
  const { id: aid } = (await answer.json()) as { id: number };
  await visitor.reload();
  await expect(item.locator('[data-state="worked-on"]')).toHaveText('being worked on');

  // The asker chooses the answer; the line is required, named, and nothing is saved without it.
  await tamsin.goto(`/questions/${qid}`);
  await settled(tamsin);
  const card = tamsin.locator(`[data-answer="${aid}"]`);
  await card.getByRole('button', { name: 'This fixed it' }).click();
  const form = card.getByRole('form', { name: 'What fixed it' });
  await form.getByRole('button', { name: 'Save what fixed it' }).click();
  await expect(form.getByRole('alert')).toContainText('whatFixedIt');
  await form.getByLabel('What fixed it, in one line').fill(LINE);
  const saved = tamsin.waitForResponse((r) => r.request().method() === 'PUT' && r.url().endsWith('/fixed'));
  await form.getByRole('button', { name: 'Save what fixed it' }).click();
  expect((await saved).status()).toBe(200);
  const opening = tamsin.getByRole('region', { name: 'What fixed it' });
  await expect(opening).toContainText(LINE);
  await expect(card).toContainText('What fixed it · chosen by');

  // A reader: the thread opens with the line, above the site sheet, linked to the answer.
  const reader = await (await browser.newContext()).newPage();
  await reader.goto(`/questions/${qid}`);
  const line = reader.getByRole('region', { name: 'What fixed it' });
  await expect(line).toContainText(LINE);
  const [lineBox, sheetBox] = await Promise.all([
    line.boundingBox(),
    reader.getByRole('region', { name: 'Site sheet' }).boundingBox(),
  ]);
  expect(lineBox!.y).toBeLessThan(sheetBox!.y);
  await line.getByRole('link', { name: /answer by/ }).click();
  await expect(reader).toHaveURL(new RegExp(`#answer-${aid}$`));
  await expect(reader.locator(`[data-answer="${aid}"]`)).toBeInViewport();
  await expect(reader.locator('[data-answer]').first()).toHaveAttribute('data-answer', String(aid));

  // The list says it is fixed, in the asker's words, linked to the answer.
  await visitor.reload();
  const fixed = item.locator('[data-state="fixed"]');
  await expect(fixed).toContainText(`fixed — ${LINE}`);
  await expect(fixed.getByRole('link', { name: LINE })).toHaveAttribute('href', `/questions/${qid}#answer-${aid}`);
});
