import { test, expect } from '@playwright/test';

/**
 * "Show the working" on a phone: the numbers in the reader's units, each step numbered once,
 * and a long formula scrolls inside the card with a cue instead of being cut off.
 */
test.use({ viewport: { width: 390, height: 844 } });

for (const [units, flow, notFlow] of [
  ['metric', /L\/min|L\/h/, /gal\//],
  ['US', /US\\ gal\/(min|h)/, /L\/min|L\/h/],
] as const) {
  test(`the delivery line's working reads in ${units} units on a phone`, async ({ page, context, baseURL }) => {
    await context.addCookies([{ name: 'cw_units', value: units, url: baseURL! }]);
    // 100 ft of ½" line carrying 2 US gal/min up 29 ft (common practice, no source)
    await page.goto(
      '/calculators/delivery-line?flow=2+gal%2Fmin&lift=29+ft&length=100+ft&size=1%2F2&material=pvc-sch40',
    );
    await page.getByText('Show the working').click();
    const working = page.getByTestId('working');
    await expect(working.locator('.katex').first()).toBeVisible();
    // the TeX KaTeX keeps beside its drawing (the drawn text is split glyph by glyph)
    const numbers = await working.getByTestId('working-numbers').locator('annotation').allTextContents();
    const answers = await working.getByTestId('working-answer').allInnerTexts();
    const all = [...numbers, ...answers].join('\n');
    expect(all).toMatch(flow);
    // every step in the reader's units (Hazen-Williams in the system its constant is written for)
    const velocity = numbers[0] ?? '';
    expect(velocity).not.toMatch(notFlow);
    expect(all).not.toMatch(/\de[-+]?\d/);
    // numbered once: no step title starts with a typed number
    for (const t of await working.locator('li > p').first().allInnerTexts()) expect(t).not.toMatch(/^\d+\./);
    // nothing is cut off: the page never scrolls sideways, and a wide formula says there is more
    expect(await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth)).toBe(
      0,
    );
    // every formula wider than its strip shows the cue, and only those (the cue follows a resize observer)
    const strips = () =>
      working.locator('.cw-scroll-x[role="group"]').evaluateAll((list) =>
        list.map((el) => ({
          over: el.scrollLeft + el.clientWidth < el.scrollWidth - 2,
          cue: !!el.parentElement?.querySelector('[data-testid="working-more"]'),
        })),
      );
    await expect.poll(async () => (await strips()).filter((x) => x.cue !== x.over).length).toBe(0);
    // Hazen-Williams' metric numbers (0.00000847 m³/s) are wider than a phone: that strip says there is more
    if (units === 'metric') expect((await strips()).some((x) => x.over)).toBe(true);
  });
}
