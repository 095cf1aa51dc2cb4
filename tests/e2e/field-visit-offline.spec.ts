import mariadb from 'mariadb';
import sharp from 'sharp';
import { test, expect, type BrowserContext, type Page } from '@playwright/test';
import { openAccountMenu, press, settled, signIn } from '../support/session';

/**
 * Issue 24's "done when": a member does a whole field visit — fall survey, trials, beats a
 * minute, a field log test with a photo — with no signal, having opened the field kit once
 * online, and everything arrives once when the phone is back online, even when the
 * connection drops in the middle of the send.
 */

const START = Date.UTC(2026, 5, 1, 9);
const MEMBER = 'tamsin@ferncombe.example';
const HANDLE = 'ferncombe_tamsin';

/** The member's rows as the database has them: entries, photos, photos on an entry. */
async function rows() {
  const conn = await mariadb.createConnection({
    host: process.env.DB_HOST ?? '127.0.0.1',
    port: Number(process.env.DB_PORT ?? 3408),
    user: process.env.DB_USER ?? 'clackwater',
    password: process.env.DB_PASSWORD ?? 'clackwater',
    database: process.env.DB_NAME ?? 'clackwater_test',
  });
  try {
    const [r] = (await conn.query(
      `SELECT (SELECT COUNT(*) FROM field_log_entries e WHERE e.author_id = u.id) AS entries,
              (SELECT COUNT(*) FROM photos p WHERE p.owner_id = u.id) AS photos,
              (SELECT COUNT(*) FROM photos p WHERE p.owner_id = u.id AND p.field_log_entry_id IS NOT NULL) AS attached
         FROM users u WHERE u.handle = ?`,
      [HANDLE],
    )) as { entries: bigint; photos: bigint; attached: bigint }[];
    return { entries: Number(r!.entries), photos: Number(r!.photos), attached: Number(r!.attached) };
  } finally {
    await conn.end();
  }
}

/** Every URL in the page's Cache Storage, across caches. */
function cachedUrls(page: Page): Promise<string[]> {
  return page.evaluate(async () => {
    const out: string[] = [];
    for (const name of await caches.keys())
      for (const req of await (await caches.open(name)).keys()) out.push(new URL(req.url).pathname);
    return out;
  });
}

/** Signed in, one visit to the field kit with signal: the worker keeps the kit and the form. */
async function visitFieldKitOnline(page: Page, context: BrowserContext, baseURL: string) {
  await context.addCookies([{ name: 'cw_units', value: 'US', url: baseURL }]);
  await signIn(page, MEMBER);
  await page.goto('/field-kit');
  await settled(page);
  await page.waitForFunction(() => navigator.serviceWorker.controller?.state === 'activated');
  await expect
    .poll(() => cachedUrls(page), { timeout: 20_000 })
    .toEqual(expect.arrayContaining(['/field-kit', '/field-kit/timer', '/field-kit/fall', '/field-log/new']));
}

/** A small real photo: a PNG drawn by sharp, the colour of the moss in DESIGN.md. */
const photo = async (name: string) => ({
  name,
  mimeType: 'image/png',
  buffer: await sharp({ create: { width: 96, height: 64, channels: 3, background: { r: 95, g: 122, b: 58 } } })
    .png()
    .toBuffer(),
});

test('a whole field visit with no signal, a photo included, arrives once when the phone is back online', async ({
  page,
  context,
  baseURL,
}) => {
  test.setTimeout(90_000);
  await visitFieldKitOnline(page, context, baseURL!);
  const before = await rows();
  await context.setOffline(true);

  // the fall survey, opened fresh with no signal: the surveying guide's three stages,
  // 10/28, 8/25 and 12/25 in, a fall of 48 in = 4 ft (arithmetic by hand)
  await page.goto('/field-kit/fall');
  await settled(page);
  const survey = page.getByTestId('fall-survey');
  const down = survey.getByRole('list', { name: 'Stations walking down' });
  for (const [i, [upper, lower]] of [
    ['10', '28'],
    ['8', '25'],
    ['12', '25'],
  ].entries()) {
    if (i > 0) await press(down.getByRole('button', { name: 'Add a stage' }));
    await down.getByRole('listitem').nth(i).getByLabel('Uphill pole reads').fill(upper!);
    await down.getByRole('listitem').nth(i).getByLabel('Downhill pole reads').fill(lower!);
  }
  await expect(survey.getByTestId('fall-total')).toContainText('Fall 4 ft');

  // the trial timer, opened fresh with no signal: it knows its member from the last visit
  await page.clock.install({ time: START });
  await page.goto('/field-kit/timer');
  await settled(page);
  await page.clock.pauseAt(START + 60_000);
  const timer = page.getByTestId('trial-timer');
  // a 1-gallon can in 96, 100 and 98 s (invented figures, about 0.6 US gal/min)
  await press(timer.getByRole('button', { name: '1 US gal' }));
  for (const ms of [96_000, 100_000, 98_000]) {
    await press(timer.getByTestId('trial-tap'));
    await page.clock.runFor(ms);
    await press(timer.getByTestId('trial-tap'));
  }
  // a tap every 1.2 s for 26 taps: 25 gaps in 30 s = 50 a minute (arithmetic by hand)
  const beat = page.getByTestId('beat-counter').getByTestId('beat-tap');
  for (let i = 0; i < 26; i++) {
    if (i > 0) await page.clock.runFor(1_200);
    await press(beat);
  }
  await page.clock.resume();
  const record = page.getByTestId('field-visit-record');
  await press(record.getByRole('button', { name: 'Record these 3 trials as a field log test' }));
  await expect(record.getByTestId('known-offline')).toContainText(`recorded as @${HANDLE}`);
  const form = record.getByRole('form', { name: 'Record a field log test' });
  await expect(form.getByLabel('Beats per minute')).toHaveValue('50');
  await form.getByLabel('Site name').fill('Hollin spring, the visit with no signal');
  await form.getByLabel('Fall', { exact: true }).fill('4 ft');
  await form.getByLabel('Lift', { exact: true }).fill('30 ft');
  await form.getByLabel('Drive pipe length').fill('40 ft');
  // 0.6 × 30 / (8 × 4) ≈ 0.56 efficiency, inside what a ram does (common practice, no source)
  await form.getByLabel('Drive flow (all pumps)').fill('8 gal/min');
  await form.getByLabel('Photos of the installation (optional)').setInputFiles(await photo('ram-house.png'));
  await expect(form.getByRole('img', { name: 'Photo 1 of 1: ram-house.png' })).toBeVisible();
  await press(form.getByRole('button', { name: 'Save the test' }));
  const kept = page.getByTestId('entry-kept');
  const outbox = kept.getByTestId('outbox');
  await expect(outbox).toContainText('Waiting to send');
  await expect(outbox.getByRole('img', { name: 'Photo 1: ram-house.png' })).toBeVisible();

  // the field log form itself opens with no signal too, for this member
  await page.goto('/field-log/new');
  await expect(page.getByRole('heading', { level: 1, name: 'Record a test' })).toBeVisible();
  await expect(page.getByRole('form', { name: 'Record a field log test' })).toBeVisible();
  expect(await rows()).toEqual(before);

  // back at the field kit, the signal returns: the outbox sends the photo, then the test
  await page.goto('/field-kit');
  await settled(page);
  await expect(page.getByTestId('outbox')).toContainText('Waiting to send');
  await context.setOffline(false);
  await expect(page.getByTestId('outbox')).toContainText('Nothing waiting');
  const sent = page.getByTestId('outbox').getByRole('link', { name: /^Field log: Hollin spring/ });
  const url = await sent.getAttribute('href');
  expect(await rows()).toEqual({
    entries: before.entries + 1,
    photos: before.photos + 1,
    attached: before.attached + 1,
  });
  const entry = await (await page.request.get(`/api${url}`)).json();
  expect(entry.trials.map((t: { seconds: number }) => t.seconds)).toEqual([96, 100, 98]);
  expect(entry.beatsPerMinute).toBe(50);
});

test('a send cut off after the server wrote the photo, and again after it wrote the test, is still one of each', async ({
  page,
  context,
  baseURL,
}) => {
  test.setTimeout(90_000);
  await visitFieldKitOnline(page, context, baseURL!);
  const before = await rows();
  await context.setOffline(true);
  await page.goto('/field-log/new');
  const form = page.getByRole('form', { name: 'Record a field log test' });
  await form.getByLabel('Site name').fill('Hollin spring, the answer lost twice');
  await form.getByLabel('Fall', { exact: true }).fill('4 ft');
  await form.getByLabel('Lift', { exact: true }).fill('30 ft');
  await form.getByLabel('Drive pipe length').fill('40 ft');
  await form.getByLabel('Drive flow (all pumps)').fill('8 gal/min');
  // a 1-gallon can in 98 s (invented figures)
  await form.getByLabel('Trial 1 volume').fill('1 gal');
  await form.getByLabel('Trial 1 seconds').fill('98');
  await form.getByLabel('Photos of the installation (optional)').setInputFiles(await photo('outlet.png'));
  await press(form.getByRole('button', { name: 'Save the test' }));
  await expect(page.getByTestId('entry-kept').getByTestId('outbox')).toContainText('Waiting to send');

  // each request reaches the server and is written; the first answer of each never arrives
  const cut = new Set<string>();
  await page.route(/\/api\/(photos|field-log)$/, async (route) => {
    const path = new URL(route.request().url()).pathname;
    if (route.request().method() !== 'POST' || cut.has(path)) return route.continue();
    cut.add(path);
    await route.fetch();
    await route.abort('connectionreset');
  });
  await page.goto('/field-kit');
  await settled(page);
  await context.setOffline(false);
  const outbox = page.getByTestId('outbox');
  // the photo's answer was lost: it waits, and the server has the photo already
  await expect(outbox).toContainText('tried once');
  await expect.poll(rows).toMatchObject({ photos: before.photos + 1, entries: before.entries });
  await press(outbox.getByRole('button', { name: 'Try again now' }));
  // sent again under its key: the same photo; the test's answer is lost in turn
  await expect(outbox).toContainText('tried 2 times');
  await expect.poll(rows).toMatchObject({ photos: before.photos + 1, entries: before.entries + 1 });
  await press(outbox.getByRole('button', { name: 'Try again now' }));
  await expect(outbox).toContainText('Nothing waiting');
  await expect(outbox.getByRole('link', { name: /^Field log: Hollin spring, the answer lost twice/ })).toBeVisible();
  expect(await rows()).toEqual({
    entries: before.entries + 1,
    photos: before.photos + 1,
    attached: before.attached + 1,
  });
});

test('signing out forgets the kept form and the member, so the next person on the phone gets neither', async ({
  page,
  context,
  baseURL,
}) => {
  test.setTimeout(60_000);
  await visitFieldKitOnline(page, context, baseURL!);
  expect(await page.evaluate(() => localStorage.getItem('clackwater-member'))).toContain(HANDLE);
  const menu = await openAccountMenu(page);
  await press(menu.getByRole('button', { name: 'Sign out' }));
  await expect(page.getByRole('banner').getByRole('link', { name: 'Sign in' })).toBeVisible();
  await expect.poll(() => cachedUrls(page)).not.toContain('/field-log/new');
  await expect.poll(() => page.evaluate(() => localStorage.getItem('clackwater-member'))).toBeNull();

  // the next person opens the timer with signal (signing out forgot every kept page), then loses it
  await page.clock.install({ time: START });
  await page.goto('/field-kit/timer');
  await expect.poll(() => cachedUrls(page)).toContain('/field-kit/timer');
  await context.setOffline(true);
  await page.goto('/field-log/new');
  await expect(page.getByRole('heading', { level: 1, name: /No signal/ })).toBeVisible();
  await expect(page.getByRole('form', { name: 'Record a field log test' })).toHaveCount(0);
  // the timer offers to sign in rather than to record as the last member
  await page.goto('/field-kit/timer');
  await settled(page);
  await page.clock.pauseAt(START + 60_000);
  const timer = page.getByTestId('trial-timer');
  await press(timer.getByRole('button', { name: '1 US gal' }));
  await press(timer.getByTestId('trial-tap'));
  await page.clock.runFor(98_000);
  await press(timer.getByTestId('trial-tap'));
  const record = page.getByTestId('field-visit-record');
  await expect(record.getByRole('link', { name: 'Sign in' })).toBeVisible();
  await expect(record.getByText(HANDLE)).toHaveCount(0);
});
