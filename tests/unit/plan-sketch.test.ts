/** The site sketch on the plan: its words in the reader's units, and labels that never overlap at any width. */
import { describe, expect, it } from 'vitest';
import { planSite, toSI, type SitePlanInput } from '@/lib/hydraulics';
import { overlaps } from '@/lib/charts/layout';
import { sketchOptions, sketchSummary, sketchTexts } from '@/lib/plan/sketch';
import { joinPhrases, layoutSketch, sketchObstacles, type Box } from '@/lib/plan/sketchLayout';
import { wrongUnits } from '../support/unit-words';

const gpm = (x: number) => toSI(x, 'gal/min', 'flow');
/** The smallholding's brook of tests/hydraulics/sitePlan.test.ts: 4 ft fall, 10 US gal/min, 29 ft up (invented). */
const brook: SitePlanInput = {
  fallM: toSI(4, 'ft', 'length'),
  fallMethod: 'hose-level',
  spareFlowM3s: gpm(10),
  liftM: toSI(29, 'ft', 'length'),
  sourceToPumpRunM: 9,
  pumpToTankRunM: 60,
  demand: { people: 1, perPersonM3PerDay: 0.1 },
};
/** One site each way the plan can be built (the cases of tests/hydraulics/sitePlan.test.ts). */
const SITES: Record<string, SitePlanInput> = {
  'one pump': brook,
  'a standpipe': { ...brook, sourceToPumpRunM: 40 },
  'pumps in parallel': { ...brook, demand: { otherM3PerDay: 1 }, largestSize: '1/2' },
  'two stages': { ...brook, liftM: 40, spareFlowM3s: gpm(40), pumpToTankRunM: 300, demand: { otherM3PerDay: 0.3 } },
};
/** A 390 px phone's card is about 326 px wide; 300 for a small phone, up to a wide desktop column. */
const WIDTHS = [280, 300, 326, 360, 420, 500, 640, 800, 1000];

describe('the sketch’s words', () => {
  const r = planSite(brook).results;
  it('gives the fall, lift, pipes, pump and tank in US units to a US reader', () => {
    const t = Object.fromEntries(sketchTexts(r, 'US').map((l) => [l.id, l.value.join(', ')]));
    // as typed: 4 ft and 29 ft (NIST SP 811, 2008 conversions round-trip)
    expect(t.fall).toBe('4 ft');
    expect(t.lift).toBe('29 ft');
    expect(t.pumps).toMatch(/^1 × [½¾1-9¼"]+ pump$/);
    expect(t.drive).toMatch(/ pipe, (sch|DR) \d+, [\d.,]+ ft long$/);
    expect(t.delivery).toMatch(/ pipe, (sch|DR) \d+, [\d.,]+ ft long$/);
    expect(t.tank).toMatch(/^[\d.,]+ US gal, 3 days’ reserve$/);
    expect(t.source).toBe('10 US gal/min, to spare');
  });

  it('gives metres and litres to a metric reader, and never the other system or e-notation', () => {
    const texts = sketchTexts(r, 'metric');
    const t = Object.fromEntries(texts.map((l) => [l.id, l.value.join(', ')]));
    // 4 ft × 0.3048 = 1.2192 m; 29 ft = 8.839 m; 10 US gal/min = 37.85 L/min (NIST SP 811, 2008)
    expect(t.fall).toBe('1.22 m');
    expect(t.lift).toBe('8.84 m');
    expect(t.source).toBe('37.9 L/min, to spare');
    for (const units of ['US', 'metric'] as const)
      for (const l of sketchTexts(r, units)) {
        const words = `${l.title} ${l.value.join(', ')}`;
        expect(wrongUnits(words, units), words).toEqual([]);
        expect(words).not.toMatch(/\de[-+]?\d/i);
      }
    expect(sketchSummary(texts)).toMatch(/^Site sketch, not to scale: fall 1.22 m; lift 8.84 m; /);
  });

  it('draws a standpipe, parallel pumps and a stage tank only where the plan has them', () => {
    const ids = (s: SitePlanInput) => sketchTexts(planSite(s).results, 'US').map((l) => l.id);
    expect(ids(SITES['one pump']!)).not.toContain('supply');
    expect(ids(SITES['a standpipe']!)).toContain('supply');
    expect(ids(SITES['two stages']!)).toContain('stage');
    expect(sketchOptions(planSite(SITES['pumps in parallel']!).results)?.pumps).toBe(3);
    // a site that cannot work has no pump to draw
    expect(sketchOptions(planSite({ ...brook, fallM: 0.3, liftM: 60 }).results)).toBeNull();
  });
});

describe('the sketch’s labels (common practice, no source: labels must not cover each other or the drawing)', () => {
  const inside = (b: Box, w: number, h: number) => b[0] >= 0 && b[1] >= 0 && b[0] + b[2] <= w && b[1] + b[3] <= h;
  for (const [name, site] of Object.entries(SITES))
    for (const units of ['US', 'metric'] as const)
      it(`${name}, ${units}: every label placed, none overlapping, all inside, at ${WIDTHS.join(', ')} px`, () => {
        const r = planSite(site).results;
        const texts = sketchTexts(r, units);
        for (const width of WIDTHS) {
          const { geometry, labels, height } = layoutSketch(texts, width, sketchOptions(r)!);
          expect(labels.map((l) => l.id).sort(), `${width}`).toEqual(texts.map((t) => t.id).sort());
          const drawn = sketchObstacles(geometry);
          for (const [i, l] of labels.entries()) {
            expect(inside(l.box, width, height), `${l.id} at ${width}`).toBe(true);
            for (const m of labels.slice(i + 1))
              expect(overlaps(l.box, m.box), `${l.id} / ${m.id} at ${width}`).toBe(false);
            // a label beside its part keeps off the drawing; one in the band sits under it
            if (l.key) expect(l.box[1]).toBeGreaterThanOrEqual(geometry.height);
            else
              expect(
                drawn.some((o) => overlaps(o, l.box)),
                `${l.id} on the drawing at ${width}`,
              ).toBe(false);
          }
        }
      });

  it('keeps a desktop’s sketch short and every label beside its part', () => {
    const r = planSite(brook).results;
    const { labels, height } = layoutSketch(sketchTexts(r, 'US'), 800, sketchOptions(r)!);
    expect(labels.every((l) => !l.key)).toBe(true);
    expect(height).toBeLessThanOrEqual(340);
  });
});

describe('a label’s phrases on as few lines as fit', () => {
  it('joins phrases with commas while they fit, wraps one too long', () => {
    // 12 px text is reckoned at 7.44 px a character (lib/charts/layout): 100 px holds 13
    expect(joinPhrases(['½" PVC pipe', 'sch 40', '30 ft long'], 400, 12)).toEqual(['½" PVC pipe, sch 40, 30 ft long']);
    expect(joinPhrases(['½" PVC pipe', 'sch 40', '30 ft long'], 100, 12)).toEqual([
      '½" PVC pipe,',
      'sch 40,',
      '30 ft long',
    ]);
    expect(joinPhrases(['22.9 ft above the lower pumps'], 100, 12)).toEqual(['22.9 ft above', 'the lower', 'pumps']);
  });
});
