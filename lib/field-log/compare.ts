/**
 * Before/after comparisons of two entries on one site: the measured ratio with the
 * spread of the trials, and the ratio the array planner predicts for the change.
 */
import {
  defaultSeries,
  planArray,
  resolvePipe,
  type NominalSize,
  type PipeMaterial,
  type PumpType,
} from '@/lib/hydraulics';
import { trialSpread, type TrialSI } from './measure';

export interface ComparableEntry {
  pumpType: PumpType;
  pumpCount: number;
  arrangement: 'single' | 'parallel' | 'staged';
  fallM: number;
  liftM: number;
  driveLengthM: number;
  driveSize: string;
  driveMaterial: string;
  deliveryLengthM: number | null;
  deliverySize: string | null;
  deliveryMaterial: string | null;
  driveFlowM3s: number;
  waterTempC: number | null;
  trials: TrialSI[];
}

export interface Ratio {
  /** after ÷ before, of the mean trial flows */
  ratio: number;
  /** lowest after trial ÷ highest before trial, and the other way about */
  low: number;
  high: number;
}

/** Ratio of delivered flows with the spread of the trials. Example: before 3.0–3.3 L/min, after 5.0–5.4 → ratio of means, low 5.0/3.3, high 5.4/3.0. */
export function deliveryRatio(before: TrialSI[], after: TrialSI[]): Ratio {
  const b = trialSpread(before);
  const a = trialSpread(after);
  return { ratio: a.mean / b.mean, low: a.min / b.max, high: a.max / b.min };
}

function pipe(lengthM: number, size: string, material: string) {
  const mat = material as PipeMaterial;
  const spec = resolvePipe(defaultSeries(mat), size as NominalSize, mat === 'hose' ? undefined : mat);
  return { lengthM, insideDiameterM: spec.insideDiameterM, material: mat, wallThicknessM: spec.wallThicknessM };
}

/** An installation as the array planner sees it: the pumps, their drive pipes and the shared delivery line. */
export interface PumpLayout {
  pumpType: PumpType;
  pumpCount: number;
  fallM: number;
  liftM: number;
  drivePipe: { lengthM: number; insideDiameterM: number; material: PipeMaterial; wallThicknessM?: number };
  deliveryLine: { lengthM: number; insideDiameterM: number; material: PipeMaterial; wallThicknessM?: number };
  waterTempC?: number | null;
}

/**
 * The array planner's combined delivery, m³/s, for a layout whose pumps each take an
 * equal share `perPumpDriveM3s` of the drive flow. Throws the engine's input error
 * when the layout is outside its range.
 */
export function layoutDelivery(l: PumpLayout, perPumpDriveM3s: number): number {
  const out = planArray({
    fallM: l.fallM,
    liftM: l.liftM,
    pumps: Array.from({ length: l.pumpCount }, () => ({
      pumpType: l.pumpType,
      driveFlowM3s: perPumpDriveM3s,
      drivePipe: l.drivePipe,
    })),
    deliveryLine: l.deliveryLine,
    ...(l.waterTempC !== null && l.waterTempC !== undefined ? { waterTempC: l.waterTempC } : {}),
  });
  return out.results.combinedDeliveryM3s;
}

/**
 * The planner's combined delivery for an entry's pumps (each pump taking an equal
 * share of `perPumpDriveM3s`), or null when the planner does not apply (staged, or
 * no delivery line recorded).
 */
function plannedDelivery(e: ComparableEntry, perPumpDriveM3s: number): number | null {
  if (e.arrangement === 'staged' || e.deliveryLengthM === null || !e.deliverySize || !e.deliveryMaterial) return null;
  return layoutDelivery(
    {
      pumpType: e.pumpType,
      pumpCount: e.pumpCount,
      fallM: e.fallM,
      liftM: e.liftM,
      drivePipe: pipe(e.driveLengthM, e.driveSize, e.driveMaterial),
      deliveryLine: pipe(e.deliveryLengthM, e.deliverySize, e.deliveryMaterial),
      waterTempC: e.waterTempC,
    },
    perPumpDriveM3s,
  );
}

/**
 * What the planner would have said before the change: the before entry's pumps each
 * get its measured drive flow per pump; the after layout is planned with that same
 * per-pump drive flow, so the prediction uses nothing measured after the change.
 */
export function plannerRatio(
  before: ComparableEntry,
  after: ComparableEntry,
): { ratio: number; beforeM3s: number; afterM3s: number } | null {
  const perPump = before.driveFlowM3s / before.pumpCount;
  try {
    const b = plannedDelivery(before, perPump);
    const a = plannedDelivery(after, perPump);
    if (b === null || a === null || b <= 0) return null;
    return { ratio: a / b, beforeM3s: b, afterM3s: a };
  } catch {
    // an entry the planner refuses (e.g. a drive flow outside its range) simply has no prediction
    return null;
  }
}
