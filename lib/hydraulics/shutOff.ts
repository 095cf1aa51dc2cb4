/**
 * Shut-off (dead-head) pressure: what a ram builds against a closed delivery.
 *
 * With the delivery shut, every beat still pushes a little water through the
 * delivery valve into the chamber, so the chamber climbs until it matches the
 * highest pressure the drive pipe can make at the waste valve: the static
 * supply head plus the surge of the stopped column. It cannot go higher,
 * because at that pressure the delivery valve no longer opens. Closing the
 * isolating valve therefore does not relieve anything while the ram beats;
 * it charges the chamber toward this figure.
 *
 * Surge: Joukowsky's Δp = ρ·c·Δv for a closure faster than the wave round
 * trip 2L/c; for a slower closure Michaud's 2ρ·L·Δv/t_c, never more than the
 * Joukowsky value (transients.ts).
 * Reference: Joukowsky, N. (1900) and Michaud, J. (1878), as given in Wylie,
 * E.B., Streeter, V.L. & Suo, L. (1993), Fluid Transients in Systems, ch. 1
 * (section from memory). That the chamber tends to the peak of the drive
 * pipe's surge is the energy argument above; no published derivation was found
 * in the references searched.
 */
import * as z from 'zod/mini';
import { MATERIAL_PROPS } from './pipes';
import { drivePipeSchema, roughnessOf } from './pipeSchemas';
import { EngineInputError } from './errors';
import { sumK, type Fitting } from './fittings';
import { fullFlowVelocity } from './ramCycle';
import { addRangeIssue, fallM, flowM3s, parseInput, siNumber, waterTempC } from './schemaKit';
import { finish, step, sub, tq, type CalcOutput, type Step, type Warning } from './steps';
import { joukowskySurge, slowClosureSurge, waveRoundTrip, waveSpeed } from './transients';
import { G, waterProperties } from './water';

/**
 * Shut-off pressure, Pa: p = ρ·g·H + Δp, with Δp = ρ·c·v (t_c ≤ 2L/c or no
 * closure time given) or min(ρ·c·v, 2ρ·L·v/t_c) (slower closure).
 * Units: ρ kg/m³, H m, L m, c m/s, v m/s, t_c s; returns Pa (gauge).
 * Range: rigid or flexible pipe, H ≤ 100 m.
 * Reference: module comment (Joukowsky 1900, Michaud 1878).
 * @example 1" sch 40 PVC, c = 548 m/s, 20 ft (6.096 m), H = 4 ft (1.2192 m), v = 1.57 m/s, ρ = 999.7
 * // sudden: 999.7 × 9.80665 × 1.2192 + 999.7 × 548 × 1.57 = 11 953 + 860 102
 * shutOffPressure(999.7, 1.2192, 6.096, 548, 1.57)  // ≈ 872055
 * // a 0.1 s closure is slower than 2L/c = 0.0222 s: Michaud 2 × 999.7 × 6.096 × 1.57/0.1 = 191 357
 * shutOffPressure(999.7, 1.2192, 6.096, 548, 1.57, 0.1)  // ≈ 203310
 */
export function shutOffPressure(
  densityKgM3: number,
  fallM: number,
  lengthM: number,
  waveSpeedMs: number,
  closureVelocityMs: number,
  closureTimeS?: number,
): number {
  const surge =
    closureTimeS === undefined
      ? joukowskySurge(densityKgM3, waveSpeedMs, closureVelocityMs)
      : slowClosureSurge(densityKgM3, lengthM, closureVelocityMs, closureTimeS, waveSpeedMs);
  return densityKgM3 * G * fallM + surge;
}

export const shutOffSchema = z
  .object({
    fallM: fallM(),
    /** wallThicknessM is required here (fill it from resolvePipe) */
    drivePipe: drivePipeSchema,
    /** velocity in the drive pipe when the waste valve shuts, m/s; omit for the full-flow velocity (the worst case) */
    closureVelocityMs: z.optional(siNumber({ min: 0, minExclusive: true, max: 20, unit: 'm/s' })),
    /** measured drive flow, m³/s: its mean velocity is used when no closure velocity is given */
    driveFlowM3s: z.optional(flowM3s()),
    /** waste-valve closing time, s; omit for a sudden closure (the worst case) */
    valveClosureTimeS: z.optional(siNumber({ min: 0, minExclusive: true, max: 5, unit: 's' })),
    waterTempC: waterTempC(),
  })
  .check(
    z.superRefine((v, ctx) => {
      if (v.drivePipe.wallThicknessM === undefined) {
        addRangeIssue(
          ctx,
          ['drivePipe', 'wallThicknessM'],
          'is needed for the wave speed (pick a nominal size and series to fill it)',
          { min: 0.0005, max: 0.05, unit: 'm' },
        );
      }
    }),
  );

export type ShutOffInput = z.input<typeof shutOffSchema>;

export interface ShutOffResults {
  closureVelocityMs: number;
  velocityFrom: 'given' | 'drive-flow' | 'full-flow';
  waveSpeedMs: number;
  roundTripS: number;
  /** 'sudden' when the closure is at most 2L/c (or not given) */
  closure: 'sudden' | 'slow';
  staticPressurePa: number;
  surgePa: number;
  shutOffPressurePa: number;
  shutOffHeadM: number;
}

/**
 * Estimates the pressure a ram reaches against a closed delivery line.
 *
 * Formulas: c by Korteweg (transients.ts); t_r = 2L/c; Δp = ρ·c·v (t_c ≤ t_r
 * or t_c not given) else min(ρ·c·v, 2ρ·L·v/t_c); p = ρ·g·H + Δp. The
 * velocity is the one given, else the mean of the drive flow, else the
 * full-flow velocity √(2gH/R) of ramCycle.ts (the highest the pipe can reach).
 * Units: SI. Range: H ≤ 100 m, L ≤ 500 m.
 * Reference: module comment.
 * @example 20 ft of 1" sch 40 PVC at a 4 ft fall, valve shutting at 1.2 m/s
 * const p = resolvePipe('pvc-sch40', '1')
 * const drivePipe = { lengthM: 6.096, insideDiameterM: p.insideDiameterM, wallThicknessM: p.wallThicknessM, material: 'pvc' }
 * const r = estimateShutOffPressure({ fallM: 1.2192, drivePipe, closureVelocityMs: 1.2 }).results
 * r.waveSpeedMs  // ≈ 548
 * // 999.7 × 548 × 1.2 = 657 400 Pa, plus 11 953 Pa of fall
 * r.shutOffPressurePa  // ≈ 669400 ±0.2%
 * fromSI(r.shutOffPressurePa, 'psi', 'pressure')  // ≈ 97 ±1
 */
export function estimateShutOffPressure(input: ShutOffInput): CalcOutput<ShutOffResults> {
  const v = parseInput(shutOffSchema, input);
  const dp = v.drivePipe;
  const e = dp.wallThicknessM;
  if (e === undefined) throw new EngineInputError([{ field: 'drivePipe.wallThicknessM', message: 'is needed' }]);
  const water = waterProperties(v.waterTempC);
  const rho = water.densityKgM3;
  const H = v.fallM;
  const L = dp.lengthM;
  const D = dp.insideDiameterM;
  const mat = MATERIAL_PROPS[dp.material];
  const steps: Step[] = [];
  const warnings: Warning[] = [];

  let vel: number;
  let from: ShutOffResults['velocityFrom'];
  if (v.closureVelocityMs !== undefined) {
    vel = v.closureVelocityMs;
    from = 'given';
  } else if (v.driveFlowM3s !== undefined) {
    vel = v.driveFlowM3s / ((Math.PI * D * D) / 4);
    from = 'drive-flow';
    steps.push(
      step(
        'Velocity from the drive flow',
        'v = \\frac{4Q}{\\pi D^2}',
        sub`v = \\frac{4 \\times ${tq(v.driveFlowM3s, 'm³/s')}}{\\pi \\times (${tq(D, 'm', 'smallLength')})^2}`,
        vel,
        'm/s',
        'velocity',
      ),
    );
  } else {
    const ff = fullFlowVelocity({
      fallM: H,
      pumpHeadM: 2 * H,
      lengthM: L,
      insideDiameterM: D,
      roughnessM: roughnessOf(dp),
      nu: water.kinematicViscosityM2s,
      fittingsK: sumK(dp.fittings as Fitting[]),
    });
    vel = ff.v0;
    from = 'full-flow';
    steps.push(
      step(
        'Full-flow velocity (the most the pipe can reach)',
        'v_0 = \\sqrt{\\frac{2gH}{R}}',
        sub`v_0 = \\sqrt{\\frac{2 \\times ${tq(G, 'm/s²')} \\times ${tq(H, 'm')}}{${tq(ff.R)}}}`,
        vel,
        'm/s',
        'velocity',
      ),
    );
  }

  const wave = waveSteps({ insideDiameterM: D, wallThicknessM: e, lengthM: L }, mat, water.bulkModulusPa, rho);
  steps.push(...wave.steps);
  const c = wave.c;
  const tr = wave.roundTripS;
  const slow = v.valveClosureTimeS !== undefined && v.valveClosureTimeS > tr;
  const stat = rho * G * H;
  const total = shutOffPressure(rho, H, L, c, vel, v.valveClosureTimeS);
  const surge = total - stat;
  if (slow && v.valveClosureTimeS !== undefined) {
    steps.push(
      step(
        'Surge for a closure slower than 2L/c (Michaud)',
        '\\Delta p = \\frac{2\\rho L v}{t_c}',
        sub`\\Delta p = \\frac{2 \\times ${tq(rho, 'kg/m³')} \\times ${tq(L, 'm')} \\times ${tq(vel, 'm/s')}}{${tq(v.valveClosureTimeS, 's')}}`,
        surge,
        'Pa',
        'pressure',
      ),
    );
  } else {
    steps.push(
      step(
        'Surge for a closure within 2L/c (Joukowsky)',
        '\\Delta p = \\rho\\,c\\,v',
        sub`\\Delta p = ${tq(rho, 'kg/m³')} \\times ${tq(c, 'm/s')} \\times ${tq(vel, 'm/s')}`,
        surge,
        'Pa',
        'pressure',
      ),
    );
  }
  steps.push(
    step(
      'Shut-off pressure against a closed delivery',
      'p_{so} = \\rho g H + \\Delta p',
      sub`p_{so} = ${tq(stat, 'Pa')} + ${tq(surge, 'Pa')}`,
      total,
      'Pa',
      'pressure',
      'The chamber charges toward this at every beat while the delivery is shut; stop the ram before isolating, and bleed through a valve of its own while watching a gauge.',
    ),
  );

  return finish(
    {
      closureVelocityMs: vel,
      velocityFrom: from,
      waveSpeedMs: c,
      roundTripS: tr,
      closure: slow ? 'slow' : 'sudden',
      staticPressurePa: stat,
      surgePa: surge,
      shutOffPressurePa: total,
      shutOffHeadM: total / (rho * G),
    },
    steps,
    warnings,
  );
}

/**
 * The pressure wave in a drive pipe, with its two working steps: Korteweg's wave speed
 * c = √((K/ρ)/(1 + K·D/(E·e))) and the round trip t_r = 2L/c (m/s and s; D, e, L in m,
 * K and E in Pa, ρ in kg/m³). Shared by the drive pipe check and the shut-off estimate
 * so both show the same working. References as for {@link waveSpeed}.
 * @example 20 ft of 1" sch 40 PVC, water at 20 °C (as in waveSpeed's example)
 * waveSteps({ insideDiameterM: 0.02664, wallThicknessM: 0.003378, lengthM: 6.1 }, { label: 'PVC', youngsModulusPa: 2.76e9, source: 'typical' }, 2.19e9, 998.2).c  // ≈ 550
 * waveSteps({ insideDiameterM: 0.02664, wallThicknessM: 0.003378, lengthM: 6.1 }, { label: 'PVC', youngsModulusPa: 2.76e9, source: 'typical' }, 2.19e9, 998.2).roundTripS  // ≈ 0.0222
 */
export function waveSteps(
  pipe: { insideDiameterM: number; wallThicknessM: number; lengthM: number },
  mat: { label: string; youngsModulusPa: number; source: string },
  bulkModulusPa: number,
  densityKgM3: number,
): { c: number; roundTripS: number; steps: [Step, Step] } {
  const { insideDiameterM: D, wallThicknessM: e, lengthM: L } = pipe;
  const K = bulkModulusPa;
  const c = waveSpeed(K, densityKgM3, D, mat.youngsModulusPa, e);
  const roundTripS = waveRoundTrip(L, c);
  return {
    c,
    roundTripS,
    steps: [
      step(
        'Pressure-wave speed (Korteweg)',
        'c = \\sqrt{\\frac{K/\\rho}{1 + \\frac{K D}{E e}}}',
        sub`c = \\sqrt{\\frac{${tq(K, 'Pa', 'modulus')}/${tq(densityKgM3, 'kg/m³')}}{1 + \\frac{${tq(K, 'Pa', 'modulus')} \\times ${tq(D, 'm', 'smallLength')}}{${tq(mat.youngsModulusPa, 'Pa', 'modulus')} \\times ${tq(e, 'm', 'smallLength')}}}}`,
        c,
        'm/s',
        'velocity',
        `E for ${mat.label}: ${mat.source}.`,
      ),
      step(
        'Wave round trip',
        't_r = \\frac{2L}{c}',
        sub`t_r = \\frac{2 \\times ${tq(L, 'm')}}{${tq(c, 'm/s')}}`,
        roundTripS,
        's',
        'time',
      ),
    ],
  };
}
