import { describe, expect, it } from 'vitest';
import {
  getCalculator,
  recompute,
  verdictFor,
  VERDICT_LIMITS,
  type CalculatorId,
  type Verdict,
} from '@/lib/calculators';
import type { UnitSystem } from '@/lib/hydraulics';

/** The verdict for a calculator's defaults with these inputs (as a share link gives them). */
function judge(id: CalculatorId, form: Record<string, string>, units: UnitSystem = 'US'): Verdict {
  const def = getCalculator(id)!;
  const r = recompute(def, { ...def.defaults, ...form });
  if (!r.ok) throw new Error(`refused: ${r.message}`);
  return verdictFor(id, r.output, units);
}

describe('yield estimate verdict', () => {
  it('works at a lift 7.25 times the fall', () => {
    // 29 ft ÷ 4 ft = 7.25, under 20 (common practice, no source) and 26 (Building Trades Pocketbook table ends at 26)
    const v = judge('yield-estimate', { fall: '4 ft', lift: '29 ft' });
    expect(v.level).toBe('works');
    expect(v.beyondRange).toBe(false);
    expect(v.reason).toMatch(/7\.3 times the fall/);
    expect(v.reason).toMatch(/104 ft/); // 26 × 4 ft: Building Trades Pocketbook table ends at 26
  });
  it('is marginal at a lift 22 times the fall', () => {
    // 88 ft ÷ 4 ft = 22: past 20 (common practice, no source), short of 26 (Building Trades Pocketbook)
    expect(judge('yield-estimate', { fall: '4 ft', lift: '88 ft' }).level).toBe('marginal');
  });
  it('is marginal on a fall of 0.4 m', () => {
    // 0.4 m ≤ 0.5 m least fall: Water for the World RWS.4.D.5 (from memory, as PRACTICE says)
    const v = judge('yield-estimate', { fall: '0.4 m', lift: '3 m' }, 'metric');
    expect(v.level).toBe('marginal');
    expect(v.reason).toMatch(/0\.5 m/);
  });
  it('will not work, and cannot be vouched for, at a lift 150 times the fall', () => {
    // 600 ft ÷ 4 ft = 150 > 26: Building Trades Pocketbook table ends at 26
    const v = judge('yield-estimate', { fall: '4 ft', lift: '600 ft' });
    expect(v.level).toBe('wont-work');
    expect(v.beyondRange).toBe(true);
    expect(v.reason).toMatch(/cannot vouch/);
  });
  it('names its numbers in the reader’s units', () => {
    // 26 × 1.2192 m = 31.7 m: Building Trades Pocketbook table ends at 26; 1 ft = 0.3048 m (NIST SP 811)
    const v = judge('yield-estimate', { fall: '4 ft', lift: '29 ft' }, 'metric');
    expect(v.reason).toMatch(/31\.7 m/);
    expect(v.reason).not.toMatch(/ ft\b/);
  });
});

describe('delivery line verdict', () => {
  it('works with 0.5 L/min up 150 ft of ¾" HDPE', () => {
    // friction well under a tenth of the 29 ft lift (PRACTICE.deliveryLossShare, common practice, no source)
    expect(judge('delivery-line', {}).level).toBe('works');
  });
  it('is marginal with 10 L/min in ½" pipe', () => {
    // 10 L/min in ½" HDPE DR11 over 150 ft: Darcy-Weisbach loss of several feet, over a tenth of the lift
    // (PRACTICE.deliveryLossShare) and under the whole lift (common practice, no source)
    const v = judge('delivery-line', { flow: '10 L/min', size: '1/2' });
    expect(v.level).toBe('marginal');
    expect(v.reason).toMatch(/ft/);
  });
  it('will not work when friction is more than the lift', () => {
    // 30 L/min in ½" over 150 ft: loss beyond the 29 ft lift (common practice, no source)
    expect(judge('delivery-line', { flow: '30 L/min', size: '1/2' }).level).toBe('wont-work');
  });
  it('will not work when the pressure at the pump passes the pipe’s rating', () => {
    // 600 ft of water ≈ 260 psi (0.433 psi per ft, common practice, no source) > 200 psi HDPE DR11 PE4710 (PPI TR-4, from memory)
    expect(judge('delivery-line', { lift: '600 ft' }).level).toBe('wont-work');
  });
});

describe('drive pipe check verdict', () => {
  it('works with ½" schedule 80 PVC, 24 ft on a 4 ft fall', () => {
    // L/H = 6 within 5–10 (PRACTICE, common practice, no source); sch 80 rating well over the surge (ASTM D1785, from memory)
    expect(judge('drive-pipe-check', { material: 'pvc-sch80' }).level).toBe('works');
  });
  it('is marginal when the drive pipe is only 3 times the fall', () => {
    // 12 ft ÷ 4 ft = 3 < 5 (PRACTICE.driveLengthToFallMin, common practice, no source)
    const v = judge('drive-pipe-check', { length: '12 ft' });
    expect(v.level).toBe('marginal');
    expect(v.reason).toMatch(/3 times the fall/);
  });
  it('is marginal when the rating is less than 1.5 times the surge peak', () => {
    // steel schedule 40: stiff pipe, fast wave, peak above rating ÷ 1.5 (PRACTICE.ratingMargin, common practice, no source)
    expect(judge('drive-pipe-check', { material: 'steel-sch40' }).level).toBe('marginal');
  });
  it('will not work with a flexible HDPE drive pipe', () => {
    // HDPE is not rigid: E ≈ 0.8–1.1 GPa, Wylie & Streeter Table 2.1 (from memory)
    expect(judge('drive-pipe-check', { material: 'hdpe-dr11' }).level).toBe('wont-work');
  });
});

describe('array planner verdict', () => {
  it('works with two pumps at a 4 ft fall and 29 ft lift', () => {
    // 29 ft ÷ 4 ft = 7.25 < 26 (Building Trades Pocketbook)
    expect(judge('array-planner', {}).level).toBe('works');
  });
  it('is marginal when the pumps take more than half the spare flow', () => {
    // two pumps' drive flow ≈ 3.3 gal/min of 6 gal/min: over half (PRACTICE.sourceShareCaution, common practice, no source)
    expect(judge('array-planner', { sourceFlow: '6 gal/min' }).level).toBe('marginal');
  });
  it('will not work when the pumps need more than the source spares', () => {
    // ≈ 3.3 gal/min of drive flow > 3 gal/min spare (the engine's own drive-exceeds-source)
    expect(judge('array-planner', { sourceFlow: '3 gal/min' }).level).toBe('wont-work');
  });
  it('cannot vouch for a lift 150 times the fall', () => {
    // 600 ft ÷ 4 ft = 150 > 26: Building Trades Pocketbook table ends at 26
    const v = judge('array-planner', { lift: '600 ft' });
    expect(v.level).toBe('wont-work');
    expect(v.beyondRange).toBe(true);
  });
});

describe('array planner verdict, in stages', () => {
  it('cannot vouch for an upper pump lifting 150 times its fall', () => {
    // 600 ft ÷ 4 ft (the upper fall defaults to the fall) = 150 > 26: Building Trades Pocketbook table ends at 26
    const v = judge('array-planner', { mode: 'staged', upperLift: '600 ft' });
    expect(v.level).toBe('wont-work');
    expect(v.beyondRange).toBe(true);
  });
  it('is marginal when the lower pumps keep the upper one going part of the day', () => {
    // 65 ft ÷ 4 ft = 16 < 26 (Building Trades Pocketbook); two lower pumps fill the tank slower than the upper one drinks
    expect(judge('array-planner', { mode: 'staged' }).level).toBe('marginal');
  });
});

describe('stall check verdict', () => {
  it('works when nothing points to a cause', () => {
    // the default site: 4 ft fall, 29 ft lift, 24 ft drive pipe (L/H 6, PRACTICE 5–10, common practice, no source)
    expect(judge('stall-check', {}).level).toBe('works');
  });
  it('is marginal on some sign of a cause', () => {
    // "never starts" alone scores the waste valve setting in the some-sign band 0.3–0.6 (common practice, no source)
    const v = judge('stall-check', { symptoms: 'never-starts' });
    expect(v.level).toBe('marginal');
    expect(v.reason).toMatch(/waste valve/);
  });
  it('will not work as it stands on a strong sign', () => {
    // stops in frost, with frost at the site: the frozen-line cause scores ≥ 0.6 (common practice, no source)
    expect(judge('stall-check', { symptoms: 'delivery-stops-in-frost', frost: 'yes' }).level).toBe('wont-work');
  });
  it('cannot vouch for a lift 150 times the fall', () => {
    // 600 ft ÷ 4 ft = 150 > 26: Building Trades Pocketbook table ends at 26
    expect(judge('stall-check', { lift: '600 ft' }).beyondRange).toBe(true);
  });
});

describe('source flow verdict', () => {
  it('works with three steady bucket trials and no plan', () => {
    // 5 gal in 40–44 s ≈ 7.1 gal/min; half of it may be taken (PRACTICE.sourceShareCaution, common practice, no source)
    const v = judge('source-flow', {});
    expect(v.level).toBe('works');
    expect(v.reason).toMatch(/3\.58 US gal\/min/); // 7.15 ÷ 2 (PRACTICE.sourceShareCaution)
  });
  it('is marginal when the plan takes more than half', () => {
    // 4 of 7.15 gal/min = 56 % > 50 % (PRACTICE.sourceShareCaution, common practice, no source)
    expect(judge('source-flow', { draw: '4 gal/min' }).level).toBe('marginal');
  });
  it('will not work when the plan takes more than the source gives', () => {
    // 8 gal/min > 7.15 gal/min (arithmetic)
    expect(judge('source-flow', { draw: '8 gal/min' }).level).toBe('wont-work');
  });
  it('cannot vouch for a V-notch head of 20 mm', () => {
    // 20 mm < 61 mm least head: USBR Water Measurement Manual ch. 7 (from memory)
    const v = judge('source-flow', { method: 'v-notch', head: '20 mm' });
    expect(v.beyondRange).toBe(true);
    expect(v.reason).toMatch(/cannot vouch/);
  });
});

describe('demand and storage verdict', () => {
  it('opens asking for the demand rather than judging nothing', () => {
    const v = judge('demand-and-storage', {});
    expect(v.level).toBe('ask');
    expect(v.reason).toMatch(/211 US gal\/day/); // 800 L ÷ 3.785 L per US gal (NIST Handbook 44)
  });
  it('works when delivery covers demand with a fifth to spare', () => {
    // two people at 80 US gal (USGS, from memory) = 606 L/day; 800 L/day ≥ 1.2 × 606 (common practice, no source)
    expect(judge('demand-and-storage', { people: '2' }).level).toBe('works');
  });
  it('is marginal when delivery only just covers demand', () => {
    // 650 L/day is between 606 and 1.2 × 606 = 727 L/day (common practice, no source)
    expect(judge('demand-and-storage', { people: '2', delivery: '650 L/day' }).level).toBe('marginal');
  });
  it('will not work when demand is more than delivery', () => {
    // 500 L/day < 606 L/day (USGS 80 US gal per person, from memory)
    const v = judge('demand-and-storage', { people: '2', delivery: '500 L/day' }, 'metric');
    expect(v.level).toBe('wont-work');
    expect(v.reason).toMatch(/106 L\/day/); // 606 − 500 (arithmetic)
  });
});

describe('verdict limits', () => {
  it('take the engine’s own lift ratio ceiling and name a source for every line', () => {
    expect(VERDICT_LIMITS.maxLiftRatio.value).toBe(26); // Building Trades Pocketbook table ends at 26
    for (const l of Object.values(VERDICT_LIMITS)) expect(l.source.length).toBeGreaterThan(0);
  });
});
