/** Invalid input gets a typed error naming the field and the accepted range. */
import { describe, expect, it } from 'vitest';
import {
  EngineInputError,
  checkDeliveryLine,
  checkDrivePipe,
  estimateYield,
  measureSourceFlow,
  planArray,
  planDemandAndStorage,
  runStallCheck,
} from '@/lib/hydraulics';
import { FALL, LIFT, deliveryLine, drivePipe } from './fixtures';

function errorOf(fn: () => unknown): EngineInputError {
  try {
    fn();
  } catch (e) {
    expect(e).toBeInstanceOf(EngineInputError);
    return e as EngineInputError;
  }
  throw new Error('expected an EngineInputError');
}

const good = { driveFlowM3s: 1e-4, fallM: 1.2, liftM: 8.8 };

describe('typed errors', () => {
  it.each([
    ['NaN', { ...good, fallM: Number.NaN }, 'fallM'],
    ['negative', { ...good, driveFlowM3s: -1e-4 }, 'driveFlowM3s'],
    ['zero fall', { ...good, fallM: 0 }, 'fallM'],
    ['absurd magnitude', { ...good, liftM: 1e9 }, 'liftM'],
    ['Infinity', { ...good, driveFlowM3s: Number.POSITIVE_INFINITY }, 'driveFlowM3s'],
    ['lift at the fall', { ...good, liftM: 1.2 }, 'liftM'],
    ['lift below the fall', { ...good, liftM: 0.5 }, 'liftM'],
    ['missing field', { fallM: 1, liftM: 5 }, 'driveFlowM3s'],
    ['efficiency above 1', { ...good, efficiency: 1.2 }, 'efficiency'],
  ])('%s', (_name, input, field) => {
    const e = errorOf(() => estimateYield(input as never));
    expect(e.field).toBe(field);
    expect(e.message).toContain(field);
  });

  it('names the accepted range', () => {
    const e = errorOf(() => estimateYield({ ...good, fallM: 0 }));
    expect(e.range).toEqual({ min: 0, minExclusive: true, max: 100, maxExclusive: undefined, unit: 'm' });
    expect(e.message).toMatch(/greater than 0 and at most 100 m/);
  });

  it('lists every failing field', () => {
    const e = errorOf(() => estimateYield({ driveFlowM3s: Number.NaN, fallM: -1, liftM: 1e9 }));
    expect(e.issues.map((i) => i.field).sort()).toEqual(['driveFlowM3s', 'fallM', 'liftM']);
    for (const i of e.issues) expect(i.range).toBeDefined();
  });

  it('nested fields carry their path', () => {
    const e = errorOf(() =>
      planArray({
        fallM: FALL,
        liftM: LIFT,
        pumps: [{ drivePipe: { ...drivePipe('1/2'), lengthM: -3 } }],
        deliveryLine: deliveryLine(),
      }),
    );
    expect(e.field).toBe('pumps.0.drivePipe.lengthM');
    expect(e.range).toMatchObject({ min: 0, minExclusive: true, max: 500, unit: 'm' });
  });

  it('every calculator validates', () => {
    expect(() => planArray({ fallM: 0, liftM: LIFT, pumps: [], deliveryLine: deliveryLine() })).toThrow(
      EngineInputError,
    );
    expect(() => checkDrivePipe({ fallM: Number.NaN, drivePipe: drivePipe('1') })).toThrow(EngineInputError);
    expect(() => checkDeliveryLine({ flowM3s: 1e-5, liftM: -2, line: deliveryLine() })).toThrow(EngineInputError);
    expect(() => measureSourceFlow({ method: 'bucket', trials: [{ volumeM3: 0.01, timeS: 0 }] })).toThrow(
      /trials\.0\.timeS/,
    );
    expect(() => measureSourceFlow({ method: 'v-notch', notchHeadM: 0.1, angleDeg: 120 })).toThrow(/angleDeg/);
    expect(() => planDemandAndStorage({ deliveredFlowM3s: 1e-5, people: 2.5 })).toThrow(/people/);
    const e = errorOf(() => runStallCheck({ site: { fallM: 3, liftM: 2, drivePipe: drivePipe('1/2') } }));
    expect(e.field).toBe('site.liftM');
    expect(e.range).toMatchObject({ min: 3, minExclusive: true });
    expect(() =>
      planArray({
        fallM: FALL,
        liftM: LIFT,
        pumps: [{ drivePipe: drivePipe('1/2') }],
        deliveryLine: deliveryLine(),
        staged: { upperFallM: 3, upperLiftM: 2, upperPump: { drivePipe: drivePipe('1/2') } },
      }),
    ).toThrow(/staged\.upperLiftM/);
  });
});
