/** The month-by-month chart's scale: the reader's units, round ticks, short months, bars inside the plot. */
import { describe, expect, it } from 'vitest';
import { toSI, type MonthlyDelivery } from '@/lib/hydraulics';
import { monthChartLayout } from '@/lib/plan/monthChart';

const gal = (g: number) => toSI(g, 'gal', 'volume');
/** A year of US gallons a day, 160 needed every month; July to September short (invented). */
const DELIVERED = [300, 280, 250, 220, 190, 170, 140, 110, 130, 180, 240, 290];
const monthly: MonthlyDelivery = {
  months: DELIVERED.map((g, i) => ({
    month: i + 1,
    spareFlowM3s: 0,
    deliveredM3PerDay: gal(g),
    demandM3PerDay: gal(160),
  })),
  method: 'test',
};

describe('the month-by-month chart', () => {
  it('reads in US gallons a day for a US reader, litres a day for a metric one', () => {
    const us = monthChartLayout(monthly, 'US', 330);
    expect(us.unit).toBe('US gal/day');
    // the values round-trip as typed (NIST SP 811, 2008: 1 US gal = 3.785411784 L)
    expect(us.bars[0]!.delivered).toBeCloseTo(300, 6);
    expect(us.bars[0]!.needed).toBeCloseTo(160, 6);
    const metric = monthChartLayout(monthly, 'metric', 330);
    expect(metric.unit).toBe('L/day');
    // 300 US gal × 3.785411784 L = 1,135.6 L (NIST SP 811, 2008)
    expect(metric.bars[0]!.delivered).toBeCloseTo(1135.6, 1);
    expect(metric.bars[0]!.words).toBe('January: delivers 1,140 L/day, needs 606 L/day');
  });

  it('ticks from zero in round steps past the largest value, never in e-notation', () => {
    for (const units of ['US', 'metric'] as const) {
      const { ticks, bars } = monthChartLayout(monthly, units, 330);
      // Heckbert, "Nice numbers for graph labels", Graphics Gems (1990): steps of 1, 2 or 5 × 10^n
      const step = ticks.step / 10 ** Math.floor(Math.log10(ticks.step));
      expect([1, 2, 5]).toContain(step);
      expect(ticks.values[0]).toBe(0);
      expect(ticks.max).toBeGreaterThanOrEqual(Math.max(...bars.map((b) => b.delivered)));
      for (const l of ticks.labels) expect(l).not.toMatch(/e[-+]?\d/i);
    }
    // a trickle: 0.5 US gal a day is still written plainly (common practice, no source)
    const tiny = monthChartLayout(
      {
        ...monthly,
        months: monthly.months.map((m) => ({ ...m, deliveredM3PerDay: gal(0.5), demandM3PerDay: gal(0.3) })),
      },
      'US',
      330,
    );
    for (const l of tiny.ticks.labels) expect(l).not.toMatch(/e[-+]?\d/i);
  });

  it('flags the months short of the need, and only those', () => {
    const { bars, shortMonths } = monthChartLayout(monthly, 'US', 330);
    expect(shortMonths).toEqual(['July', 'August', 'September']);
    expect(bars.filter((b) => b.short).map((b) => b.month)).toEqual([7, 8, 9]);
    expect(bars[7]!.words).toMatch(/short of the need$/);
  });

  it('draws bar heights in proportion, every bar inside the plot, the need line at its value', () => {
    const l = monthChartLayout(monthly, 'US', 330);
    const { left, top, width, height } = l.plot;
    for (const b of l.bars) {
      expect(b.x).toBeGreaterThanOrEqual(left);
      expect(b.x + b.width).toBeLessThanOrEqual(left + width + 1e-9);
      expect(b.top).toBeGreaterThanOrEqual(top - 1e-9);
      expect(b.top + b.height).toBeCloseTo(top + height, 9);
    }
    // 300 against 150 would be twice as tall; here January (300) against August (110): hand calculation
    expect(l.bars[0]!.height / l.bars[7]!.height).toBeCloseTo(300 / 110, 6);
    // the need line sits where a bar of 160 would end
    const per = l.bars[0]!.height / 300;
    expect(top + height - l.bars[0]!.needY).toBeCloseTo(160 * per, 6);
  });

  it('writes month initials on a phone and three letters where they fit', () => {
    // a 390 px phone leaves the card about 330 px; twelve slots of ~24 px hold one letter (common practice, no source)
    expect(
      monthChartLayout(monthly, 'US', 330)
        .bars.map((b) => b.tick)
        .join(''),
    ).toBe('JFMAMJJASOND');
    expect(monthChartLayout(monthly, 'US', 800).bars.map((b) => b.tick)).toEqual([
      'Jan',
      'Feb',
      'Mar',
      'Apr',
      'May',
      'Jun',
      'Jul',
      'Aug',
      'Sep',
      'Oct',
      'Nov',
      'Dec',
    ]);
  });
});
