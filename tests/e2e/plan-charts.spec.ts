import { test, expect, type Locator } from '@playwright/test';
import { settled } from '../support/session';
import { wrongUnits } from '../support/unit-words';

/**
 * Issue 22: the plan's month-by-month chart and its site sketch, in the reader's units, on
 * a phone and a desktop, with labels that keep apart, and both on the printed plan.
 */
type Box = { x: number; y: number; width: number; height: number };
const overlap = (a: Box, b: Box) =>
  a.x < b.x + b.width && b.x < a.x + a.width && a.y < b.y + b.height && b.y < a.y + a.height;

/** Each element's box and words, as the browser drew them. */
async function boxes(of: Locator) {
  return of.evaluateAll((els) =>
    els.map((e) => {
      const r = e.getBoundingClientRect();
      return { text: e.textContent ?? '', x: r.x, y: r.y, width: r.width, height: r.height };
    }),
  );
}

const PLAN = `/plan?${new URLSearchParams({ wetFlow: '25 gal/min' })}`;

for (const units of ['US', 'metric'] as const) {
  test(`the site sketch and the month chart speak ${units} units, labels apart`, async ({ page, baseURL }) => {
    await page.context().addCookies([{ name: 'cw_units', value: units, url: baseURL! }]);
    await page.goto(PLAN);
    await settled(page);

    const sketch = page.getByTestId('plan-sketch').getByRole('img');
    await expect(sketch).toBeVisible();
    // the planner's defaults: 4 ft of fall and 29 ft of lift; in metric as a tape gives them,
    // 1.22 m and 8.8 m (NIST SP 811, 2008: 1 ft = 0.3048 m; to the cm under 5 m, the 0.1 m under 100 m: common practice, no source)
    await expect(sketch).toHaveAttribute(
      'aria-label',
      units === 'US'
        ? /^Site sketch, not to scale: fall 4 ft; lift 29 ft; /
        : /^Site sketch, not to scale: fall 1.22 m; lift 8.8 m; /,
    );
    const frame = (await sketch.boundingBox())!;
    const labels = await boxes(sketch.locator('[data-sketch-label]'));
    expect(labels.map((l) => l.text).join(' ')).toMatch(units === 'US' ? /Fall ?4 ft/ : /Fall ?1.22 m/);
    // drive pipe and delivery line: size and length; the tank's volume
    expect(labels.find((l) => l.text.startsWith('Drive pipe'))?.text).toMatch(
      units === 'US' ? / ft long$/ : / m long$/,
    );
    expect(labels.find((l) => l.text.startsWith('Delivery line'))?.text).toMatch(/pipe/);
    expect(labels.find((l) => l.text.startsWith('Storage tank'))?.text).toMatch(units === 'US' ? /US gal/ : / L,/);
    await expect(sketch.getByText('Not to scale')).toBeVisible();
    // no two labels overlap, and none leaves the drawing (common practice, no source)
    for (let i = 0; i < labels.length; i++) {
      const a = labels[i]!;
      expect(a.x, a.text).toBeGreaterThanOrEqual(frame.x - 0.5);
      expect(a.x + a.width, a.text).toBeLessThanOrEqual(frame.x + frame.width + 0.5);
      for (const b of labels.slice(i + 1)) expect(overlap(a, b), `${a.text} / ${b.text}`).toBe(false);
    }
    expect(frame.x + frame.width).toBeLessThanOrEqual(page.viewportSize()!.width);

    const chart = page.getByTestId('plan-months-chart').getByRole('group', { name: /^Water delivered a day/ });
    await expect(chart).toBeVisible();
    await expect(chart).toHaveAttribute('aria-label', units === 'US' ? /\(US gal\/day\)$/ : /\(L\/day\)$/);
    await expect(chart.locator('[data-month]')).toHaveCount(12);
    // round ticks from zero (Heckbert, "Nice numbers for graph labels", Graphics Gems, 1990): multiples of 1, 2 or 5 × 10^n
    const ticks = (await chart.locator('[data-tick="y"]').allTextContents()).map((t) => Number(t.replace(/,/g, '')));
    expect(ticks[0]).toBe(0);
    const step = ticks[1]! - ticks[0]!;
    expect([1, 2, 5]).toContain(Number((step / 10 ** Math.floor(Math.log10(step))).toFixed(6)));
    const chartText = await boxes(chart.locator('text'));
    for (let i = 0; i < chartText.length; i++)
      for (const b of chartText.slice(i + 1))
        expect(overlap(chartText[i]!, b), `${chartText[i]!.text} / ${b.text}`).toBe(false);

    // every word of both in the reader's system, never e-notation
    const words = [...labels.map((l) => l.text), ...chartText.map((t) => t.text)];
    words.push((await sketch.getAttribute('aria-label')) ?? '', (await chart.getAttribute('aria-label')) ?? '');
    for (const w of words) {
      expect(wrongUnits(w, units), w).toEqual([]);
      expect(w).not.toMatch(/\de[-+]?\d/i);
    }
    // a month read by finger or keyboard
    await chart.locator('[data-month="8"]').focus();
    await expect(chart.locator('[data-chart-label="month"]')).toContainText(
      units === 'US' ? /^August: delivers [\d.,]+ US gal\/day/ : /^August: delivers [\d.,]+ L\/day/,
    );
  });
}

test('months short of the need are hatched and named, not told by colour alone', async ({ page, baseURL }) => {
  await page.context().addCookies([{ name: 'cw_units', value: 'US', url: baseURL! }]);
  // 3.5 US gal/min in the driest month for three people (invented): only August, the driest, is short
  await page.goto(`/plan?${new URLSearchParams({ wetFlow: '25 gal/min', spareFlow: '3.5 gal/min', people: '3' })}`);
  await settled(page);
  const chart = page.getByTestId('plan-months-chart');
  const short = chart.locator('[data-month="8"]');
  await expect(short).toHaveAttribute('data-short', 'true');
  // the bar is filled with the hatch pattern, not a flat colour
  const fill = await short
    .locator('rect')
    .nth(1)
    .evaluate((r) => getComputedStyle(r).fill);
  expect(fill).toMatch(/^url\(/);
  await expect(short.locator('[data-tick="x"]')).toHaveAttribute('font-weight', '700');
  await expect(chart.getByTestId('plan-months-summary')).toHaveText(/^Short of the need in August\./);
});

test('the printed plan carries the sketch and the month chart, no controls, on at most three pages', async ({
  page,
  baseURL,
}) => {
  await page.context().addCookies([{ name: 'cw_units', value: 'US', url: baseURL! }]);
  await page.goto(PLAN);
  await settled(page);
  await page.emulateMedia({ media: 'print' });
  await expect(page.getByTestId('plan-sketch')).toBeVisible();
  await expect(page.getByTestId('plan-months-chart')).toBeVisible();
  await expect(page.getByRole('form', { name: 'Your survey' })).toBeHidden();
  await expect(page.getByText('The months as a table')).toBeHidden();
  await expect(page.getByRole('button', { name: 'Print the plan' })).toBeHidden();
  const pdf = await page.pdf({ format: 'Letter', printBackground: false });
  const pages = (pdf.toString('latin1').match(/\/Type\s*\/Page[^s]/g) ?? []).length;
  expect(pages).toBeGreaterThan(0);
  expect(pages).toBeLessThanOrEqual(3);
});
