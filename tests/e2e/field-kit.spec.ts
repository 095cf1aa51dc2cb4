import { test, expect, type Page } from '@playwright/test';
import { press, settled, signIn } from '../support/session';

const START = Date.UTC(2026, 5, 1, 9);
/** The page's clock, set going at a fixed time; paused once the page is up, it moves only as the test says. */
const stillClock = (page: Page) => page.clock.install({ time: START });

/**
 * Issue 24's tools at the water: the trial timer's bucket trials and beat count, and the
 * hose-level fall survey, each worked with the browser's clock under the test's hand so
 * the times are exact.
 */
test('the trial timer times three fills and gives the mean and spread in the reader’s units', async ({
  page,
  baseURL,
}) => {
  await page.context().addCookies([{ name: 'cw_units', value: 'US', url: baseURL! }]);
  await stillClock(page);
  await page.goto('/field-kit/timer');
  await settled(page);
  await page.clock.pauseAt(START + 60_000);
  const timer = page.getByTestId('trial-timer');
  await press(timer.getByRole('button', { name: '5 US gal' }));
  const tap = timer.getByTestId('trial-tap');
  // 5 US gal in 12.0, 12.6 and 11.4 s: 25.0, 23.8 and 26.3 gal/min, mean 25.0 gal/min
  // (5 × 60 / t; the source flow calculator's own worked example, arithmetic by hand)
  for (const ms of [12_000, 12_600, 11_400]) {
    await press(tap);
    await page.clock.runFor(ms);
    await press(tap);
  }
  await expect(timer.getByRole('list', { name: 'Trials' }).getByRole('listitem')).toHaveCount(3);
  const result = timer.getByTestId('trial-result');
  await expect(result).toContainText('Mean flow 25 US gal/min');
  await expect(result).toContainText('The trials agree');
  await expect(timer.getByRole('list', { name: 'Trials' })).toContainText('12.6 s');

  // a fill half as long again is a trial that disagrees: 5 gal in 18 s (arithmetic by hand)
  await press(tap);
  await page.clock.runFor(18_000);
  await press(tap);
  await expect(result.locator('[data-warning="bucket-spread-high"]')).toBeVisible();
  await press(timer.getByRole('button', { name: 'Remove trial 4' }));
  await expect(result).toContainText('The trials agree');
});

test('the beat counter gives beats a minute from taps, and says when a count is short', async ({ page }) => {
  await stillClock(page);
  await page.goto('/field-kit/timer');
  await settled(page);
  await page.clock.pauseAt(START + 60_000);
  const counter = page.getByTestId('beat-counter');
  const tap = counter.getByTestId('beat-tap');
  // a tap every 1.5 s for 21 taps: 20 gaps in 30 s = 40 a minute (arithmetic by hand);
  // the count stops by itself at 30 s
  for (let i = 0; i < 21; i++) {
    if (i > 0) await page.clock.runFor(1_500);
    await press(tap);
  }
  await expect(counter.getByTestId('beat-result')).toContainText('40 beats a minute');
  await expect(tap).toBeDisabled();
  await press(counter.getByRole('button', { name: 'Count again' }));
  for (let i = 0; i < 6; i++) {
    if (i > 0) await page.clock.runFor(2_000);
    await press(tap);
  }
  await press(counter.getByRole('button', { name: 'Done' }));
  // 5 gaps in 10 s = 30 a minute, under the 15 s the kit asks for (common practice, no source)
  await expect(counter.getByTestId('beat-result')).toContainText('30 beats a minute');
  await expect(counter.getByTestId('beat-result')).toContainText('Counted for under 15 seconds');
});

test('the fall survey adds the stages and checks the walk back', async ({ page, baseURL }) => {
  await page.context().addCookies([{ name: 'cw_units', value: 'US', url: baseURL! }]);
  await page.goto('/field-kit/fall');
  await settled(page);
  const survey = page.getByTestId('fall-survey');
  const down = survey.getByRole('list', { name: 'Stations walking down' });
  // the surveying guide's three stages: 10/28, 8/25, 12/25 in, a fall of 48 in = 4 ft
  const readings = [
    ['10', '28'],
    ['8', '25'],
    ['12', '25'],
  ];
  for (const [i, [upper, lower]] of readings.entries()) {
    if (i > 0) await press(down.getByRole('button', { name: 'Add a stage' }));
    const stage = down.getByRole('listitem').nth(i);
    await stage.getByLabel('Uphill pole reads').fill(upper!);
    await stage.getByLabel('Downhill pole reads').fill(lower!);
  }
  await expect(survey.getByTestId('stage-drop').nth(1)).toContainText('drop 17 in');
  await expect(survey.getByTestId('fall-total')).toContainText('Fall 4 ft');
  await expect(survey.getByRole('link', { name: 'Plan a site with this fall' })).toHaveAttribute(
    'href',
    '/plan?fall=4%20ft&fallMethod=hose-level',
  );

  // back up in two stages of 20 and 27 in: 47 in, an inch apart, within the guide's inch or two
  await press(survey.getByRole('button', { name: 'Walk back and check' }));
  const back = survey.getByRole('list', { name: 'Stations walking back' });
  await back.getByRole('listitem').nth(0).getByLabel('Uphill pole reads').fill('5');
  await back.getByRole('listitem').nth(0).getByLabel('Downhill pole reads').fill('25');
  await press(back.getByRole('button', { name: 'Add a stage' }));
  await back.getByRole('listitem').nth(1).getByLabel('Uphill pole reads').fill('3');
  await back.getByRole('listitem').nth(1).getByLabel('Downhill pole reads').fill('30');
  await expect(survey.getByTestId('fall-closure')).toContainText('1 in apart: the survey closes');
  // a misread pole: 30 → 36 makes the walk back 53 in, 5 in apart (arithmetic by hand)
  await back.getByRole('listitem').nth(1).getByLabel('Downhill pole reads').fill('36');
  await expect(survey.getByTestId('fall-closure')).toContainText('5 in apart, more than 2 in');
});

test('a whole visit with no signal: trials and beats timed, kept as a field log test, sent once when back online', async ({
  page,
  baseURL,
}) => {
  await signIn(page, 'tamsin@ferncombe.example');
  await page.context().addCookies([{ name: 'cw_units', value: 'US', url: baseURL! }]);
  const before = await fieldLogTotal(page);
  await stillClock(page);
  await page.goto('/field-kit/timer');
  await settled(page);
  // the page is up and knows who is reading: from here the phone has no signal
  await expect(page.getByTestId('account-menu')).toBeVisible();
  await page.clock.pauseAt(START + 60_000);
  await page.context().setOffline(true);
  const timer = page.getByTestId('trial-timer');
  // the delivery caught in a 1-gallon can: about 0.6 US gal/min from 8 US gal/min of drive
  // water (invented figures, inside what a ram does: 0.6 × 30 / (8 × 5) = 0.45 efficiency)
  await press(timer.getByRole('button', { name: '1 US gal' }));
  for (const ms of [96_000, 100_000, 98_000]) {
    await press(timer.getByTestId('trial-tap'));
    await page.clock.runFor(ms);
    await press(timer.getByTestId('trial-tap'));
  }
  const beat = page.getByTestId('beat-counter').getByTestId('beat-tap');
  // a tap every 1.2 s for 26 taps: 25 gaps in 30 s = 50 a minute (arithmetic by hand)
  for (let i = 0; i < 26; i++) {
    if (i > 0) await page.clock.runFor(1_200);
    await press(beat);
  }
  await page.clock.resume();
  const record = page.getByTestId('field-visit-record');
  await press(record.getByRole('button', { name: 'Record these 3 trials as a field log test' }));
  const form = record.getByRole('form', { name: 'Record a field log test' });
  await expect(form.getByLabel('Trial 3 seconds')).toHaveValue('98');
  await expect(form.getByLabel('Trial 1 volume')).toHaveValue('1 gal');
  await expect(form.getByLabel('Beats per minute')).toHaveValue('50');
  await form.getByLabel('Site name').fill('Hollin spring, below the sheepfold');
  await form.getByLabel('Fall', { exact: true }).fill('5 ft');
  await form.getByLabel('Lift', { exact: true }).fill('30 ft');
  await form.getByLabel('Drive pipe length').fill('40 ft');
  await form.getByLabel('Drive flow (all pumps)').fill('8 gal/min');
  await press(form.getByRole('button', { name: 'Save the test' }));
  const kept = page.getByTestId('entry-kept');
  await expect(kept.getByTestId('outbox')).toContainText('Waiting to send');
  expect(await fieldLogTotal(page)).toBe(before);

  await page.context().setOffline(false);
  await expect(kept.getByTestId('outbox')).toContainText('Nothing waiting');
  const sent = kept.getByRole('link', { name: /^Field log: Hollin spring/ });
  const url = await sent.getAttribute('href');
  expect(await fieldLogTotal(page)).toBe(before + 1);
  // the trials arrived as timed: 1 US gal = 3.785 L (NIST Handbook 44, 2023: 1 gal = 231 in³)
  const entry = await (await page.request.get(`/api${url}`)).json();
  expect(entry.trials.map((t: { seconds: number }) => t.seconds)).toEqual([96, 100, 98]);
  expect(entry.trials[0].volumeL).toBeCloseTo(3.785, 3);
  expect(entry.beatsPerMinute).toBe(50);
});

const fieldLogTotal = async (page: Page) =>
  ((await (await page.request.get('/api/field-log?perPage=1')).json()) as { total: number }).total;
