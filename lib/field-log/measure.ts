/**
 * Reads a field log entry as typed into SI, and computes what the engine says
 * about it: both efficiencies from the measured flows, and the delivery the yield
 * estimate would have predicted for the same drive flow, fall and lift.
 * Formulas live in lib/hydraulics; nothing here re-derives them.
 */
import {
  EngineInputError,
  NOMINAL_SIZES,
  dAubuissonEfficiency,
  efficiencyBand,
  estimateYield,
  parseNominalSize,
  parseQuantity,
  rankineEfficiency,
  type BandAtRatio,
  type NominalSize,
  type PumpType,
} from '@/lib/hydraulics';
import { ForumError } from '@/lib/questions/errors';
import type { FieldLogEntryData } from '@/lib/validation/field-log';

export interface TrialSI {
  volumeL: number;
  seconds: number;
}

export interface EntrySI {
  pumpSize: NominalSize;
  driveSize: NominalSize;
  deliverySize: NominalSize | null;
  fallM: number;
  liftM: number;
  driveLengthM: number;
  deliveryLengthM: number | null;
  driveFlowM3s: number;
  trials: TrialSI[];
  deliveredFlowM3s: number;
}

/** Flow of one trial, m³/s: litres ÷ 1000 ÷ seconds. */
export function trialFlowM3s(t: TrialSI): number {
  return t.volumeL / 1000 / t.seconds;
}

/** The spread of the trials: mean, lowest and highest flow, m³/s. */
export function trialSpread(trials: TrialSI[]): { mean: number; min: number; max: number } {
  const flows = trials.map(trialFlowM3s);
  return { mean: flows.reduce((a, b) => a + b, 0) / flows.length, min: Math.min(...flows), max: Math.max(...flows) };
}

function quantity(text: string, kind: 'length' | 'flow' | 'volume', field: string): number {
  try {
    return parseQuantity(text, kind, field);
  } catch (err) {
    if (err instanceof EngineInputError) throw new ForumError(422, `${field}: ${err.issues[0].message}`, field);
    throw err;
  }
}

function nominal(text: string, field: string): NominalSize {
  const n = parseNominalSize(text);
  if (!n)
    throw new ForumError(
      422,
      `${field}: "${text}" is not a pipe size from ½" to 4" (${NOMINAL_SIZES.join(', ')})`,
      field,
    );
  return n;
}

/** Reads the typed entry into SI; throws a ForumError (422) naming the field that does not read or cannot be. */
export function readEntry(v: FieldLogEntryData): EntrySI {
  const fallM = quantity(v.fall, 'length', 'fall');
  const liftM = quantity(v.lift, 'length', 'lift');
  const driveLengthM = quantity(v.driveLength, 'length', 'driveLength');
  const driveFlowM3s = quantity(v.driveFlow, 'flow', 'driveFlow');
  const deliveryLengthM = v.deliveryLength ? quantity(v.deliveryLength, 'length', 'deliveryLength') : null;
  if (fallM <= 0) throw new ForumError(422, 'fall: must be more than 0', 'fall');
  if (liftM <= fallM)
    throw new ForumError(422, 'lift: must be greater than the fall; a ram lifts water above its source', 'lift');
  if (driveLengthM <= 0) throw new ForumError(422, 'driveLength: must be more than 0', 'driveLength');
  if (driveFlowM3s <= 0) throw new ForumError(422, 'driveFlow: must be more than 0', 'driveFlow');
  if (v.arrangement === 'single' && v.pumpCount !== 1)
    throw new ForumError(
      422,
      'pumpCount: a single arrangement has one pump; choose parallel or staged for more',
      'pumpCount',
    );
  if (v.arrangement !== 'single' && v.pumpCount < 2)
    throw new ForumError(422, `pumpCount: a ${v.arrangement} arrangement needs at least two pumps`, 'pumpCount');
  const trials = v.trials.map((t, i) => {
    const volumeL = quantity(t.volume, 'volume', `trials.${i}.volume`) * 1000;
    if (volumeL <= 0) throw new ForumError(422, `trials.${i}.volume: must be more than 0`, `trials.${i}.volume`);
    return { volumeL, seconds: t.seconds };
  });
  const deliveredFlowM3s = trialSpread(trials).mean;
  if (deliveredFlowM3s >= driveFlowM3s) {
    throw new ForumError(
      422,
      'trials: the delivered flow must be less than the drive flow; a ram delivers only part of the water it uses',
      'trials',
    );
  }
  if (dAubuissonEfficiency(driveFlowM3s, deliveredFlowM3s, fallM, liftM) > 1) {
    throw new ForumError(
      422,
      'trials: these trials imply an efficiency above 1 at this fall, lift and drive flow; check the measurements',
      'trials',
    );
  }
  return {
    pumpSize: nominal(v.pumpSize, 'pumpSize'),
    driveSize: nominal(v.driveSize, 'driveSize'),
    deliverySize: v.deliverySize ? nominal(v.deliverySize, 'deliverySize') : null,
    fallM,
    liftM,
    driveLengthM,
    deliveryLengthM,
    driveFlowM3s,
    trials,
    deliveredFlowM3s,
  };
}

export interface EntryPerformance {
  liftRatio: number;
  dAubuisson: number;
  rankine: number;
  /** what the yield estimate predicts at the pump type's typical efficiency, m³/s */
  predictedDeliveredFlowM3s: number;
  band: BandAtRatio;
  /** measured ÷ predicted delivery */
  measuredOverPredicted: number;
  /** trial flows, m³/s */
  spread: { mean: number; min: number; max: number };
}

/**
 * Measured against predicted for one entry. Worked example: Q = 30 L/min, trials of
 * 3 L in 60 s (q = 3 L/min), H = 1.5 m, h = 9 m → η_D = 3 × 9 / (30 × 1.5) = 0.60,
 * η_R = 3 × 7.5 / (27 × 1.5) = 0.556; homemade typical at h/H = 6 is 0.55 →
 * predicted q = 0.55 × 30 × 1.5 / 9 = 2.75 L/min.
 */
export function performance(e: {
  pumpType: PumpType;
  fallM: number;
  liftM: number;
  driveFlowM3s: number;
  waterTempC?: number | null;
  trials: TrialSI[];
}): EntryPerformance {
  const spread = trialSpread(e.trials);
  const q = spread.mean;
  const est = estimateYield({
    driveFlowM3s: e.driveFlowM3s,
    fallM: e.fallM,
    liftM: e.liftM,
    pumpType: e.pumpType,
    ...(e.waterTempC !== null && e.waterTempC !== undefined ? { waterTempC: e.waterTempC } : {}),
  }).results;
  const predicted = est.deliveredFlowM3s;
  return {
    liftRatio: e.liftM / e.fallM,
    dAubuisson: dAubuissonEfficiency(e.driveFlowM3s, q, e.fallM, e.liftM),
    rankine: rankineEfficiency(e.driveFlowM3s, q, e.fallM, e.liftM),
    predictedDeliveredFlowM3s: predicted,
    band: efficiencyBand(e.pumpType, e.liftM / e.fallM),
    measuredOverPredicted: predicted > 0 ? q / predicted : 0,
    spread,
  };
}
