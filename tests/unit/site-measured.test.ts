import { describe, expect, it } from 'vitest';
import {
  measureAgainstPlan,
  planLayout,
  sharePercent,
  spanWords,
  trendOf,
  trendSentence,
  versionOn,
  type PlanVersionRef,
  type SiteTest,
} from '@/lib/sites/measured';
import { planSite, toSI } from '@/lib/hydraulics';
import { entryPrefill } from '@/lib/sites/prefill';

/**
 * Issue 22: a site's field log tests measured against its plan over time, checked by
 * hand. The plan is written out as a saved plan holds it: one homemade 1" pump, a 1"
 * schedule 40 PVC drive pipe and 60 m of ½" DR 11 HDPE to the tank (invented demo site).
 */
const FT = 0.3048; // m per ft, exact by definition (NIST SP 811, 2008)
const GAL = 3.785411784e-3; // m³ per US gallon, exact by definition (NIST SP 811, 2008)
const fall = 4 * FT;
const lift = 29 * FT;

const plan = {
  survey: { fallM: fall, liftM: lift, pumpType: 'homemade' },
  pump: { arrangement: 'single', pumps: { size: '1', count: 1, totalDriveFlowM3s: (3 * GAL) / 60 } },
  stages: [
    {
      drivePipe: { nominal: '1', series: 'pvc-sch40', lengthM: 9.225 },
      deliveryLine: { nominal: '1/2', series: 'hdpe-dr11', lengthM: 60 },
    },
  ],
  deliveredM3PerDay: 0.5,
} as unknown as Record<string, unknown>;

const version = (v: number, createdAt: string, p = plan): PlanVersionRef => ({ version: v, createdAt, plan: p });

const test = (id: number, testedOn: string, driveGalMin: number, litresPerMinute: number): SiteTest => ({
  id,
  testedOn,
  fallM: fall,
  liftM: lift,
  driveFlowM3s: (driveGalMin * GAL) / 60,
  waterTempC: 10,
  pumpSize: '1',
  pumpCount: 1,
  driveSize: '1',
  deliverySize: '1/2',
  trials: [
    { volumeL: litresPerMinute * 0.98, seconds: 60 },
    { volumeL: litresPerMinute * 1.02, seconds: 60 },
  ],
});

/**
 * Hand calculation of the plan's delivery at 2 US gal/min, 4 ft fall, 29 ft lift:
 * D'Aubuisson q = η·Q·H/h (Krol 1951, "The automatic hydraulic ram", Proc. IMechE — from memory),
 * η = homemade typical at h/H = 7.25: Pocketbook table 0.61 at 6, 0.52 at 8 → 0.61 − 0.09 × 1.25/2
 * = 0.55375 (International Textbook Company, Building Trades Pocketbook, 1899–1905, "The Hydraulic
 * Ram"), × 0.33/0.66 for a home-built ram (Water for the World, Technical Note RWS.4.D.5, USAID)
 * = 0.276875. The ½" line's friction at a fraction of a litre a minute is a few hundredths of a
 * metre of 8.8 m (laminar, f = 64/Re — common practice, no source), under 1 %.
 */
const eta = (0.61 - (0.09 * 1.25) / 2) * 0.5;
const handQ = (driveGalMin: number) => (eta * ((driveGalMin * GAL) / 60) * fall) / lift;

describe('a site’s tests against its plan (lib/sites/measured.ts)', () => {
  it('reads the plan’s pumps and pipes back from the saved plan', () => {
    const l = planLayout(plan)!;
    expect(l).toMatchObject({
      pumpSize: '1',
      pumpCount: 1,
      driveSize: '1',
      deliverySize: '1/2',
      arrangement: 'single',
    });
    expect(l.drivePipe.material).toBe('pvc');
    expect(l.deliveryLine.material).toBe('hdpe');
    // a staged plan, or one with no pump, gives no layout to predict with
    expect(planLayout({ ...plan, pump: { arrangement: 'staged', pumps: {} } })).toBeNull();
    expect(planLayout({ ...plan, pump: { arrangement: 'none', pumps: null } })).toBeNull();
  });

  it('predicts each test at its own drive flow, as a hand calculation does', () => {
    const rows = measureAgainstPlan([test(1, '2026-03-01', 2, 0.265)], [version(1, '2026-02-20T10:00:00Z')]);
    const r = rows[0]!;
    // q = 0.276875 × 1.26179e-4 m³/s × 1.2192 / 8.8392 = 4.819e-6 m³/s = 289.1 mL/min (hand calculation above)
    expect(handQ(2) * 6e7).toBeCloseTo(289.1, 1);
    expect(Math.abs(r.predictedM3s! / handQ(2) - 1)).toBeLessThan(0.01);
    // measured: the mean of 0.2597 and 0.2703 L in a minute = 0.265 L/min (arithmetic)
    expect(r.measured.mean * 6e4).toBeCloseTo(0.265, 6);
    // 265 ÷ 289.1 = 0.917 (arithmetic on the two above)
    expect(r.ratio!).toBeCloseTo(0.265e-3 / 60 / handQ(2), 2);
    expect(r.differs).toEqual([]);
  });

  it('a lower drive flow lowers the prediction in proportion, so a dry month is not held against the pump', () => {
    const rows = measureAgainstPlan(
      [test(1, '2026-03-01', 2, 0.265), test(2, '2026-05-01', 1.5, 0.2)],
      [version(1, '2026-02-20T10:00:00Z')],
    );
    // q ∝ Q at the same heads (D'Aubuisson, as above): 1.5/2 of 289.1 = 216.8 mL/min
    expect(rows[1]!.predictedM3s! / rows[0]!.predictedM3s!).toBeCloseTo(0.75, 2);
  });

  it('measures each test against the plan in force that day', () => {
    const bigger = { ...plan, pump: { arrangement: 'parallel', pumps: { size: '1', count: 2 } } };
    const versions = [version(1, '2026-02-20T10:00:00Z'), version(2, '2026-04-15T09:00:00Z', bigger)];
    expect(versionOn(versions, '2026-02-01')!.version).toBe(1); // a test before any plan: the first
    expect(versionOn(versions, '2026-04-15')!.version).toBe(2); // saved that morning: in force that day
    const rows = measureAgainstPlan([test(2, '2026-05-01', 2, 0.4), test(1, '2026-03-01', 2, 0.265)], versions);
    expect(rows.map((r) => [r.id, r.planVersion])).toEqual([
      [1, 1],
      [2, 2],
    ]);
    // recorded with one pump where the plan in force has two
    expect(rows[1]!.differs).toEqual(['pumpCount']);
  });

  it('fits the trend by least squares over the days and words it as a builder would', () => {
    // three tests 61 days apart at ratios 0.917, 0.784, 0.657 (invented): for equally spaced points the
    // least-squares slope is (y₃ − y₁)/(x₃ − x₁), the line passes through the mean (common practice, no source):
    // mean 0.786, ends 0.786 ∓ 0.130 = 0.916 and 0.656, a fall of 28 %
    const at = (d: string, ratio: number) => ({
      id: 0,
      testedOn: d,
      hidden: false,
      planVersion: 1,
      measured: { mean: 0, min: 0, max: 0 },
      predictedM3s: 1,
      ratio,
      differs: [],
    });
    const t = trendOf([at('2026-03-01', 0.917), at('2026-05-01', 0.784), at('2026-07-01', 0.657)]);
    expect(t.kind).toBe('falling');
    expect(t.from).toBeCloseTo(0.916, 3);
    expect(t.to).toBeCloseTo(0.656, 3);
    expect(t.days).toBe(122);
    expect(trendSentence(t)).toMatch(/fallen from about 90 % to 65 % of the plan over 4 months/);
    expect(trendSentence(t)).toMatch(/valve|screen/);
    // within 15 % either way is steady (common practice, no source)
    const steady = trendOf([at('2026-03-01', 0.9), at('2026-05-01', 0.85)]);
    expect(steady.kind).toBe('steady');
    expect(trendSentence(steady)).toMatch(/^Steady at about 90 % of the plan/);
    expect(trendOf([at('2026-03-01', 0.6), at('2026-05-01', 0.9)]).kind).toBe('rising');
    expect(trendOf([at('2026-03-01', 0.9)]).kind).toBe('one');
    expect(trendOf([]).kind).toBe('none');
  });

  it('rounds as a person would: shares to 5 %, spans in days, weeks or months', () => {
    expect([sharePercent(0.917), sharePercent(0.656), sharePercent(1.024)]).toEqual([90, 65, 100]);
    expect([spanWords(10), spanWords(30), spanWords(122)]).toEqual(['10 days', '4 weeks', '4 months']);
  });

  it('a plan made by the engine predicts, at its own design flow and heads, the delivery it promised', () => {
    // the smallholding's brook of the engine's worked example: one pump, not staged
    const made = planSite({
      fallM: fall,
      spareFlowM3s: toSI(10, 'gal/min', 'flow'),
      liftM: lift,
      sourceToPumpRunM: 9,
      pumpToTankRunM: 60,
      demand: { people: 1, perPersonM3PerDay: 0.1 },
    }).results as unknown as Record<string, unknown>;
    const l = planLayout(made)!;
    const [row] = measureAgainstPlan(
      [
        {
          ...test(1, '2026-03-01', 1, 0.1),
          driveFlowM3s: l.driveFlowM3s,
          waterTempC: null,
          pumpSize: l.pumpSize,
          driveSize: l.driveSize,
          deliverySize: l.deliverySize,
        },
      ],
      [version(1, '2026-02-01T00:00:00Z', made)],
    );
    // the plan's own figure, not a hand one: the comparison must agree with what the plan said
    expect((row!.predictedM3s! * 86400) / l.deliveredM3PerDay).toBeCloseTo(1, 6);
  });

  it('fills a new test from the plan in the reader’s units, so the member adds only the measurements', () => {
    const us = entryPrefill('Cabin creek', planLayout(plan), 'US');
    expect(us).toMatchObject({
      siteName: 'Cabin creek',
      pumpSize: '1',
      pumpCount: '1',
      arrangement: 'single',
      driveSize: '1',
      driveMaterial: 'pvc',
      deliverySize: '1/2',
      deliveryMaterial: 'hdpe',
      // the survey's 4 ft and 29 ft back as written (0.3048 m/ft exact, NIST SP 811, 2008)
      fall: '4 ft',
      lift: '29 ft',
    });
    expect(us.deliveryLength).toMatch(/ ft$/);
    // 1.2192 m as a tape gives it: 1.22 m (common practice, no source)
    expect(entryPrefill('Cabin creek', planLayout(plan), 'metric').fall).toBe('1.22 m');
    expect(entryPrefill('Cabin creek', null, 'metric')).toEqual({ siteName: 'Cabin creek' });
  });
});
