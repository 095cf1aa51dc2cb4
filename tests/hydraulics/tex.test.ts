/** Every worked step renders in KaTeX (the renderer the guides and calculators use). */
import { describe, expect, it } from 'vitest';
import katex from 'katex';
import {
  checkDeliveryLine,
  checkDrivePipe,
  estimateYield,
  measureSourceFlow,
  planArray,
  planDemandAndStorage,
  runStallCheck,
  siTex,
  texNum,
  type CalcOutput,
} from '@/lib/hydraulics';
import { stepValueTex, substitutedTex } from '@/lib/calculators/working';
import { FALL, LIFT, deliveryLine, drivePipe, gpm, mlPerMin } from './fixtures';

const outputs: [string, CalcOutput<unknown>][] = [
  ['yield', estimateYield({ driveFlowM3s: gpm(2), fallM: FALL, liftM: LIFT, measuredDeliveredFlowM3s: mlPerMin(500) })],
  [
    'array',
    planArray({
      fallM: FALL,
      liftM: LIFT,
      pumps: [
        { drivePipe: drivePipe('1-1/4') },
        { driveFlowM3s: gpm(2), drivePipe: drivePipe('1/2', 'pvc-sch40', [{ kind: 'elbow-90-threaded' }]) },
      ],
      deliveryLine: deliveryLine(),
      sourceSpareFlowM3s: gpm(30),
      staged: { upperFallM: FALL, upperLiftM: LIFT, upperPump: { driveFlowM3s: gpm(2), drivePipe: drivePipe('1/2') } },
    }),
  ],
  [
    'drive',
    checkDrivePipe({
      fallM: FALL,
      liftM: LIFT,
      drivePipe: drivePipe('1'),
      driveFlowM3s: gpm(10),
      valveClosureTimeS: 0.5,
    }),
  ],
  [
    'delivery',
    checkDeliveryLine({
      flowM3s: gpm(10),
      liftM: 20,
      line: { ...deliveryLine('1'), fittings: [{ kind: 'elbow-90-threaded' }] },
    }),
  ],
  [
    'bucket',
    measureSourceFlow({
      method: 'bucket',
      trials: [
        { volumeM3: 0.02, timeS: 12 },
        { volumeM3: 0.02, timeS: 13 },
      ],
      plannedDrawM3s: 5e-4,
    }),
  ],
  ['v-notch', measureSourceFlow({ method: 'v-notch', notchHeadM: 0.15 })],
  ['float', measureSourceFlow({ method: 'float', distanceM: 5, timesS: [9, 10, 11], widthM: 1, meanDepthM: 0.2 })],
  [
    'demand',
    planDemandAndStorage({
      deliveredFlowM3s: mlPerMin(2000),
      people: 1,
      gardenAreaM2: 20,
      livestock: [{ kind: 'sheep', count: 10 }],
      tankVolumeM3: 1,
    }),
  ],
  [
    'stall',
    runStallCheck({
      site: {
        fallM: FALL,
        liftM: LIFT,
        drivePipe: drivePipe('1/2'),
        driveFlowM3s: gpm(2),
        deliveredFlowM3s: mlPerMin(300),
        intakeSubmergenceM: 0.3,
      },
      symptoms: ['weak-delivery'],
    }),
  ],
];

describe('steps are KaTeX-ready', () => {
  for (const [name, out] of outputs) {
    it(name, () => {
      expect(out.steps.length).toBeGreaterThan(0);
      for (const s of out.steps) {
        expect(() => katex.renderToString(s.formula, { throwOnError: true, strict: 'error' })).not.toThrow();
        expect(() => katex.renderToString(siTex(s.substituted), { throwOnError: true, strict: 'error' })).not.toThrow();
        for (const units of ['US', 'metric'] as const) {
          const tex = substitutedTex(s, units);
          expect(() => katex.renderToString(tex, { throwOnError: true, strict: 'error' })).not.toThrow();
          // the reader's numbers never fall back to scientific notation (a rule's own constant may)
          for (const p of s.substituted)
            if (typeof p !== 'string') expect(stepValueTex(p, units)).not.toMatch(/\\times ?10\^|\de[-+]?\d/);
        }
      }
    });
  }
  it('numbers are shown to 4 significant figures', () => {
    // formatting convention of the engine (no source)
    expect(texNum(1.2192)).toBe('1.219');
    expect(texNum(0.000123456)).toBe('1.235\\times10^{-4}');
    expect(texNum(999.96)).toBe('1000');
    expect(texNum(2.5e9)).toBe('2.5\\times10^{9}');
  });
});
