import { describe, expect, it } from 'vitest';
import { toSI, unitCacheSizes, UNIT_CACHE_LIMIT } from '@/lib/hydraulics/units';

/**
 * Unit strings come from readers, so the engine's unit caches must not grow with
 * every new spelling (issue 17, item 18). Each unit below is a length times ratios
 * that cancel ("ft*min*kg/h*lb"), so every one is valid and distinct.
 */
describe('unit caches stay bounded', () => {
  it('holds at most UNIT_CACHE_LIMIT units of each kind after thousands of distinct valid units', () => {
    const lengths = ['m', 'ft', 'in', 'yd', 'mi', 'km', 'cm', 'mm'];
    const times = ['s', 'min', 'h', 'd', 'wk', 'ms'];
    const masses = ['kg', 'g', 'lb', 'oz', 'mg'];
    let distinct = 0;
    for (const l of lengths)
      for (const t1 of times)
        for (const t2 of times)
          for (const m1 of masses)
            for (const m2 of masses) {
              if (distinct >= UNIT_CACHE_LIMIT + 500) break;
              const unit = `${l}*${t1}*${m1}/${t2}*${m2}`;
              // only the caching is under test: a few of these are refused as too close to zero
              // (mm*ms*mg/wk*kg), after the unit was read and its factor worked out
              try {
                toSI(1, unit, 'length');
              } catch (err) {
                expect(String(err)).toMatch(/too close to zero/);
              }
              distinct++;
            }
    expect(distinct).toBe(UNIT_CACHE_LIMIT + 500);
    const sizes = unitCacheSizes();
    expect(sizes.factor).toBeLessThanOrEqual(UNIT_CACHE_LIMIT);
    expect(sizes.canonical).toBeLessThanOrEqual(UNIT_CACHE_LIMIT);
    expect(sizes.kind).toBeLessThanOrEqual(UNIT_CACHE_LIMIT);
    // past the bound the answers are still right: 1 ft*min/h = 0.3048 m / 60 (NIST SP 811, exact foot)
    expect(toSI(1, 'ft*min*kg/h*kg', 'length')).toBeCloseTo(0.3048 / 60, 12);
  });
});
