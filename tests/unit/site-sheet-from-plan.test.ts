import { describe, expect, it } from 'vitest';
import { recompute } from '@/lib/calculators/recompute';
import { sitePlanner } from '@/lib/calculators/defs/sitePlan';
import { validateSiteSheet } from '@/lib/calculators/site-sheet';
import { calculatorPropsFromSite, planSiteSheet } from '@/lib/sites/sheet';

/**
 * Issue 22: a question asked from a saved site starts with a site sheet made of the site's
 * survey and its plan's design, typed in the asker's units. The plan is the planner's own,
 * stored as JSON as a saved site keeps it.
 */
function planOf(survey: Record<string, string>) {
  const r = recompute(sitePlanner, survey, 'US');
  if (!r.ok) throw new Error(r.message);
  return JSON.parse(JSON.stringify(r.output.results)) as Record<string, unknown> & {
    pump: { arrangement: string; pumps: { size: string; count: number }; upper?: { tankHeightM: number } };
    stages: {
      drivePipe: { nominal: string; series: string; lengthM: number };
      deliveryLine: { nominal: string; series: string; lengthM: number };
    }[];
  };
}
const num = (typed: string | undefined, unit: string) => {
  const m = new RegExp(`^([0-9.]+) ${unit.replace('/', '\\/')}$`).exec(typed ?? '');
  if (!m) throw new Error(`"${typed}" is not in ${unit}`);
  return Number(m[1]);
};

// an invented brook: 4 ft of fall, 10 US gal/min to spare, a house 29 ft up (common practice, no source)
const BROOK = {
  fall: '4 ft',
  lift: '29 ft',
  sourceRun: '30 ft',
  tankRun: '150 ft',
  spareFlow: '10 gal/min',
  people: '2',
};

describe('a site as a question’s site sheet', () => {
  const plan = planOf(BROOK);

  it('keeps the survey as typed for an asker in the same units, and the plan’s chosen pump and pipes', () => {
    expect(plan.pump.arrangement).toBe('single');
    const sheet = planSiteSheet(BROOK, plan, 'US');
    expect(sheet.fall).toBe('4 ft');
    expect(sheet.lift).toBe('29 ft');
    expect(sheet.sourceFlow).toBe('10 gal/min');
    const stage = plan.stages[0]!;
    expect(sheet.pumpSize).toBe(plan.pump.pumps.size);
    expect(sheet.pumps).toBe(String(plan.pump.pumps.count));
    expect(sheet.driveSize).toBe(stage.drivePipe.nominal);
    expect(sheet.driveMaterial).toBe(stage.drivePipe.series);
    expect(sheet.deliverySize).toBe(stage.deliveryLine.nominal);
    expect(sheet.deliveryMaterial).toBe(stage.deliveryLine.series);
    // the plan's lengths in feet, whole feet from 10 ft as a tape gives them: 1 ft = 0.3048 m (NIST SP 811 (2008))
    expect(num(sheet.driveLength, 'ft')).toBeCloseTo(stage.drivePipe.lengthM / 0.3048, -0.3);
    expect(num(sheet.deliveryLength, 'ft')).toBeCloseTo(stage.deliveryLine.lengthM / 0.3048, -0.3);
    // what only a running pump tells is the asker's to add
    for (const k of ['driveFlow', 'delivered', 'bpm', 'symptoms'] as const) expect(sheet[k]).toBeUndefined();
  });

  it('re-expresses a survey typed in feet for a metric asker, rounded as a tape gives it', () => {
    const sheet = planSiteSheet(BROOK, plan, 'metric');
    // 4 ft × 0.3048 = 1.2192 m, to the centimetre under 5 m (NIST SP 811 (2008); common practice, no source)
    expect(sheet.fall).toBe('1.22 m');
    // 29 ft × 0.3048 = 8.8392 m, to 0.1 m from 5 m (NIST SP 811 (2008); common practice, no source)
    expect(sheet.lift).toBe('8.8 m');
    // 10 US gal/min × 3.785411784 L = 37.854 L/min, three figures (NIST SP 811 (2008): 1 gal = 3.785411784 L)
    expect(sheet.sourceFlow).toBe('37.9 L/min');
    // the plan's drive pipe in metres, to 0.1 m from 5 m (common practice, no source)
    expect(num(sheet.driveLength, 'm')).toBeCloseTo(plan.stages[0]!.drivePipe.lengthM, 1);
    expect(sheet.pumpSize).toBe(plan.pump.pumps.size);
  });

  it('re-expresses a survey typed in metres for a US asker', () => {
    const metric = {
      fall: '1.5 m',
      lift: '12 m',
      sourceRun: '10 m',
      tankRun: '80 m',
      spareFlow: '60 L/min',
      people: '4',
    };
    const sheet = planSiteSheet(metric, planOf(metric), 'US');
    // 1.5 m / 0.3048 = 4.92 ft, to 0.1 ft under 10 ft (NIST SP 811 (2008); common practice, no source)
    expect(sheet.fall).toBe('4.9 ft');
    // 12 m / 0.3048 = 39.37 ft, whole feet from 10 ft (NIST SP 811 (2008); common practice, no source)
    expect(sheet.lift).toBe('39 ft');
    // 60 L/min / 3.785411784 = 15.85 US gal/min, three figures (NIST SP 811 (2008))
    expect(sheet.sourceFlow).toBe('15.9 gal/min');
    expect(planSiteSheet(metric, planOf(metric), 'metric').fall).toBe('1.5 m');
  });

  it('is a sheet the stall check accepts, as the question’s POST will check it', () => {
    for (const units of ['US', 'metric'] as const)
      expect(validateSiteSheet(planSiteSheet(BROOK, plan, units))).toEqual(planSiteSheet(BROOK, plan, units));
  });

  it('a staged plan describes the pumps on the source: their lift is the stage tank’s height', () => {
    // an invented hillside: 3 ft of fall under a 150 ft lift is beyond one ram (common practice, no source)
    const steep = {
      fall: '3 ft',
      lift: '150 ft',
      sourceRun: '30 ft',
      tankRun: '600 ft',
      spareFlow: '30 gal/min',
      people: '1',
    };
    const staged = planOf(steep);
    expect(staged.pump.arrangement).toBe('staged');
    const sheet = planSiteSheet(steep, staged, 'US');
    expect(sheet.fall).toBe('3 ft');
    // the stage tank's height in feet, whole feet from 10 ft: 1 ft = 0.3048 m (NIST SP 811 (2008))
    expect(num(sheet.lift, 'ft')).toBe(Math.round(staged.pump.upper!.tankHeightM / 0.3048));
    expect(sheet.driveSize).toBe(staged.stages[0]!.drivePipe.nominal);
    expect(validateSiteSheet(sheet)).not.toBeNull();
  });

  it('a plan with no pumps, or an older one missing parts, gives the survey alone', () => {
    expect(planSiteSheet(BROOK, { survey: plan.survey }, 'US')).toEqual({
      fall: '4 ft',
      lift: '29 ft',
      sourceFlow: '10 gal/min',
    });
    expect(planSiteSheet({ fall: '4' }, {}, 'US')).toEqual({});
  });

  it('opens the calculators with the site: the drive flow each pump is tuned to, the demand and the delivery', () => {
    const perPump = (plan.pump.pumps as unknown as { driveFlowEachM3s: number }).driveFlowEachM3s;
    const yieldProps = calculatorPropsFromSite('yield-estimate', BROOK, plan, 'US');
    expect(yieldProps.fall).toBe('4 ft');
    // m³/s to US gal/min: × 60 / 0.003785411784 (NIST SP 811 (2008)), two figures under 10
    expect(num(yieldProps.driveFlow, 'gal/min')).toBeCloseTo((perPump * 60) / 0.003785411784, 1);
    const demand = calculatorPropsFromSite('demand-and-storage', { ...BROOK, chickens: '12' }, plan, 'US');
    expect(demand).toMatchObject({ people: '2', chickens: '12' });
    // m³/day to US gal/day: / 0.003785411784 (NIST SP 811 (2008)), three figures
    const delivered = (plan as unknown as { deliveredM3PerDay: number }).deliveredM3PerDay;
    expect(num(demand.delivery, 'gal/day') / (delivered / 0.003785411784)).toBeCloseTo(1, 2);
    expect(calculatorPropsFromSite('source-flow', BROOK, plan, 'US')).toEqual({});
  });
});
