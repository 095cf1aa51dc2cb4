import { describe, expect, it } from 'vitest';
import { ENGINE_VERSION } from '@/lib/hydraulics';
import { CALCULATOR_IDS, CALCULATORS as calculators, getCalculator, runCalculator } from '@/lib/calculators';
import { FALL, LIFT, deliveryLine, drivePipe, gpm } from './fixtures';

const samples: Record<(typeof CALCULATOR_IDS)[number], unknown> = {
  'yield-estimate': { driveFlowM3s: gpm(2), fallM: FALL, liftM: LIFT },
  'array-planner': { fallM: FALL, liftM: LIFT, pumps: [{ drivePipe: drivePipe('1/2') }], deliveryLine: deliveryLine() },
  'drive-pipe-check': { fallM: FALL, drivePipe: drivePipe('1') },
  'delivery-line': { flowM3s: 1e-5, liftM: LIFT, line: deliveryLine() },
  'source-flow': { method: 'bucket', trials: [{ volumeM3: 0.02, timeS: 12 }] },
  'demand-and-storage': { deliveredFlowM3s: 1e-5, people: 1 },
  'stall-check': { site: { fallM: FALL, liftM: LIFT, drivePipe: drivePipe('1/2') }, symptoms: ['never-starts'] },
};

describe('calculator registry', () => {
  it('has every calculator with id, name, schema and run', () => {
    expect(Object.keys(calculators).sort()).toEqual([...CALCULATOR_IDS].sort());
    for (const id of CALCULATOR_IDS) {
      const c = getCalculator(id)!;
      expect(c.id).toBe(id);
      expect(c.name.length).toBeGreaterThan(0);
      expect(c.schema.safeParse(samples[id]).success).toBe(true);
      const out = runCalculator(id, samples[id]);
      expect(out.engineVersion).toBe(ENGINE_VERSION);
      expect(Array.isArray(out.steps)).toBe(true);
      expect(out.steps.length).toBeGreaterThan(0);
      expect(Array.isArray(out.warnings)).toBe(true);
    }
    expect(getCalculator('nope')).toBeUndefined();
  });
  it('warnings carry a guide slug from the list', () => {
    const out = runCalculator('demand-and-storage', samples['demand-and-storage']);
    for (const w of out.warnings) expect(w.guide).toMatch(/^[a-z-]+$/);
  });
});
