/**
 * The physics of N rams in parallel, each on its own drive pipe, all into
 * one shared delivery line. Used by the array planner (and its staged mode).
 *
 * Each pump i:
 *  - drive flow Qᵢ (m³/s): given, or estimated for its straight drive pipe
 *    by estimateDriveFlow (ramCycle.ts);
 *  - closing velocity v_c,ᵢ (m/s): from the same model, scaled by Qᵢ/Q_model
 *    when Qᵢ was measured, so the velocity matches the measured flow;
 *  - fittings in its drive pipe (ΣKᵢ beyond a straight run) dissipate
 *    ΔHᵢ = ΣKᵢ·v_c,ᵢ²/(2g) of the fall at the moment the column's momentum is
 *    turned into delivery, so the drive energy per unit weight left for the
 *    pump is H_eff,ᵢ = H − ΔHᵢ. Qᵢ and ηᵢ describe the pump on a straight
 *    drive pipe; the fitting is charged only through H_eff.
 *  - delivery qᵢ = ηᵢ·Qᵢ·H_eff,ᵢ / h_p, where h_p = h + h_f(S) + h_m(S) is the
 *    head at the pump: lift plus the shared line's friction and fitting
 *    losses at the combined flow S = Σqᵢ (Darcy-Weisbach with Colebrook).
 * ηᵢ, when not given, is the typical band value at hₚ/H_eff,ᵢ (efficiency.ts).
 * S solves S = Σqᵢ(h + loss(S)); the right side falls as S grows, so the root
 * is unique and found by regula falsi (Illinois variant).
 */
import { efficiencyBand, maxLiftRatio, type PumpType } from './efficiency';
import { sumK, type Fitting } from './fittings';
import { pipeHeadLoss, pipeLoss, type PipeLoss } from './friction';
import { roughnessOf, type DrivePipe, type PipeRun } from './pipeSchemas';
import { estimateDriveFlow } from './ramCycle';
import { G } from './water';

export interface PumpInput {
  label?: string;
  pumpType: PumpType;
  driveFlowM3s?: number;
  efficiency?: number;
  drivePipe: DrivePipe;
}

export interface PreparedPump {
  label: string;
  pumpType: PumpType;
  driveFlowM3s: number;
  driveFlowEstimated: boolean;
  closureVelocityMs: number;
  fittingsK: number;
  fittingHeadLossM: number;
  effectiveFallM: number;
  givenEfficiency?: number;
}

/**
 * Works out one pump's drive flow, closing velocity and effective fall.
 * Formula: Q = given or estimateDriveFlow(straight pipe); v_c = α·v₀·(Q/Q_model);
 * ΔH = ΣK·v_c²/(2g); H_eff = max(0, H − ΔH).
 * Units: fallM, liftM m; nu m²/s; closureRatio α dimensionless (0.3–0.98).
 * Reference: see the module comment; K from Munson, Young & Okiishi, Table 8.2.
 * @example ½" sch 40 PVC, 20 ft, Q = 2 US gal/min (1.2618e-4 m³/s), one threaded elbow (K = 1.5), 4 ft fall, 29 ft lift
 * const drivePipe = {
 *   lengthM: 6.096, insideDiameterM: resolvePipe('pvc-sch40', '1/2').insideDiameterM, material: 'pvc',
 *   fittings: [{ kind: 'elbow-90-threaded', count: 1 }],
 * }
 * const input = { pumpType: 'homemade', driveFlowM3s: toSI(2, 'gal/min', 'flow'), drivePipe }
 * // pump 0 at a 4 ft fall and 29 ft lift, ν = 1.306e-6 m²/s, α = 0.8
 * const p = preparePump(input, 0, 1.2192, 8.8392, 1.306e-6, 0.8)
 * // model Q = 1.128e-4, v_c = 1.005 × 1.2618/1.128
 * p.closureVelocityMs  // ≈ 1.124
 * // ΔH = 1.5 × 1.124²/19.613
 * p.fittingHeadLossM  // ≈ 0.0966
 * p.effectiveFallM  // ≈ 1.1226
 */
export function preparePump(
  p: PumpInput,
  index: number,
  fallM: number,
  liftM: number,
  nu: number,
  closureRatio: number,
): PreparedPump {
  const dp = p.drivePipe;
  const cycle = estimateDriveFlow({
    fallM,
    pumpHeadM: liftM,
    lengthM: dp.lengthM,
    insideDiameterM: dp.insideDiameterM,
    roughnessM: roughnessOf(dp),
    nu,
    closureRatio,
  });
  const Q = p.driveFlowM3s ?? cycle.driveFlowM3s;
  const vc = cycle.closureVelocityMs * (Q / cycle.driveFlowM3s);
  const k = sumK(dp.fittings as Fitting[]);
  const loss = (k * vc * vc) / (2 * G);
  return {
    label: p.label ?? `pump ${index + 1}`,
    pumpType: p.pumpType,
    driveFlowM3s: Q,
    driveFlowEstimated: p.driveFlowM3s === undefined,
    closureVelocityMs: vc,
    fittingsK: k,
    fittingHeadLossM: loss,
    effectiveFallM: Math.max(0, fallM - loss),
    givenEfficiency: p.efficiency,
  };
}

/** A pump whose fittings leave less than this share of the fall is taken as stopped. */
const MIN_EFFECTIVE_FALL_SHARE = 0.05;

/**
 * Whether a pump still beats: H_eff > 0.05·H (fittings that eat 95 % of the fall stop it).
 * Units: m. Reference: engineering judgement, no source.
 * @example H = 1.2192 m: H_eff = 1.1226 m runs, H_eff = 0.05 m does not
 * const pump = {
 *   label: 'a', pumpType: 'homemade', driveFlowM3s: 1.2618e-4, driveFlowEstimated: false,
 *   closureVelocityMs: 1.124, fittingsK: 1.5, fittingHeadLossM: 0.0966, effectiveFallM: 1.1226,
 * }
 * pumpRuns(pump, 1.2192)  // → true
 * pumpRuns({ ...pump, effectiveFallM: 0.05 }, 1.2192)  // → false
 */
export function pumpRuns(p: PreparedPump, fallM: number): boolean {
  return p.effectiveFallM > MIN_EFFECTIVE_FALL_SHARE * fallM;
}

/**
 * Efficiency of a pump working against head hp: the given η, else the typical
 * band value at hp/H_eff (efficiency.ts). Units: hp m; result dimensionless.
 * Reference: EFFICIENCY_BANDS (Building Trades Pocketbook table × 0.33/0.66, efficiency.ts).
 * @example homemade, hp = 8.884 m, H_eff = 1.2192 m → r = 7.29
 * // Pocketbook 0.61 − 0.09 × 1.287/2 = 0.5521, × 0.5 for a homemade ram
 * const pump = {
 *   label: 'a', pumpType: 'homemade', driveFlowM3s: 1.2618e-4, driveFlowEstimated: false,
 *   closureVelocityMs: 1.124, fittingsK: 0, fittingHeadLossM: 0, effectiveFallM: 1.2192,
 * }
 * pumpEfficiency(pump, 8.884)  // ≈ 0.2760
 * pumpEfficiency({ ...pump, givenEfficiency: 0.6 }, 8.884)  // ≈ 0.6
 */
export function pumpEfficiency(p: PreparedPump, hp: number): number {
  if (p.givenEfficiency !== undefined) return p.givenEfficiency;
  return efficiencyBand(p.pumpType, hp / p.effectiveFallM).typical;
}

/**
 * Delivery of one pump against head hp: q = η·Q·H_eff/hp, m³/s (0 when stopped or hp ≤ H_eff).
 * Units: hp, fallM m; result m³/s.
 * Reference: D'Aubuisson relation.
 * @example η = 0.2760 (homemade typical at r = 7.29), Q = 1.2618e-4 m³/s, H_eff = 1.2192 m, hp = 8.884 m
 * const pump = {
 *   label: 'a', pumpType: 'homemade', driveFlowM3s: 1.2618e-4, driveFlowEstimated: false,
 *   closureVelocityMs: 1.124, fittingsK: 0, fittingHeadLossM: 0, effectiveFallM: 1.2192,
 * }
 * pumpDelivery(pump, 8.884, 1.2192)  // ≈ 4.780e-6
 * fromSI(pumpDelivery(pump, 8.884, 1.2192), 'mL/min', 'flow')  // ≈ 286.8
 */
export function pumpDelivery(p: PreparedPump, hp: number, fallM: number): number {
  if (!pumpRuns(p, fallM) || hp <= p.effectiveFallM) return 0;
  return (pumpEfficiency(p, hp) * p.driveFlowM3s * p.effectiveFallM) / hp;
}

export interface LineSpec {
  lengthM: number;
  insideDiameterM: number;
  roughnessM: number;
  sumK: number;
}

/**
 * A delivery line reduced to what the solver needs: L, D, ε (input or material
 * table) and ΣK. Units: m.
 * Reference: MATERIAL_PROPS (Munson Table 8.1, from memory).
 * @example 100 ft of ½" sch 40 PVC
 * const spec = lineSpec({ lengthM: 30.48, insideDiameterM: 0.0158, material: 'pvc', fittings: [] })
 * spec  // → { lengthM: 30.48, insideDiameterM: 0.0158, roughnessM: 1.5e-6, sumK: 0 }
 */
export function lineSpec(line: PipeRun): LineSpec {
  return {
    lengthM: line.lengthM,
    insideDiameterM: line.insideDiameterM,
    roughnessM: roughnessOf(line),
    sumK: sumK(line.fittings as Fitting[]),
  };
}

/**
 * Losses in a line at a flow: Darcy-Weisbach with Colebrook plus ΣK·v²/(2g) (see pipeLoss).
 * Units: flow m³/s, ν m²/s; heads m.
 * Reference: White, Fluid Mechanics, ch. 6.
 * @example 1.78e-5 m³/s (1.07 L/min) in 30.48 m of ½" PVC at 10 °C
 * const line = { lengthM: 30.48, insideDiameterM: resolvePipe('pvc-sch40', '1/2').insideDiameterM, roughnessM: 1.5e-6, sumK: 0 }
 * const loss = lineLoss(line, 1.78e-5, 1.306e-6)
 * loss.velocityMs  // ≈ 0.0908
 * loss.reynolds  // ≈ 1098
 * loss.friction.f  // ≈ 0.0583
 * loss.frictionHeadM  // ≈ 0.047
 */
export function lineLoss(line: LineSpec, flowM3s: number, nu: number): PipeLoss {
  return pipeLoss(flowM3s, line.lengthM, line.insideDiameterM, line.roughnessM, nu, line.sumK);
}

/** One pump of a solution, at the head the solution settled on. */
export interface PumpAtHead {
  pump: PreparedPump;
  /** delivery of one copy of the pump, m³/s */
  deliveredFlowM3s: number;
  /** efficiency used (0 when the pump does not run) */
  efficiency: number;
}

/**
 * One pump's delivery and efficiency against head hp (see {@link pumpDelivery}, {@link pumpEfficiency});
 * the efficiency is 0 for a pump that does not run.
 * @example as pumpDelivery
 * const pump = {
 *   label: 'a', pumpType: 'homemade', driveFlowM3s: 1.2618e-4, driveFlowEstimated: false,
 *   closureVelocityMs: 1.124, fittingsK: 0, fittingHeadLossM: 0, effectiveFallM: 1.2192,
 * }
 * pumpAtHead(pump, 8.884, 1.2192).deliveredFlowM3s  // ≈ 4.780e-6
 * pumpAtHead(pump, 8.884, 1.2192).efficiency  // ≈ 0.2760
 * pumpAtHead({ ...pump, effectiveFallM: 0.05 }, 8.884, 1.2192).efficiency  // → 0
 */
export function pumpAtHead(p: PreparedPump, hp: number, fallM: number): PumpAtHead {
  const efficiency = pumpRuns(p, fallM) ? pumpEfficiency(p, hp) : 0;
  return { pump: p, deliveredFlowM3s: pumpDelivery(p, hp, fallM), efficiency };
}

export interface ParallelSolution {
  combinedFlowM3s: number;
  pumpHeadM: number;
  frictionHeadM: number;
  minorHeadM: number;
  /** the pumps in input order */
  pumps: PumpAtHead[];
  loss: PipeLoss;
}

/**
 * Combined delivery of prepared pumps into one shared line against lift h.
 *
 * Formula: the combined flow S solves F(S) = Σᵢ cᵢ·qᵢ(h_p(S)) − S = 0, with
 * h_p(S) = h + h_f(S) + h_m(S) the head at the pumps (Darcy-Weisbach with
 * Colebrook plus ΣK·v²/(2g) in the line at S) and qᵢ(h_p) = ηᵢ·Qᵢ·H_eff,ᵢ/h_p
 * ({@link pumpDelivery}); cᵢ = `copies[i]` (default 1) identical copies of pump i.
 * F(0) ≥ 0 and F falls as S grows (more flow, more loss, less delivery), so
 * the root is unique; it is bracketed by [0, Σ cᵢ·qᵢ(h)] and found by regula
 * falsi (Illinois variant) to |F(S)| ≤ 1e-14 + 1e-10·S, at most 100 steps.
 * Units: fallM, liftM m; ν m²/s; returns flows in m³/s and heads in m.
 * Range: 1–20 pumps (copies up to 50 in the staged search), H ≤ 100 m,
 * h ≤ 1000 m; a pump delivers nothing when h_p ≤ H_eff or it does not run.
 * Reference: D'Aubuisson relation; Darcy-Weisbach/Colebrook (White, Fluid
 * Mechanics, ch. 6); root finding: Dowell, M. & Jarratt, P. (1971), "A modified
 * regula falsi method for computing the root of an equation", BIT 11, 168–174.
 * @example two ½" rams (2 US gal/min each, H = 1.2192 m) into 100 ft of ½" PVC, h = 8.8392 m
 * const drivePipe = { lengthM: 6.096, insideDiameterM: 0.0158, material: 'pvc', fittings: [] }
 * const input = { pumpType: 'homemade', driveFlowM3s: toSI(2, 'gal/min', 'flow'), drivePipe }
 * const pump = preparePump(input, 0, 1.2192, 8.8392, 1.306e-6, 0.8)
 * const line = { lengthM: 30.48, insideDiameterM: 0.0158, roughnessM: 1.5e-6, sumK: 0 }
 * const s = solveParallel([pump, pump], 1.2192, 8.8392, line, 1.306e-6)
 * // friction at the combined ≈ 0.58 L/min is a few cm (see lineLoss) …
 * s.frictionHeadM  // ≈ 0.025 ±0.005
 * // … so S ≈ 2 × 289 mL/min, the single pump against the bare lift (estimateYield), a little less
 * fromSI(s.combinedFlowM3s, 'mL/min', 'flow')  // ≈ 576 ±1%
 * // two copies of one pump are the same as the pump twice
 * solveParallel([pump], 1.2192, 8.8392, line, 1.306e-6, [2]).combinedFlowM3s / s.combinedFlowM3s  // ≈ 1 ±1e-9
 */
export function solveParallel(
  pumps: readonly PreparedPump[],
  fallM: number,
  liftM: number,
  line: LineSpec,
  nu: number,
  copies?: readonly number[],
): ParallelSolution {
  const total = (hp: number) => {
    let s = 0;
    let i = 0;
    for (const p of pumps) s += (copies?.[i++] ?? 1) * pumpDelivery(p, hp, fallM);
    return s;
  };
  const headAt = (S: number) =>
    liftM + pipeHeadLoss(S, line.lengthM, line.insideDiameterM, line.roughnessM, nu, line.sumK);
  // F(S) = total(head(S)) − S is decreasing; F(0) ≥ 0, F(S0) ≤ 0 with S0 = total(lift).
  let a = 0;
  let fa = total(liftM);
  let b = fa;
  let fb = total(headAt(b)) - b;
  let S = b;
  if (fa <= 0) S = 0;
  else if (fb >= 0) S = b;
  else {
    let side = 0;
    for (let i = 0; i < 100; i++) {
      S = (a * fb - b * fa) / (fb - fa);
      const fS = total(headAt(S)) - S;
      if (Math.abs(fS) <= 1e-14 + 1e-10 * S || Math.abs(b - a) < 1e-15) break;
      if (fS * fb > 0) {
        b = S;
        fb = fS;
        if (side === -1) fa /= 2;
        side = -1;
      } else {
        a = S;
        fa = fS;
        if (side === 1) fb /= 2;
        side = 1;
      }
    }
  }
  const loss = lineLoss(line, S, nu);
  const hp = liftM + loss.frictionHeadM + loss.minorHeadM;
  const atHead = pumps.map((p) => pumpAtHead(p, hp, fallM));
  return {
    combinedFlowM3s: atHead.reduce((x, y, i) => x + (copies?.[i] ?? 1) * y.deliveredFlowM3s, 0),
    pumpHeadM: hp,
    frictionHeadM: loss.frictionHeadM,
    minorHeadM: loss.minorHeadM,
    pumps: atHead,
    loss,
  };
}

/**
 * Highest lift the array can reach, m: the largest maxLiftRatio·H_eff over its
 * running pumps. Parallel pumps add flow, not height, so this never grows with
 * the number of pumps. Reference: maxLiftRatio (Building Trades Pocketbook table, efficiency.ts).
 * @example homemade pumps (r_max = 26) with H_eff = 1.2192 m and 1.1226 m: 26 × 1.2192
 * const pump = {
 *   label: 'a', pumpType: 'homemade', driveFlowM3s: 1.2618e-4, driveFlowEstimated: false,
 *   closureVelocityMs: 1.124, fittingsK: 0, fittingHeadLossM: 0, effectiveFallM: 1.2192,
 * }
 * arrayMaxLift([pump, { ...pump, effectiveFallM: 1.1226 }], 1.2192)  // ≈ 31.699
 * arrayMaxLift([pump, pump, pump], 1.2192)  // ≈ 31.699
 */
export function arrayMaxLift(pumps: readonly PreparedPump[], fallM: number): number {
  let best = 0;
  for (const p of pumps) if (pumpRuns(p, fallM)) best = Math.max(best, maxLiftRatio(p.pumpType) * p.effectiveFallM);
  return best;
}
