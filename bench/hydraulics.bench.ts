/**
 * Speed of the hydraulics engine: one bench per calculator. Targets: each
 * calculator under 50 µs per call, the stall check under 1 ms.
 */
import { bench, describe } from 'vitest';
import {
  checkDeliveryLine,
  checkDrivePipe,
  estimateYield,
  measureSourceFlow,
  planArray,
  planDemandAndStorage,
  resolvePipe,
  runStallCheck,
  toSI,
} from '@/lib/hydraulics';

const ft = (x: number) => toSI(x, 'ft', 'length');
const gpm = (x: number) => toSI(x, 'gal/min', 'flow');
const half = resolvePipe('pvc-sch40', '1/2');
const one = resolvePipe('pvc-sch40', '1');
const big = resolvePipe('pvc-sch40', '1-1/4');
const drive = (p: typeof half, fittings: { kind: 'elbow-90-threaded' }[] = []) => ({
  lengthM: ft(20),
  insideDiameterM: p.insideDiameterM,
  wallThicknessM: p.wallThicknessM,
  pressureRatingPa: p.pressureRatingPa,
  material: p.material,
  fittings,
});
const line = { lengthM: ft(100), insideDiameterM: half.insideDiameterM, material: 'pvc' as const };

describe('hydraulics engine', () => {
  bench('yield estimate', () => {
    estimateYield({ driveFlowM3s: gpm(2), fallM: ft(4), liftM: ft(29), measuredDeliveredFlowM3s: 8.3e-6 });
  });
  bench('array planner (2 pumps, one elbow)', () => {
    planArray({
      fallM: ft(4),
      liftM: ft(29),
      deliveryLine: line,
      pumps: [
        { driveFlowM3s: gpm(2), drivePipe: drive(half) },
        { driveFlowM3s: gpm(2), drivePipe: drive(half, [{ kind: 'elbow-90-threaded' }]) },
      ],
      sourceSpareFlowM3s: gpm(10),
    });
  });
  bench('array planner (staged)', () => {
    planArray({
      fallM: ft(4),
      liftM: ft(29),
      deliveryLine: line,
      pumps: [{ drivePipe: drive(big) }],
      staged: { upperFallM: ft(4), upperLiftM: ft(29), upperPump: { driveFlowM3s: gpm(2), drivePipe: drive(half) } },
    });
  });
  bench('drive pipe check', () => {
    checkDrivePipe({ fallM: ft(4), liftM: ft(29), drivePipe: drive(one) });
  });
  bench('delivery line', () => {
    checkDeliveryLine({
      flowM3s: gpm(1),
      liftM: 30,
      line: {
        lengthM: 300,
        insideDiameterM: half.insideDiameterM,
        material: 'pvc',
        fittings: [{ kind: 'elbow-90-threaded', count: 3 }],
      },
    });
  });
  bench('source flow (bucket)', () => {
    measureSourceFlow({
      method: 'bucket',
      trials: [
        { volumeM3: 0.0189, timeS: 12 },
        { volumeM3: 0.0189, timeS: 12.6 },
        { volumeM3: 0.0189, timeS: 11.4 },
      ],
      plannedDrawM3s: gpm(4),
    });
  });
  bench('source flow (V-notch)', () => {
    measureSourceFlow({ method: 'v-notch', notchHeadM: 0.15 });
  });
  bench('demand and storage', () => {
    planDemandAndStorage({
      deliveredFlowM3s: 1.6e-5,
      people: 2,
      gardenAreaM2: 50,
      livestock: [
        { kind: 'sheep', count: 40 },
        { kind: 'chickens-per-100', count: 1 },
      ],
      tankVolumeM3: 2,
    });
  });
  bench('stall check', () => {
    runStallCheck({
      site: {
        fallM: ft(4),
        liftM: ft(29),
        drivePipe: drive(half, [{ kind: 'elbow-90-threaded' }]),
        sourceSpareFlowM3s: gpm(3),
        driveFlowM3s: gpm(2),
        deliveredFlowM3s: 5e-6,
        pumpSize: '1/2',
        pumpCount: 2,
        beatsPerMinute: 70,
        intakeSubmergenceM: 0.2,
        deliveryLine: line,
      },
      symptoms: ['weak-delivery', 'stops-after-some-beats', 'spits-air'],
    });
  });
});
