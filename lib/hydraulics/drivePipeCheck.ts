/**
 * Drive pipe check: length against fall and bore, full-flow velocity, the
 * pressure wave and its surge against the pipe's rating, and whether the
 * material is stiff enough to carry the wave.
 */
import * as z from 'zod/mini';
import { sumK, type Fitting } from './fittings';
import { MATERIAL_PROPS, PIPE_SERIES } from './pipes';
import { jointRating, pvcFatigue, type JointRating, type PvcFatigue } from './pipeRatings';
import { shutOffPressure, waveSteps } from './shutOff';
import { drivePipeSchema, roughnessOf } from './pipeSchemas';
import { EngineInputError } from './errors';
import { DEFAULT_ENTRANCE_K, DEFAULT_PUMP_LOSS_K, fullFlowVelocity } from './ramCycle';
import { addRangeIssue, fallM, flowM3s, liftM, parseInput, siNumber, waterTempC } from './schemaKit';
import { finish, step, sub, tq, type CalcOutput, type Step, type Warning } from './steps';
import { joukowskySurge, slowClosureSurge } from './transients';
import { PRACTICE } from './practice';
import { warn } from './warnings';
import { qty, say } from './message';
import { G, waterProperties } from './water';

/**
 * Guidance on drive-pipe length, one rule each: L/H 5–10 (PRACTICE: the range
 * ram guides repeat; no published source found) and L/D 150–1000 (Calvert's
 * drive-pipe tests as cited in ram handbooks, from memory). The Building
 * Trades Pocketbook's 25–50 ft of drive pipe is the one published length
 * found; it is returned beside them (PRACTICE.driveLengthMinM/MaxM).
 */
export const DRIVE_PIPE_GUIDES = [
  {
    id: 'length-to-fall',
    ratio: 'L/H',
    min: PRACTICE.driveLengthToFallMin.value,
    max: PRACTICE.driveLengthToFallMax.value,
    source: PRACTICE.driveLengthToFallMin.source,
  },
  {
    id: 'length-to-diameter',
    ratio: 'L/D',
    min: 150,
    max: 1000,
    source: 'Calvert, drive-pipe experiments, as cited in ram handbooks (from memory)',
  },
] as const;

/** Margin wanted between the weakest rating and the peak (PRACTICE.ratingMargin: common practice, no published source found). */
export const RATING_MARGIN = PRACTICE.ratingMargin;

/**
 * Beats per minute assumed for the fatigue life when none is given: 60, inside
 * the 40–120 a small ram usually beats at (PRACTICE: common practice, no published source found).
 */
export const DEFAULT_BEATS_PER_MINUTE = 60;
export const BEATS_PER_MINUTE_RANGE = {
  min: PRACTICE.beatsPerMinuteMin.value,
  max: PRACTICE.beatsPerMinuteMax.value,
  source: PRACTICE.beatsPerMinuteMin.source,
} as const;

/** Design life a PVC drive pipe's fatigue life is held against, years (common practice, no published source found). */
export const FATIGUE_DESIGN_LIFE_YEARS = 50;

export const drivePipeCheckSchema = z
  .object({
    fallM: fallM(),
    /** lift, m; used for the pressure in the pump body while delivering */
    liftM: z.optional(liftM()),
    /** wallThicknessM and pressureRatingPa are required here (fill them from resolvePipe) */
    drivePipe: drivePipeSchema,
    /** measured drive flow, m³/s, for the mean velocity */
    driveFlowM3s: z.optional(flowM3s()),
    /** waste-valve closing time, s; omit for a sudden closure (the worst case) */
    valveClosureTimeS: z.optional(siNumber({ min: 0, minExclusive: true, max: 5, unit: 's' })),
    /** velocity when the waste valve shuts, m/s, for the shut-off pressure; omit for the full-flow velocity (the worst case) */
    closureVelocityMs: z.optional(siNumber({ min: 0, minExclusive: true, max: 20, unit: 'm/s' })),
    /** the series the drive pipe is, so its joints can be rated (threaded sch 40 PVC is refused) */
    series: z.optional(z.enum(PIPE_SERIES)),
    /** how the drive pipe's joints are made */
    joints: z._default(z.enum(['plain', 'threaded']), 'plain'),
    /** beats per minute, for the fatigue life of a PVC drive pipe */
    beatsPerMinute: z._default(siNumber({ min: 10, max: 300, unit: '1/min' }), DEFAULT_BEATS_PER_MINUTE),
    /** required ratio of pipe rating to peak pressure */
    requiredMargin: z._default(siNumber({ min: 1, max: 5, unit: '' }), RATING_MARGIN.value),
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
      } else if (v.drivePipe.wallThicknessM > v.drivePipe.insideDiameterM) {
        addRangeIssue(ctx, ['drivePipe', 'wallThicknessM'], 'is not plausible for this bore', {
          min: 0.0005,
          max: v.drivePipe.insideDiameterM,
          unit: 'm',
        });
      }
      if (v.drivePipe.pressureRatingPa === undefined) {
        addRangeIssue(
          ctx,
          ['drivePipe', 'pressureRatingPa'],
          'is needed to check the surge (it is printed on the pipe, or pick a series)',
          { min: 1e4, max: 1e8, unit: 'Pa' },
        );
      }
      if (v.liftM !== undefined && v.liftM <= v.fallM) {
        addRangeIssue(ctx, ['liftM'], say`must be greater than the fall (${qty('length', v.fallM)})`, {
          min: v.fallM,
          minExclusive: true,
          max: 1000,
          unit: 'm',
        });
      }
    }),
  );

export type DrivePipeCheckInput = z.input<typeof drivePipeCheckSchema>;

export interface DrivePipeGuideResult {
  id: string;
  ratio: 'L/H' | 'L/D';
  min: number;
  max: number;
  value: number;
  within: boolean;
  source: string;
}

export interface DrivePipeCheckResults {
  lengthToFall: number;
  lengthToDiameter: number;
  guides: DrivePipeGuideResult[];
  fullFlowVelocityMs: number;
  meanVelocityMs?: number;
  waveSpeedMs: number;
  rigidWaveSpeedMs: number;
  roundTripS: number;
  surgePa: number;
  surgeHeadM: number;
  staticPressurePa: number;
  peakPressurePa: number;
  deliveryPressurePa?: number;
  pressureRatingPa: number;
  /** rating ÷ peak */
  ratingMargin: number;
  rigid: boolean;
  youngsModulusPa: number;
  /** pressure the ram reaches against a closed delivery (shutOff.ts), Pa */
  shutOffPressurePa: number;
  shutOffVelocityFrom: 'given' | 'full-flow';
  /** the joints' rating when series and joints are given */
  joint?: JointRating;
  /** the lower of the pipe's and its joints' ratings, Pa */
  weakestRatingPa: number;
  weakestIs: 'pipe' | 'threaded joint';
  /** weakest rating ÷ shut-off pressure */
  shutOffMargin: number;
  /** PVC only: Vinson's cyclic life at the shut-off pressure and the beats per minute */
  fatigue?: PvcFatigue & { beatsPerMinute: number };
}

/**
 * Checks a drive pipe.
 *
 * Formulas: L/H and L/D against {@link DRIVE_PIPE_GUIDES}; full-flow velocity
 * v₀ = √(2gH/R), R = 1 + K_e + K_p + ΣK + f·L/D (ramCycle.ts); Korteweg wave speed
 * c = √((K/ρ)/(1 + K·D/(E·e))); Joukowsky surge Δp = ρ·c·v₀ (sudden closure at
 * full flow, the worst case — a float valve that shuts the delivery line does
 * this); peak = ρ·g·H + Δp against the rating; round trip 2L/c; shut-off
 * pressure at the closure velocity (shutOff.ts) against the weaker of the pipe
 * and its joints (pipeRatings.ts); for PVC, Vinson's cycles to failure at that
 * peak and the years they last at the beat rate.
 * Units: SI. Range: H ≤ 100 m, L ≤ 500 m.
 * Reference: Korteweg (1878) and Joukowsky (1900) as in Wylie, Streeter & Suo,
 * Fluid Transients in Systems (1993); guidance sources in DRIVE_PIPE_GUIDES.
 * @example a cabin's seasonal creek, 4 ft (1.2192 m) fall, 20 ft (6.096 m) of 1" sch 40 PVC
 * // D = 26.64 mm, e = 3.378 mm, rated 450 psi
 * const p = resolvePipe('pvc-sch40', '1')
 * const drivePipe = {
 *   lengthM: 6.096, insideDiameterM: p.insideDiameterM, wallThicknessM: p.wallThicknessM,
 *   pressureRatingPa: p.pressureRatingPa, material: 'pvc',
 * }
 * const r = checkDrivePipe({ fallM: 1.2192, drivePipe }).results
 * r.lengthToFall  // ≈ 5.0
 * r.lengthToDiameter  // ≈ 229
 * r.fullFlowVelocityMs  // ≈ 1.57
 * // at 10 °C K = 2.093 GPa, ρ = 999.7
 * waterProperties(10).bulkModulusPa  // ≈ 2.093e9
 * r.waveSpeedMs  // ≈ 548
 * // Δp = 999.7 × 548 × 1.57
 * r.surgePa  // ≈ 0.86e6
 * fromSI(r.surgePa, 'psi', 'pressure')  // ≈ 124 ±1
 * r.peakPressurePa  // ≈ 0.87e6
 * // margin 3.10 MPa / 0.87 MPa
 * r.pressureRatingPa  // ≈ 3.10e6
 * r.ratingMargin  // ≈ 3.6
 * // against a closed delivery the chamber charges to the same peak (full-flow velocity, sudden closure)
 * r.shutOffPressurePa  // ≈ 0.87e6
 * // PVC fatigue (Vinson): DR = 33.40/3.378 = 9.89, S = 0.870 MPa × 8.89/2 = 3.87 MPa (561 psi)
 * r.fatigue.cyclesToFailure  // ≈ 1.65e8 ±1%
 * // at 60 beats a minute, 31.6 million a year
 * r.fatigue.yearsToFailure  // ≈ 5.2 ±2%
 */
export function checkDrivePipe(input: DrivePipeCheckInput): CalcOutput<DrivePipeCheckResults> {
  const v = parseInput(drivePipeCheckSchema, input);
  const dp = v.drivePipe;
  const water = waterProperties(v.waterTempC);
  const rho = water.densityKgM3;
  const H = v.fallM;
  const L = dp.lengthM;
  const D = dp.insideDiameterM;
  const e = dp.wallThicknessM;
  const rating = dp.pressureRatingPa;
  // the schema's refinement already refuses both; this keeps the types honest
  if (e === undefined || rating === undefined) {
    const field = e === undefined ? 'drivePipe.wallThicknessM' : 'drivePipe.pressureRatingPa';
    throw new EngineInputError([{ field, message: 'is needed' }]);
  }
  const mat = MATERIAL_PROPS[dp.material];
  const steps: Step[] = [];
  const warnings: Warning[] = [];

  const lh = L / H;
  const ld = L / D;
  steps.push(step('Length against fall', '\\frac{L}{H}', sub`\\frac{${tq(L, 'm')}}{${tq(H, 'm')}}`, lh, ''));
  steps.push(
    step('Length against bore', '\\frac{L}{D}', sub`\\frac{${tq(L, 'm')}}{${tq(D, 'm', 'smallLength')}}`, ld, ''),
  );
  const guides: DrivePipeGuideResult[] = DRIVE_PIPE_GUIDES.map((g) => {
    const value = g.ratio === 'L/H' ? lh : ld;
    return {
      id: g.id,
      ratio: g.ratio,
      min: g.min,
      max: g.max,
      value,
      within: value >= g.min && value <= g.max,
      source: g.source,
    };
  });
  const lhMin = PRACTICE.driveLengthToFallMin.value;
  const lhMax = PRACTICE.driveLengthToFallMax.value;
  const rule = `${lhMin}–${lhMax} times the fall (${PRACTICE.driveLengthToFallMin.source})`;
  // a pipe laid at exactly 10 × the fall (the site plan's longest) is inside the rule: no float noise
  const EPS = 1e-9;
  if (lh < lhMin * (1 - EPS)) {
    warnings.push(
      warn(
        'drive-length-short-for-fall',
        `The drive pipe is ${lh.toFixed(1)} times the fall; the engine asks for ${rule}. A short pipe returns the pressure wave too soon for a strong beat.`,
      ),
    );
  } else if (lh > lhMax * (1 + EPS)) {
    warnings.push(
      warn(
        'drive-length-long-for-fall',
        `The drive pipe is ${lh.toFixed(1)} times the fall, longer than the engine's ${rule}; friction eats the fall and the beat slows. Consider a standpipe or a larger bore.`,
      ),
    );
  }
  if (ld < 150)
    warnings.push(
      warn(
        'drive-ld-low',
        `The drive pipe is only ${ld.toFixed(0)} bores long (guide: 150–1000); too little water mass to drive a strong beat.`,
      ),
    );
  if (ld > 1000)
    warnings.push(
      warn(
        'drive-ld-high',
        `The drive pipe is ${ld.toFixed(0)} bores long (guide: 150–1000); friction will rob the fall — a larger bore suits this length.`,
      ),
    );

  const ff = fullFlowVelocity({
    fallM: H,
    pumpHeadM: v.liftM ?? 2 * H,
    lengthM: L,
    insideDiameterM: D,
    roughnessM: roughnessOf(dp),
    nu: water.kinematicViscosityM2s,
    fittingsK: sumK(dp.fittings as Fitting[]),
  });
  const v0 = ff.v0;
  steps.push(
    step(
      'Full-flow velocity (waste valve held open)',
      'v_0 = \\sqrt{\\frac{2gH}{1 + K_e + K_p + \\Sigma K + f\\,L/D}}',
      sub`v_0 = \\sqrt{\\frac{2 \\times ${tq(G, 'm/s²')} \\times ${tq(H, 'm')}}{1 + ${DEFAULT_ENTRANCE_K} + ${DEFAULT_PUMP_LOSS_K} + ${tq(sumK(dp.fittings as Fitting[]))} + ${tq(ff.f)} \\times ${tq(ld)}}}`,
      v0,
      'm/s',
      'velocity',
      'Entrance and pump-body loss coefficients: Munson Table 8.2 (from memory).',
    ),
  );
  let meanV: number | undefined;
  if (v.driveFlowM3s !== undefined) {
    meanV = v.driveFlowM3s / ((Math.PI * D * D) / 4);
    steps.push(
      step(
        'Mean velocity from the measured drive flow',
        '\\bar v = \\frac{4Q}{\\pi D^2}',
        sub`\\bar v = \\frac{4 \\times ${tq(v.driveFlowM3s, 'm³/s')}}{\\pi \\times (${tq(D, 'm', 'smallLength')})^2}`,
        meanV,
        'm/s',
        'velocity',
      ),
    );
  }

  const K = water.bulkModulusPa;
  const cRigid = Math.sqrt(K / rho);
  const wave = waveSteps({ insideDiameterM: D, wallThicknessM: e, lengthM: L }, mat, K, rho);
  steps.push(...wave.steps);
  const c = wave.c;
  const t2 = wave.roundTripS;

  const surge =
    v.valveClosureTimeS === undefined
      ? joukowskySurge(rho, c, v0)
      : slowClosureSurge(rho, L, v0, v.valveClosureTimeS, c);
  steps.push(
    step(
      'Surge (Joukowsky) for a stop from full flow',
      '\\Delta p = \\rho\\,c\\,\\Delta v',
      sub`\\Delta p = ${tq(rho, 'kg/m³')} \\times ${tq(c, 'm/s')} \\times ${tq(v0, 'm/s')}`,
      surge,
      'Pa',
      'pressure',
      v.valveClosureTimeS !== undefined && v.valveClosureTimeS > t2
        ? `Closure slower than 2L/c: Michaud's 2ρLΔv/t_c used.`
        : undefined,
    ),
  );
  if (v.valveClosureTimeS !== undefined && v.valveClosureTimeS > t2) {
    warnings.push(
      warn(
        'valve-closure-slow',
        `The waste valve closes in ${v.valveClosureTimeS.toFixed(3)} s, slower than the wave round trip of ${t2.toFixed(3)} s, so only part of the surge builds up and the beat is weak. A lighter, shorter-stroke valve or a longer drive pipe helps.`,
      ),
    );
  }
  const stat = rho * G * H;
  const peak = stat + surge;
  steps.push(
    step(
      'Peak pressure at the pump',
      'p_{peak} = \\rho g H + \\Delta p',
      sub`p_{peak} = ${tq(stat, 'Pa')} + ${tq(surge, 'Pa')}`,
      peak,
      'Pa',
      'pressure',
    ),
  );
  const margin = rating / peak;
  steps.push(
    step(
      'Rating margin',
      'm = \\frac{p_{rating}}{p_{peak}}',
      sub`m = \\frac{${tq(rating, 'Pa')}}{${tq(peak, 'Pa')}}`,
      margin,
      '',
    ),
  );
  const kPa = (p: number) => qty('pressure', p);
  if (peak > rating) {
    warnings.push(
      warn(
        'surge-exceeds-rating',
        say`A sudden stop from full flow can reach ${kPa(peak)}, above the pipe's rating of ${kPa(rating)}; the drive pipe or its fittings can burst.`,
      ),
    );
  } else if (margin < v.requiredMargin) {
    warnings.push(
      warn(
        'surge-margin-low',
        say`The peak of ${kPa(peak)} leaves a margin of only ${margin.toFixed(2)} on the ${kPa(rating)} rating (wanted ${v.requiredMargin}; ${RATING_MARGIN.source}); the pipe sees this surge at every beat, and fatigue adds up.`,
      ),
    );
  }
  const vClose = v.closureVelocityMs ?? v0;
  const shutOff = shutOffPressure(rho, H, L, c, vClose, v.valveClosureTimeS);
  steps.push(
    step(
      'Shut-off pressure against a closed delivery',
      'p_{so} = \\rho g H + \\Delta p(v_c)',
      sub`p_{so} = ${tq(stat, 'Pa')} + ${tq(shutOff - stat, 'Pa')}`,
      shutOff,
      'Pa',
      'pressure',
      'The chamber charges toward this at every beat while the delivery is shut (shutOff.ts).',
    ),
  );
  const joint = v.series === undefined ? undefined : jointRating(v.series, rating, v.joints);
  const jointWeaker = joint !== undefined && joint.allowed && joint.ratingPa < rating;
  const weakest = jointWeaker ? joint.ratingPa : rating;
  if (joint && !joint.allowed && v.joints === 'threaded') {
    warnings.push(warn('threaded-joint-refused', `Threaded joints in this drive pipe: ${joint.note}.`));
  } else if (shutOff > weakest) {
    warnings.push(
      warn(
        'shut-off-exceeds-rating',
        say`Against a closed delivery the ram can charge its chamber to ${kPa(shutOff)}, above the ${jointWeaker ? "threaded joints' " : ''}rating of ${kPa(weakest)}. Fit a relief valve set below that rating and a gauge on the pump side, and never leave the ram beating against a shut valve.`,
      ),
    );
  }
  let fatigue: DrivePipeCheckResults['fatigue'];
  if (dp.material === 'pvc') {
    const od = D + 2 * e;
    const f = pvcFatigue(shutOff, od, e, v.beatsPerMinute);
    fatigue = { ...f, beatsPerMinute: v.beatsPerMinute };
    steps.push(
      step(
        'Hoop stress at the peak',
        'S = \\frac{p\\,(DR - 1)}{2},\\ DR = \\frac{OD}{e}',
        sub`S = \\frac{${tq(shutOff, 'Pa')} \\times (${tq(od / e)} - 1)}{2}`,
        f.hoopStressPa,
        'Pa',
        'pressure',
      ),
    );
    steps.push(
      step(
        'Cycles to failure (Vinson)',
        'N = 5.05\\times10^{21}\\,S_{psi}^{-4.906}',
        sub`N = 5.05\\times10^{21} \\times ${tq(f.hoopStressPa / 6894.757)}^{-4.906}`,
        f.cyclesToFailure,
        '',
        undefined,
        f.source,
      ),
    );
    steps.push(
      step(
        'Years at this beat rate',
        't = \\frac{N}{n \\times 525\\,960}',
        sub`t = \\frac{${tq(f.cyclesToFailure)}}{${tq(v.beatsPerMinute)} \\times 525\\,960}`,
        f.yearsToFailure,
        'yr',
      ),
    );
    if (f.yearsToFailure < FATIGUE_DESIGN_LIFE_YEARS) {
      warnings.push(
        warn(
          'fatigue-life-short',
          `At ${v.beatsPerMinute} beats a minute the drive pipe sees ${(f.beatsPerYear / 1e6).toFixed(0)} million pressure cycles a year; by Vinson's fatigue curve for PVC it may crack after about ${f.yearsToFailure < 1 ? 'less than a year' : `${f.yearsToFailure.toFixed(0)} years`}. A thicker wall (schedule 80) or steel lasts longer.`,
        ),
      );
    }
  }

  if (!mat.rigid) {
    warnings.push(
      warn(
        'flexible-drive-pipe',
        say`${mat.label} stretches under the surge: the wave travels at ${qty('velocity', c)} instead of about ${qty('velocity', cRigid)} in a rigid pipe, and the pipe soaks up the energy the pump needs. Use steel or PVC for the drive pipe.`,
      ),
    );
  }

  const results: DrivePipeCheckResults = {
    lengthToFall: lh,
    lengthToDiameter: ld,
    guides,
    fullFlowVelocityMs: v0,
    waveSpeedMs: c,
    rigidWaveSpeedMs: cRigid,
    roundTripS: t2,
    surgePa: surge,
    surgeHeadM: surge / (rho * G),
    staticPressurePa: stat,
    peakPressurePa: peak,
    pressureRatingPa: rating,
    ratingMargin: margin,
    rigid: mat.rigid,
    youngsModulusPa: mat.youngsModulusPa,
    shutOffPressurePa: shutOff,
    shutOffVelocityFrom: v.closureVelocityMs === undefined ? 'full-flow' : 'given',
    weakestRatingPa: weakest,
    weakestIs: jointWeaker ? 'threaded joint' : 'pipe',
    shutOffMargin: weakest / shutOff,
  };
  if (joint) results.joint = joint;
  if (fatigue) results.fatigue = fatigue;
  if (meanV !== undefined) results.meanVelocityMs = meanV;
  if (v.liftM !== undefined) results.deliveryPressurePa = rho * G * v.liftM;
  return finish(results, steps, warnings);
}
