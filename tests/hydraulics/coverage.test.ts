/**
 * Every warning code and every stall-check cause is produced by at least one
 * crafted input, so none is dead. The inputs are built to trip one condition
 * each; the numbers in the comments are arithmetic on the inputs.
 */
import { describe, expect, it } from 'vitest';
import {
  STALL_CAUSE_CODES,
  WARNING_CODES,
  checkDeliveryLine,
  checkDrivePipe,
  estimateYield,
  measureSourceFlow,
  planArray,
  planDemandAndStorage,
  planSite,
  resolvePipe,
  runStallCheck,
  toSI,
  type StallCauseCode,
  type StallCheckInput,
} from '@/lib/hydraulics';
import { FALL, LIFT, deliveryLine, drivePipe, ft, gpm, mlPerMin } from './fixtures';

const half = () => ({ driveFlowM3s: gpm(2), drivePipe: drivePipe('1/2') });
const pipe1 = drivePipe('1');

const produced = new Set<string>();
const collect = (r: { warnings: { code: string }[] }) => r.warnings.forEach((w) => produced.add(w.code));

describe('warning codes', () => {
  it('are each reached by a crafted input', () => {
    // yield estimate
    collect(estimateYield({ driveFlowM3s: 1e-4, fallM: 0.3, liftM: 3 })); // fall-below-minimum (0.3 m < 0.5 m)
    collect(estimateYield({ driveFlowM3s: 1e-4, fallM: 2, liftM: 3 })); // lift-ratio-low (1.5 < 2)
    collect(estimateYield({ driveFlowM3s: 1e-4, fallM: 1, liftM: 50 })); // lift-ratio-beyond-range (50 > 26, Building Trades Pocketbook)
    collect(estimateYield({ driveFlowM3s: 1e-4, fallM: 1, liftM: 7, efficiency: 0.95 })); // efficiency-above-typical
    collect(estimateYield({ driveFlowM3s: gpm(2), fallM: FALL, liftM: LIFT, measuredDeliveredFlowM3s: mlPerMin(100) })); // efficiency-below-typical (η 0.096 < homemade low 0.138, efficiency.ts)
    // array planner
    collect(
      planArray({
        fallM: FALL,
        liftM: LIFT,
        pumps: [half(), half()],
        deliveryLine: deliveryLine(),
        sourceSpareFlowM3s: gpm(3),
      }),
    ); // drive-exceeds-source, diversion-rules
    collect(
      planArray({
        fallM: FALL,
        liftM: LIFT,
        pumps: [half(), half()],
        deliveryLine: deliveryLine(),
        sourceSpareFlowM3s: gpm(4.2),
      }),
    ); // drive-near-source-limit (95 %)
    collect(
      planArray({
        fallM: FALL,
        liftM: LIFT,
        pumps: [
          half(),
          { driveFlowM3s: gpm(2), drivePipe: drivePipe('1/2', 'pvc-sch40', [{ kind: 'elbow-90-threaded' }]) },
        ],
        deliveryLine: deliveryLine(),
      }),
    ); // fitting-in-drive-pipe
    collect(
      planArray({
        fallM: FALL,
        liftM: LIFT,
        pumps: [half(), { driveFlowM3s: gpm(2), drivePipe: { ...drivePipe('1/2'), fittings: [{ k: 500 }] } }],
        deliveryLine: deliveryLine(),
      }),
    ); // fittings-stop-pump
    collect(
      planArray({
        fallM: FALL,
        liftM: LIFT,
        pumps: Array.from({ length: 10 }, half),
        deliveryLine: { lengthM: 500, insideDiameterM: 0.006, material: 'hose' },
      }),
    ); // delivery-friction-high
    collect(
      planArray({
        fallM: FALL,
        liftM: LIFT,
        pumps: [{ drivePipe: drivePipe('1-1/4') }],
        deliveryLine: deliveryLine('3/4'),
        staged: { upperFallM: FALL, upperLiftM: LIFT, upperPump: half() },
      }),
    ); // upper-pump-part-time
    collect(
      planArray({
        fallM: 1,
        liftM: 45,
        pumps: [half()],
        deliveryLine: deliveryLine(),
        staged: { upperFallM: FALL, upperLiftM: LIFT, upperPump: half() },
      }),
    ); // lower-stage-limit (r = 45 > 40: no delivery)
    // drive pipe check
    collect(checkDrivePipe({ fallM: FALL, drivePipe: { ...pipe1, lengthM: 2 * FALL } })); // drive-length-short-for-fall (2 H)
    collect(checkDrivePipe({ fallM: FALL, drivePipe: { ...pipe1, lengthM: 15 * FALL } })); // drive-length-long-for-fall (15 H)
    collect(checkDrivePipe({ fallM: 1, drivePipe: { ...pipe1, lengthM: 3 } })); // drive-ld-low (3 m / 26.6 mm = 113)
    collect(checkDrivePipe({ fallM: 2, drivePipe: { ...drivePipe('1/2'), lengthM: 20 } })); // drive-ld-high (1266)
    collect(
      checkDrivePipe({
        fallM: 20,
        drivePipe: { ...pipe1, lengthM: 100, pressureRatingPa: toSI(100, 'psi', 'pressure') },
      }),
    ); // surge-exceeds-rating
    collect(checkDrivePipe({ fallM: FALL, drivePipe: { ...pipe1, pressureRatingPa: toSI(150, 'psi', 'pressure') } })); // surge-margin-low (peak ≈ 126 psi)
    collect(checkDrivePipe({ fallM: FALL, drivePipe: drivePipe('1', 'hdpe-dr11') })); // flexible-drive-pipe
    collect(checkDrivePipe({ fallM: FALL, drivePipe: pipe1, valveClosureTimeS: 0.5 })); // valve-closure-slow (0.5 s > 2L/c ≈ 0.022 s)
    collect(checkDrivePipe({ fallM: FALL, drivePipe: { ...pipe1, pressureRatingPa: toSI(100, 'psi', 'pressure') } })); // shut-off-exceeds-rating (≈ 126 psi > 100)
    collect(checkDrivePipe({ fallM: FALL, drivePipe: pipe1, series: 'pvc-sch40', joints: 'threaded' })); // threaded-joint-refused, fatigue-life-short (≈ 5 years)
    // delivery line
    const p34 = resolvePipe('pvc-sch40', '3/4');
    collect(
      checkDeliveryLine({
        flowM3s: 0.01,
        liftM: 10,
        targetLossM: 0.01,
        line: { lengthM: 5000, insideDiameterM: p34.insideDiameterM, material: 'pvc' },
      }),
    ); // delivery-loss-high, no-standard-pipe-meets-target, delivery-velocity-high
    collect(
      checkDeliveryLine({
        flowM3s: toSI((3000 * 1.306e-6 * Math.PI * 0.02) / 4, 'm^3/s', 'flow'),
        liftM: 10,
        line: { lengthM: 10, insideDiameterM: 0.02, material: 'pvc' },
      }),
    ); // transitional-flow (Re = 3000)
    collect(
      checkDeliveryLine({
        flowM3s: mlPerMin(500),
        liftM: 10,
        line: { lengthM: 30, insideDiameterM: 0.0158, material: 'pvc' },
      }),
    ); // hazen-williams-outside-range
    collect(
      checkDeliveryLine({
        flowM3s: mlPerMin(500),
        liftM: 300,
        line: {
          lengthM: 400,
          insideDiameterM: 0.0158,
          material: 'pvc',
          pressureRatingPa: toSI(100, 'psi', 'pressure'),
        },
      }),
    ); // delivery-pressure-above-rating
    collect(
      checkDeliveryLine({
        flowM3s: mlPerMin(500),
        liftM: 10,
        frostRisk: true,
        line: { lengthM: 30, insideDiameterM: 0.0158, material: 'pvc' },
      }),
    ); // frost-risk
    // source flow
    collect(measureSourceFlow({ method: 'bucket', trials: [{ volumeM3: 0.01, timeS: 10 }], plannedDrawM3s: 0.002 })); // plan-exceeds-source, few-trials
    collect(
      measureSourceFlow({
        method: 'bucket',
        trials: [
          { volumeM3: 0.01, timeS: 10 },
          { volumeM3: 0.01, timeS: 14 },
          { volumeM3: 0.01, timeS: 7 },
        ],
        plannedDrawM3s: 6e-4,
      }),
    ); // bucket-spread-high, plan-takes-large-share
    collect(measureSourceFlow({ method: 'v-notch', notchHeadM: 0.5 })); // weir-head-out-of-range (0.5 m > 0.381 m)
    collect(measureSourceFlow({ method: 'v-notch', notchHeadM: 0.2, crestHeightM: 0.3, approachWidthM: 0.6 })); // weir-not-fully-contracted
    // demand and storage
    collect(planDemandAndStorage({ deliveredFlowM3s: mlPerMin(100), people: 1, reserveDays: 2 })); // demand-exceeds-delivery, tank-never-refills, drinking-water-untreated
    collect(planDemandAndStorage({ deliveredFlowM3s: mlPerMin(1000), livestock: [{ kind: 'goat', count: 3 }] })); // overflow-needed
    // stall check
    collect(
      runStallCheck({
        site: { fallM: FALL, liftM: LIFT, drivePipe: drivePipe('1/2'), wasteOutletSubmerged: true },
        symptoms: ['hammering'],
      }),
    ); // high-water-safety, air-chamber-safety

    // site plan: a freezing site whose intake is 40 m from the pump (more than 10 × the 1.22 m fall)
    collect(
      planSite({
        fallM: FALL,
        liftM: LIFT,
        spareFlowM3s: gpm(10),
        sourceToPumpRunM: 40,
        pumpToTankRunM: 60,
        demand: { people: 1 },
        freezes: true,
      }),
    ); // plan-pressure, plan-water-in-motion, plan-freezes, plan-standpipe-needed

    const missing = WARNING_CODES.filter((c) => !produced.has(c));
    expect(missing).toEqual([]);
  });
});

describe('stall-check causes', () => {
  const base = { fallM: FALL, liftM: LIFT, drivePipe: drivePipe('1/2') };
  const top = (input: StallCheckInput) => runStallCheck(input).results.causes[0];
  const scenarios: Record<StallCauseCode, StallCheckInput> = {
    'drive-pipe-outside-range': {
      site: { ...base, drivePipe: { ...drivePipe('1/2'), lengthM: ft(2) } },
      symptoms: ['never-starts'],
    }, // L/H = 0.5
    'drive-flow-above-source': {
      site: { ...base, driveFlowM3s: gpm(2), pumpCount: 2, sourceSpareFlowM3s: gpm(3) },
      symptoms: ['stops-after-some-beats'],
    },
    'lift-too-high': { site: { ...base, fallM: 1, liftM: 45 }, symptoms: ['weak-delivery'] }, // h/H = 45 > 26 (Building Trades Pocketbook)
    'flexible-drive-pipe': { site: { ...base, drivePipe: drivePipe('1/2', 'hdpe-dr11') }, symptoms: ['weak-delivery'] },
    'waste-valve-setting': { site: { ...base, beatsPerMinute: 200 }, symptoms: ['never-starts'] }, // 200 > 120
    'delivery-valve-or-snifter': {
      site: { ...base, driveFlowM3s: gpm(2), deliveredFlowM3s: mlPerMin(100) },
      symptoms: ['weak-delivery'],
    }, // η 0.096 < homemade low 0.138
    'air-in-drive-pipe': { site: { ...base, intakeSubmergenceM: 0.01 }, symptoms: ['spits-air'] },
    'flooded-waste-outlet': { site: { ...base, wasteOutletSubmerged: true }, symptoms: ['never-starts'] },
    debris: { site: { ...base, screenAtIntake: false }, symptoms: ['weak-delivery'] },
    'waterlogged-air-chamber': { site: base, symptoms: ['hammering'] },
    'frozen-line': { site: { ...base, frostRisk: true }, symptoms: ['delivery-stops-in-frost'] },
    'fall-too-small': {
      site: { ...base, fallM: 0.3, liftM: 3, drivePipe: { ...drivePipe('1/2'), lengthM: 2.5 } },
      symptoms: ['never-starts'],
    }, // 0.3 m < 0.5 m
    'fittings-in-drive-pipe': {
      site: { ...base, drivePipe: { ...drivePipe('1/2'), fittings: [{ kind: 'globe-valve-open' }] } },
      symptoms: ['weak-delivery'],
    },
    'delivery-line-friction': {
      site: { ...base, deliveryLine: { lengthM: 300, insideDiameterM: 0.006, material: 'hose' } },
      symptoms: ['weak-delivery'],
    },
    'start-procedure': {
      site: {
        ...base,
        beatsPerMinute: 70,
        wasteOutletSubmerged: false,
        screenAtIntake: true,
        intakeSubmergenceM: 0.5,
        frostRisk: false,
      },
      symptoms: ['never-starts'],
    },
  };
  for (const code of STALL_CAUSE_CODES) {
    it(`${code} ranks first in its scenario`, () => {
      const c = top(scenarios[code]);
      expect(c.code).toBe(code);
      expect(c.reason.length).toBeGreaterThan(10);
    });
  }
});
