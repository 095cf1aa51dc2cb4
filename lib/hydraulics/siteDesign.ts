/**
 * The pieces of a site plan that the calculators do not already give: the
 * drive pipe's length and series for a fall, the supply (standpipe or not,
 * intake screen), the delivery line's size and pressure class, the air
 * chamber and snifter, and the month-by-month delivery. Each composes the
 * existing calculators (drivePipeCheck, deliveryLine) rather than redoing
 * their sums.
 */
import { checkDeliveryLine, type DeliveryLineResults } from './deliveryLine';
import { checkDrivePipe, RATING_MARGIN, type DrivePipeCheckResults } from './drivePipeCheck';
import { boreArea } from './friction';
import { resolvePipe, NOMINAL_SIZES, type NominalSize, type PipeSeries, type PipeSpec } from './pipes';
import { PRACTICE } from './practice';
import type { CalcOutput } from './steps';

/**
 * Approach velocity at the intake screen, m/s: 0.2 ft/s (0.061 m/s), the criterion for a passive
 * (uncleaned) pump intake screen. A ram's intake screen is passive.
 */
export const SCREEN_APPROACH_VELOCITY = {
  value: 0.06096,
  source:
    'National Marine Fisheries Service, Southwest Region, pump intake screen criteria (addendum to "Fish Screening Criteria for Anadromous Salmonids", 1997), for a passive screen',
} as const;

/** Supply-pipe friction allowed to a standpipe, as a share of the fall (common practice, no source). */
export const SUPPLY_LOSS_SHARE = { value: 0.05, source: 'common practice, no published source found' } as const;

/**
 * Air chamber at least the volume of the delivery pipe; snifter hole about 1/16 in (1.6 mm).
 * The chamber rule is the one an early-1900s English building handbook gives ("the contents of the air
 * vessel should be the same as that of the rising tube"); its author and title could not be identified,
 * so it stands as common practice.
 */
export const AIR_CHAMBER_RULE = {
  source:
    'common practice, no published source verified: air chamber as large as the delivery pipe holds (an early-1900s building handbook, not identified, gives the same rule)',
} as const;
export const SNIFTER_HOLE = {
  diameterM: 0.0015875,
  source: 'common practice, no published source found: a small hole just below the delivery valve',
} as const;

/** Drive pipe series tried in order: the first whose surge, shut-off pressure and fatigue life pass is used. */
const DRIVE_SERIES: readonly PipeSeries[] = ['pvc-sch40', 'pvc-sch80', 'steel-sch40'];
// a low surge margin stays a caution on the chosen pipe; these three rule a series out
const DANGER = new Set(['surge-exceeds-rating', 'shut-off-exceeds-rating', 'fatigue-life-short']);

export interface DrivePipeDesign {
  nominal: NominalSize;
  series: PipeSeries;
  spec: PipeSpec;
  lengthM: number;
  /** straight-line length from the intake to the pump, m */
  pathM: number;
  standpipe: boolean;
  /** pipe from the source to the standpipe, m (0 when none) */
  supplyLengthM: number;
  check: CalcOutput<DrivePipeCheckResults>;
}

/**
 * A drive pipe of the pump's size for a fall: length inside PRACTICE's 5–10 × fall
 * (a longer path gets a standpipe), the first series that carries the surge.
 * Units: m, m³/s.
 * Reference: DRIVE_PIPE_GUIDES (drivePipeCheck.ts); checkDrivePipe.
 * @example 4 ft fall, 30 ft run: path √(9.144² + 1.2192²) = 9.225 m, inside 6.10–12.19 m, no standpipe
 * designDrivePipe(1.2192, 9.144, '1', 8.8392, 3e-4).lengthM  // ≈ 9.225
 * designDrivePipe(1.2192, 30, '1', 8.8392, 3e-4).standpipe  // → true
 * designDrivePipe(1.2192, 30, '1', 8.8392, 3e-4).lengthM  // ≈ 12.192
 */
export function designDrivePipe(
  fallM: number,
  runM: number,
  nominal: NominalSize,
  liftM: number,
  driveFlowM3s: number,
): DrivePipeDesign {
  const path = Math.hypot(runM, fallM);
  const min = PRACTICE.driveLengthToFallMin.value * fallM;
  const max = PRACTICE.driveLengthToFallMax.value * fallM;
  const L = Math.min(max, Math.max(min, path));
  // the first series with no ruling-out warning, else the one with the fewest
  let chosen: { d: DrivePipeDesign; score: number } | undefined;
  for (const series of DRIVE_SERIES) {
    const spec = resolvePipe(series, nominal);
    const check = checkDrivePipe({
      fallM,
      liftM,
      driveFlowM3s,
      series,
      drivePipe: {
        lengthM: L,
        insideDiameterM: spec.insideDiameterM,
        wallThicknessM: spec.wallThicknessM,
        pressureRatingPa: spec.pressureRatingPa,
        material: spec.material,
      },
    });
    const score = check.warnings.filter((w) => DANGER.has(w.code)).length;
    const d = { nominal, series, spec, lengthM: L, pathM: path, standpipe: path > max, supplyLengthM: 0, check };
    // on a tie, the series with more rating to spare over the shut-off pressure
    const better =
      !chosen ||
      score < chosen.score ||
      (score === chosen.score && check.results.shutOffMargin > chosen.d.check.results.shutOffMargin);
    if (better) chosen = { d, score };
    if (score === 0) break;
  }
  // DRIVE_SERIES is not empty, so the loop ran
  const d = (chosen as { d: DrivePipeDesign }).d;
  if (d.standpipe) d.supplyLengthM = path - L;
  return d;
}

export interface SupplyDesign {
  standpipe: boolean;
  supplyPipe: { nominal: NominalSize; series: PipeSeries; lengthM: number; lossM: number } | null;
  /** open screen area for the approach velocity, m² */
  screenOpenAreaM2: number;
  approachVelocityMs: number;
}

/**
 * Supply to the pumps: the standpipe's supply pipe (smallest PVC size whose loss stays within 5 % of
 * the fall) and the intake screen's open area A = Q/v_a.
 * Units: m, m³/s, m². Reference: SCREEN_APPROACH_VELOCITY (NMFS 1997); SUPPLY_LOSS_SHARE.
 * @example 20 US gal/min (1.262e-3 m³/s) through the screen at 0.061 m/s: 0.0207 m² (32 in²)
 * designSupply(1.262e-3, 1.2192, 0).screenOpenAreaM2  // ≈ 0.0207
 * // 40 m of 3" sch 40 (D = 77.93 mm): v = 0.265 m/s, Re = 15,800, f ≈ 0.0277, h_f = 0.0277 × 513 × 0.265²/19.61 = 0.051 m ≤ 0.061 m
 * designSupply(1.262e-3, 1.2192, 40).supplyPipe.nominal  // → '3'
 */
export function designSupply(totalDriveM3s: number, fallM: number, supplyLengthM: number): SupplyDesign {
  const screen = totalDriveM3s / SCREEN_APPROACH_VELOCITY.value;
  let supplyPipe: SupplyDesign['supplyPipe'] = null;
  if (supplyLengthM > 0) {
    const r = checkDeliveryLine({
      flowM3s: totalDriveM3s,
      liftM: fallM,
      targetLossM: SUPPLY_LOSS_SHARE.value * fallM,
      line: { lengthM: supplyLengthM, insideDiameterM: resolvePipe('pvc-sch40', '4').insideDiameterM, material: 'pvc' },
    }).results;
    const p = r.smallestPipe;
    supplyPipe = p
      ? { nominal: p.nominal, series: p.series, lengthM: supplyLengthM, lossM: p.lossM }
      : { nominal: '4', series: 'pvc-sch40', lengthM: supplyLengthM, lossM: r.frictionHeadM + r.minorHeadM };
  }
  return {
    standpipe: supplyLengthM > 0,
    supplyPipe,
    screenOpenAreaM2: screen,
    approachVelocityMs: SCREEN_APPROACH_VELOCITY.value,
  };
}

/** Delivery-line series tried in order, lightest first; the first rated for the pressure with margin is used. */
const DELIVERY_SERIES: readonly PipeSeries[] = ['hdpe-dr17', 'hdpe-dr11', 'hdpe-dr9', 'steel-sch40'];

export interface DeliveryDesign {
  nominal: NominalSize;
  series: PipeSeries;
  spec: PipeSpec;
  lengthM: number;
  check: CalcOutput<DeliveryLineResults>;
}

/**
 * The smallest delivery line within the accepted loss and the lightest HDPE class rated for its
 * pressure with RATING_MARGIN (1.5, common practice). Length = √(run² + lift²).
 * Units: m, m³/s. Reference: checkDeliveryLine; ratings pipes.ts (ASTM D3035, PE4710).
 * @example 0.5 L/min (8.33e-6 m³/s) up 29 ft (8.8392 m) over 300 ft (91.44 m): ½" DR 17 (125 psi)
 * designDeliveryLine(8.33e-6, 8.8392, 91.44, 0.1, false).nominal  // → '1/2'
 * designDeliveryLine(8.33e-6, 8.8392, 91.44, 0.1, false).series  // → 'hdpe-dr17'
 * designDeliveryLine(8.33e-6, 8.8392, 91.44, 0.1, false).lengthM  // ≈ 91.87
 */
export function designDeliveryLine(
  flowM3s: number,
  liftM: number,
  runM: number,
  lossShare: number,
  freezes: boolean,
): DeliveryDesign {
  const lengthM = Math.hypot(runM, liftM);
  const target = Math.max(lossShare, 1e-3) * liftM;
  const run = (series: PipeSeries, nominal: NominalSize) => {
    const spec = resolvePipe(series, nominal);
    const check = checkDeliveryLine({
      flowM3s,
      liftM,
      targetLossM: target,
      sizingSeries: series,
      frostRisk: freezes,
      line: {
        lengthM,
        insideDiameterM: spec.insideDiameterM,
        pressureRatingPa: spec.pressureRatingPa,
        material: spec.material,
      },
    });
    return { spec, check };
  };
  let last: DeliveryDesign | undefined;
  for (const series of DELIVERY_SERIES) {
    const first = run(series, NOMINAL_SIZES[0]);
    const nominal = first.check.results.smallestPipe?.nominal ?? '4';
    const { spec, check } = run(series, nominal);
    last = { nominal, series, spec, lengthM, check };
    if (spec.pressureRatingPa >= RATING_MARGIN.value * check.results.pumpPressurePa) break;
  }
  return last as DeliveryDesign;
}

/**
 * Air chamber volume by the rule: the delivery pipe's volume, V = π/4·D²·L, m³.
 * Reference: AIR_CHAMBER_RULE (common practice, no published source verified).
 * @example 300 ft of ½" DR 17 HDPE (D = 0.84 − 2 × 0.84/17 = 0.7412 in = 18.83 mm): π/4 × 0.01883² × 91.44
 * airChamberVolume(0.01883, 91.44)  // ≈ 0.02546
 */
export function airChamberVolume(insideDiameterM: number, lengthM: number): number {
  return boreArea(insideDiameterM) * lengthM;
}

/**
 * Flow in each month between the driest and the wettest, six months apart, on a cosine:
 * Q_m = Q_dry + (Q_wet − Q_dry)·(1 − cos(2π(m − m_dry)/12))/2 (common practice, no source).
 * Units: m³/s; months 1–12.
 * @example dry 1, wet 3 (any unit), driest month 8: August 1, February 3, May 2
 * monthlyFlows(1, 3, 8)[7]  // ≈ 1
 * monthlyFlows(1, 3, 8)[1]  // ≈ 3
 * monthlyFlows(1, 3, 8)[4]  // ≈ 2
 */
export function monthlyFlows(dryM3s: number, wetM3s: number, driestMonth: number): number[] {
  return Array.from(
    { length: 12 },
    (_, i) => dryM3s + ((wetM3s - dryM3s) * (1 - Math.cos((2 * Math.PI * (i + 1 - driestMonth)) / 12))) / 2,
  );
}
