import { describe, expect, it } from 'vitest';
import { formatTick, niceNumber, niceTicks, spanOf } from '@/lib/charts/ticks';
import { horizontalTicks, overlaps, placeLabel, textWidth, verticalTicks, wrapText } from '@/lib/charts/layout';

describe('nice numbers (Heckbert, "Nice numbers for graph labels", Graphics Gems, 1990)', () => {
  it('rounds to 1, 2, 5 or 10 times a power of ten', () => {
    // Heckbert's thresholds when rounding: < 1.5 → 1, < 3 → 2, < 7 → 5, else 10
    expect([1.4, 1.6, 2.9, 3.1, 6.9, 7.1].map((f) => niceNumber(f, true))).toEqual([1, 2, 2, 5, 5, 10]);
    // and taking the ceiling: ≤ 1 → 1, ≤ 2 → 2, ≤ 5 → 5, else 10
    expect([1, 1.01, 2, 2.01, 5, 5.01].map((f) => niceNumber(f, false))).toEqual([1, 2, 2, 5, 5, 10]);
    // scaled by the power of ten, printed exactly (0.3 not 0.30000000000000004): common practice, no source
    expect(niceNumber(0.0031, true)).toBe(0.005);
    expect(niceNumber(270, false)).toBe(500);
  });

  it('labels the yield curve 0–100 in steps of 20 or 25, not 4.8, 29.8, 54.8', () => {
    // Heckbert's loose labelling of [4.8, 104.8] with 5 ticks: range nice(100) = 100, step nice(25) = 20 (rounded 2.5 → 2)
    const t = niceTicks(4.8, 104.8, 5);
    expect(t.step).toBe(20);
    expect(t.min).toBe(0);
    expect(t.max).toBe(120);
    expect(t.values).toEqual([0, 20, 40, 60, 80, 100, 120]);
    expect(t.decimals).toBe(0);
  });

  it('keeps decimals to the step and ends on whole steps around the data', () => {
    // Heckbert's worked case in spirit: [0.13, 0.87] with 5 ticks → step 0.2, 0 to 1 (hand calculation)
    const t = niceTicks(0.13, 0.87, 5);
    expect(t.values).toEqual([0, 0.2, 0.4, 0.6, 0.8, 1]);
    expect(t.decimals).toBe(1);
    expect(t.values.map((v) => formatTick(v, t.decimals))).toEqual(['0.0', '0.2', '0.4', '0.6', '0.8', '1.0']);
    // every tick a whole multiple of the step, printed without float dust: common practice, no source
    for (const [lo, hi] of [
      [0.0003, 0.0071],
      [-3.3, 12.1],
      [1234, 98765],
      [0.1, 0.3],
    ] as const) {
      const n = niceTicks(lo, hi, 5);
      expect(n.min).toBeLessThanOrEqual(lo);
      expect(n.max).toBeGreaterThanOrEqual(hi);
      for (const v of n.values) expect(Math.abs(v / n.step - Math.round(v / n.step))).toBeLessThan(1e-9);
      for (const v of n.values) expect(String(v)).not.toMatch(/e|\.\d*(0000|9999)/);
    }
  });

  it('gives one value an axis of its own, and never prints e-notation or -0', () => {
    expect(niceTicks(5, 5).values.length).toBeGreaterThanOrEqual(2);
    expect(niceTicks(0, 0).values).toContain(0);
    expect(niceTicks(-1, 1).values).toContain(0);
    expect(
      Object.is(
        niceTicks(-1, 1).values.find((v) => v === 0),
        -0,
      ),
    ).toBe(false);
    // 1e-7 is the first power of ten Number.prototype.toString writes in e-notation (ECMA-262, Number::toString)
    expect(formatTick(0.0000001, 7)).toBe('0.0000001');
    expect(formatTick(25000, 0)).toBe('25,000');
  });

  it('spans the data and the reader’s own point, with zero when asked', () => {
    expect(spanOf([2, 3], [10])).toEqual([2, 10]);
    expect(spanOf([2, 3], [], true)).toEqual([0, 3]);
    expect(spanOf([], [])).toEqual([0, 1]);
  });
});

describe('labels that do not collide', () => {
  it('spaces x tick labels at a phone’s plot width (about 300 px) so no two touch', () => {
    for (const [lo, hi] of [
      [4.8, 104.8],
      [0, 12345],
      [0.001, 0.0523],
      [0, 30],
    ] as const) {
      const t = horizontalTicks(lo, hi, 300, 12);
      const at = (v: number) => ((v - t.min) / (t.max - t.min)) * 300;
      const boxes = t.values.map((v, i) => {
        const w = textWidth(t.labels[i]!, 12);
        return [at(v) - w / 2, 0, w, 14] as [number, number, number, number];
      });
      for (let i = 1; i < boxes.length; i++) expect(overlaps(boxes[i - 1]!, boxes[i]!)).toBe(false);
      expect(t.values.length).toBeGreaterThanOrEqual(2);
    }
  });

  it('puts at most one y tick per 32 px', () => {
    const t = verticalTicks(0, 1, 150, 12);
    expect(t.values.length).toBeLessThanOrEqual(6);
    expect(150 / (t.values.length - 1)).toBeGreaterThanOrEqual(25);
  });

  it('wraps an axis title rather than cutting it off', () => {
    const title = 'delivery (US gal/h)';
    const lines = wrapText(title, 100, 12);
    expect(lines.join(' ')).toBe(title);
    for (const l of lines) expect(textWidth(l, 12)).toBeLessThanOrEqual(100);
    // a word longer than the line breaks after a slash, keeping every character
    expect(wrapText('ft³/s·m²/kg', 40, 12).join('')).toBe('ft³/s·m²/kg');
  });

  it('keeps a point’s label inside the chart, beside the point and not over it', () => {
    for (const [px, py] of [
      [5, 5],
      [295, 5],
      [295, 195],
      [5, 195],
      [150, 100],
    ] as const) {
      const at = placeLabel(px, py, 120, 18, 300, 200);
      expect(at.x).toBeGreaterThanOrEqual(0);
      expect(at.y).toBeGreaterThanOrEqual(0);
      expect(at.x + 120).toBeLessThanOrEqual(300);
      expect(at.y + 18).toBeLessThanOrEqual(200);
      expect(overlaps([at.x, at.y, 120, 18], [px - 4, py - 4, 8, 8])).toBe(false);
    }
  });
});
