/**
 * Array planner: rams in parallel into one delivery line, and rams in
 * stages (lower pumps fill a tank that drives an upper pump).
 */
import * as z from 'zod/mini';
import { PUMP_TYPES } from './efficiency';
import { EngineInputError } from './errors';
import { drivePipeSchema, pipeRunSchema } from './pipeSchemas';
import {
  arrayMaxLift,
  lineSpec,
  preparePump,
  pumpAtHead,
  pumpRuns,
  solveParallel,
  type ParallelSolution,
  type PumpAtHead,
  type PumpInput,
} from './parallelPumps';
import { DEFAULT_CLOSURE_RATIO } from './ramCycle';
import { addRangeIssue, efficiency, fallM, flowM3s, liftM, parseInput, siNumber, waterTempC } from './schemaKit';
import { finish, joinParts, step, sub, tq, type CalcOutput, type Step, type Warning } from './steps';
import { PRACTICE } from './practice';
import { warn } from './warnings';
import { qty, say } from './message';
import { G, waterProperties } from './water';

/**
 * Limits of the planner, one value each: up to 20 pumps listed one by one, and
 * a staged search of up to 50 copies of the first pump, so the planner can say
 * how many lower pumps a stage needs even past what a form lists. Both are
 * common practice, no published source found.
 */
export const ARRAY_LIMITS = {
  pumps: 20,
  lowerCopies: 50,
  source: 'common practice, no published source found',
} as const;

export const arrayPumpSchema = z.object({
  label: z.optional(z.string().check(z.maxLength(60))),
  pumpType: z._default(z.enum(PUMP_TYPES), 'homemade'),
  /** drive flow on a straight drive pipe, m³/s; omit to estimate it from the fall and the drive pipe */
  driveFlowM3s: z.optional(flowM3s()),
  /** D'Aubuisson efficiency; omit to use the typical band */
  efficiency: z.optional(efficiency()),
  drivePipe: drivePipeSchema,
});

export const arrayPlannerSchema = z
  .object({
    fallM: fallM(),
    /** lift from the pumps to the outlet of the shared delivery line (the tank, when staged), m */
    liftM: liftM(),
    pumps: z.array(arrayPumpSchema).check(z.minLength(1), z.maxLength(ARRAY_LIMITS.pumps)),
    deliveryLine: pipeRunSchema,
    /** flow the source can spare in the driest month, m³/s */
    sourceSpareFlowM3s: z.optional(flowM3s()),
    /** waste-valve closing velocity as a share of full-flow velocity (see ramCycle.ts) */
    closureRatio: z._default(siNumber({ min: 0.3, max: 0.98, unit: '' }), DEFAULT_CLOSURE_RATIO),
    /** an upper pump driven from the tank the pumps above fill */
    staged: z.optional(
      z.object({
        /** fall from the tank's water surface down to the upper pump, m */
        upperFallM: fallM(),
        /** lift from the upper pump to its outlet, m */
        upperLiftM: liftM(),
        upperPump: arrayPumpSchema,
        upperDeliveryLine: z.optional(pipeRunSchema),
      }),
    ),
    waterTempC: waterTempC(),
  })
  .check(
    z.superRefine((v, ctx) => {
      if (v.liftM <= v.fallM) {
        addRangeIssue(ctx, ['liftM'], say`must be greater than the fall (${qty('length', v.fallM)})`, {
          min: v.fallM,
          minExclusive: true,
          max: 1000,
          unit: 'm',
        });
      }
      if (v.staged && v.staged.upperLiftM <= v.staged.upperFallM) {
        addRangeIssue(
          ctx,
          ['staged', 'upperLiftM'],
          say`must be greater than the upper fall (${qty('length', v.staged.upperFallM)})`,
          {
            min: v.staged.upperFallM,
            minExclusive: true,
            max: 1000,
            unit: 'm',
          },
        );
      }
    }),
  );

export type ArrayPlannerInput = z.input<typeof arrayPlannerSchema>;

export interface ArrayPumpResult {
  label: string;
  driveFlowM3s: number;
  driveFlowEstimated: boolean;
  closureVelocityMs: number;
  fittingsK: number;
  fittingHeadLossM: number;
  effectiveFallM: number;
  efficiency: number;
  deliveredFlowM3s: number;
  runs: boolean;
}

export interface StagedResult {
  upperDriveFlowM3s: number;
  upperDriveFlowEstimated: boolean;
  /** upper pump's delivery while running, m³/s */
  upperDeliveredFlowM3s: number;
  runsAroundTheClock: boolean;
  /** share of the day the upper pump can run on what the lower pumps deliver */
  dutyFraction: number;
  /** average delivery at the top, m³/s */
  topYieldM3s: number;
  topYieldPerDayM3PerDay: number;
  /** lower pumps like the first one needed to run the upper pump around the clock (0 if none suffice) */
  lowerPumpsNeeded: number;
}

export interface ArrayPlannerResults {
  pumps: ArrayPumpResult[];
  combinedDeliveryM3s: number;
  combinedPerDayM3PerDay: number;
  totalDriveFlowM3s: number;
  pumpHeadM: number;
  deliveryFrictionHeadM: number;
  deliveryMinorHeadM: number;
  /** delivery of the first pump alone on the same line, m³/s */
  firstPumpAloneM3s: number;
  /** combined delivery ÷ first pump alone */
  gainOverFirstPump: number;
  /** highest lift the array can reach; does not grow with the number of pumps, m */
  maxLiftM: number;
  /** total drive flow ÷ spare source flow (when given) */
  sourceShare?: number;
  staged?: StagedResult;
}

/**
 * Plans rams in parallel and in stages.
 *
 * Formulas (see parallelPumps.ts): ΔHᵢ = ΣKᵢ·v_c,ᵢ²/(2g), H_eff,ᵢ = H − ΔHᵢ,
 * qᵢ = ηᵢ·Qᵢ·H_eff,ᵢ/(h + h_f(S) + h_m(S)), S = Σqᵢ; h_f by Darcy-Weisbach with
 * Colebrook at the combined flow. Staged: the upper pump (drive flow Q_u)
 * runs around the clock when S ≥ Q_u; otherwise for S/Q_u of the time.
 * Lower pumps needed: the smallest n copies of the first pump whose combined
 * delivery reaches Q_u.
 * Units: SI (m, m³/s). Range: 1–20 pumps; H ≤ 100 m; h ≤ 1000 m.
 * Reference: D'Aubuisson relation; Darcy-Weisbach/Colebrook; fitting K from
 * Munson, Young & Okiishi, Table 8.2.
 * @example a sheep farm's two ½" rams, 2 US gal/min each, 4 ft fall, 29 ft lift, into 100 ft of ½" PVC
 * // one has an extra threaded 90° elbow (K = 1.5) in its drive pipe
 * const D = resolvePipe('pvc-sch40', '1/2').insideDiameterM
 * const straight = { driveFlowM3s: toSI(2, 'gal/min', 'flow'), drivePipe: { lengthM: 6.096, insideDiameterM: D, material: 'pvc' } }
 * const elbow = { ...straight, drivePipe: { ...straight.drivePipe, fittings: [{ kind: 'elbow-90-threaded' }] } }
 * const deliveryLine = { lengthM: 30.48, insideDiameterM: D, material: 'pvc' }
 * const r = planArray({ fallM: 1.2192, liftM: 8.8392, pumps: [straight, elbow], deliveryLine }).results
 * r.pumps[1].closureVelocityMs  // ≈ 1.12
 * // ΔH = 1.5 × 1.12²/19.61 of the 1.219 m fall (8 %)
 * r.pumps[1].fittingHeadLossM  // ≈ 0.097
 * r.pumps[1].fittingHeadLossM / 1.2192  // ≈ 0.08
 * // its lift ratio against H_eff rises, so its typical efficiency falls too
 * r.pumps[1].deliveredFlowM3s / r.pumps[0].deliveredFlowM3s  // ≈ 0.874
 * r.gainOverFirstPump  // ≈ 1.870
 */
export function planArray(input: ArrayPlannerInput): CalcOutput<ArrayPlannerResults> {
  const v = parseInput(arrayPlannerSchema, input);
  const nu = waterProperties(v.waterTempC).kinematicViscosityM2s;
  const H = v.fallM;
  const h = v.liftM;
  const steps: Step[] = [];
  const warnings: Warning[] = [];
  const line = lineSpec(v.deliveryLine);

  const prepared = v.pumps.map((p, i) => preparePump(p as PumpInput, i, H, h, nu, v.closureRatio));
  const sol = solveParallel(prepared, H, h, line, nu);
  const [first] = sol.pumps;
  // the schema asks for at least one pump; this keeps the type honest
  if (!first) throw new EngineInputError([{ field: 'pumps', message: 'needs at least one pump' }]);

  prepared.forEach((p) => {
    if (p.driveFlowEstimated) {
      steps.push(
        step(
          `${p.label}: drive flow (estimated)`,
          'Q = A\\,\\frac{x_a + x_d}{t_a + t_d}',
          sub`Q \\approx ${tq(p.driveFlowM3s, 'm³/s')}`,
          p.driveFlowM3s,
          'm³/s',
          'flow',
          'Rigid-column model of the beat (ramCycle.ts) for the straight drive pipe.',
        ),
      );
    }
    if (p.fittingsK > 0) {
      steps.push(
        step(
          `${p.label}: fittings in the drive pipe`,
          '\\Delta H = \\Sigma K\\,\\frac{v_c^2}{2g}',
          sub`\\Delta H = ${tq(p.fittingsK)} \\times \\frac{(${tq(p.closureVelocityMs, 'm/s')})^2}{2 \\times ${tq(G, 'm/s²')}}`,
          p.fittingHeadLossM,
          'm',
          'length',
        ),
      );
      steps.push(
        step(
          `${p.label}: effective fall`,
          'H_{eff} = H - \\Delta H',
          sub`H_{eff} = ${tq(H, 'm')} - ${tq(p.fittingHeadLossM, 'm')}`,
          p.effectiveFallM,
          'm',
          'length',
        ),
      );
      const share = p.fittingHeadLossM / H;
      if (!pumpRuns(p, H)) {
        warnings.push(
          warn(
            'fittings-stop-pump',
            `The fittings in ${p.label}'s drive pipe (ΣK = ${p.fittingsK.toFixed(2)}) use up ${(share * 100).toFixed(0)} % of the fall; it will not beat. Straighten the drive pipe.`,
          ),
        );
      } else {
        warnings.push(
          warn(
            'fitting-in-drive-pipe',
            say`The fittings in ${p.label}'s drive pipe (ΣK = ${p.fittingsK.toFixed(2)}) cost about ${qty('length', p.fittingHeadLossM)} of the ${qty('length', H)} fall (${(share * 100).toFixed(1)} %) at the closing velocity of ${qty('velocity', p.closureVelocityMs)}, and about as much of its delivery. Keep drive pipes straight.`,
          ),
        );
      }
    }
  });

  steps.push(
    step(
      'Losses in the shared delivery line at the combined flow',
      'h_f = f\\,\\frac{L}{D}\\,\\frac{v^2}{2g} + \\Sigma K\\,\\frac{v^2}{2g}',
      sub`h_f = ${tq(sol.loss.friction.f)} \\times \\frac{${tq(line.lengthM, 'm')}}{${tq(line.insideDiameterM, 'm', 'smallLength')}} \\times \\frac{(${tq(sol.loss.velocityMs, 'm/s')})^2}{2g} + ${tq(line.sumK)}\\,\\frac{v^2}{2g}`,
      sol.frictionHeadM + sol.minorHeadM,
      'm',
      'length',
    ),
  );
  steps.push(
    step(
      'Head at each pump',
      'h_p = h + h_f',
      sub`h_p = ${tq(h, 'm')} + ${tq(sol.frictionHeadM + sol.minorHeadM, 'm')}`,
      sol.pumpHeadM,
      'm',
      'length',
    ),
  );
  sol.pumps.forEach(({ pump: p, efficiency: eta, deliveredFlowM3s: q }) => {
    steps.push(
      step(
        `${p.label}: delivery`,
        'q_i = \\eta_i\\,Q_i\\,\\frac{H_{eff,i}}{h_p}',
        sub`q_i = ${tq(eta)} \\times ${tq(p.driveFlowM3s, 'm³/s')} \\times \\frac{${tq(p.effectiveFallM, 'm')}}{${tq(sol.pumpHeadM, 'm')}}`,
        q,
        'm³/s',
        'flow',
      ),
    );
  });
  steps.push(
    step(
      'Combined delivery',
      'S = \\sum_i q_i',
      sub`S = ${joinParts(
        sol.pumps.map((x) => tq(x.deliveredFlowM3s, 'm³/s')),
        ' + ',
      )}`,
      sol.combinedFlowM3s,
      'm³/s',
      'flow',
    ),
  );

  const alone = prepared.length === 1 ? sol : solveParallel([first.pump], H, h, line, nu);
  const gain = alone.combinedFlowM3s > 0 ? sol.combinedFlowM3s / alone.combinedFlowM3s : 0;
  const totalDrive = prepared.reduce((s, p) => s + (pumpRuns(p, H) ? p.driveFlowM3s : 0), 0);
  const maxLift = arrayMaxLift(prepared, H);
  steps.push(
    step(
      'Highest lift the array can reach',
      'h_{max} = \\max_i\\; r_{max}\\,H_{eff,i}',
      sub`h_{max} = ${tq(maxLift, 'm')}`,
      maxLift,
      'm',
      'length',
      'Parallel pumps add flow, not height.',
    ),
  );

  const lossShare = (sol.frictionHeadM + sol.minorHeadM) / h;
  if (lossShare > 0.1) {
    warnings.push(
      warn(
        'delivery-friction-high',
        say`The shared delivery line loses ${qty('length', sol.frictionHeadM + sol.minorHeadM)} at the combined flow, ${(lossShare * 100).toFixed(0)} % of the lift; every pump pushes against it. A larger line would let each pump deliver more.`,
      ),
    );
  }

  let sourceShare: number | undefined;
  if (v.sourceSpareFlowM3s !== undefined) {
    sourceShare = totalDrive / v.sourceSpareFlowM3s;
    steps.push(
      step(
        'Drive flow against what the source can spare',
        '\\frac{\\Sigma Q}{Q_{spare}}',
        sub`\\frac{${tq(totalDrive, 'm³/s')}}{${tq(v.sourceSpareFlowM3s, 'm³/s')}}`,
        sourceShare,
        '',
      ),
    );
    if (sourceShare > 1) {
      warnings.push(
        warn(
          'drive-exceeds-source',
          say`The pumps need ${qty('flow', totalDrive)} of drive water but the source spares ${qty('flow', v.sourceSpareFlowM3s)}. The intake will draw down, suck air and the pumps will stop; run fewer pumps or smaller ones.`,
        ),
      );
    } else if (sourceShare > PRACTICE.sourceShareCaution.value) {
      warnings.push(
        warn(
          'drive-near-source-limit',
          `The pumps use ${(sourceShare * 100).toFixed(0)} % of the source flow given, more than the ${PRACTICE.sourceShareCaution.value * 100} % the engine allows for (${PRACTICE.sourceShareCaution.source}); in a dry spell the intake may draw air.`,
        ),
      );
    }
    warnings.push(
      warn(
        'diversion-rules',
        say`This plan takes ${qty('flow', totalDrive)} through the pumps (most of it returns below them); local rules decide how much may be diverted and whether a permit is needed.`,
      ),
    );
  }

  const results: ArrayPlannerResults = {
    pumps: sol.pumps.map(({ pump: p, efficiency: eta, deliveredFlowM3s: q }) => ({
      label: p.label,
      driveFlowM3s: p.driveFlowM3s,
      driveFlowEstimated: p.driveFlowEstimated,
      closureVelocityMs: p.closureVelocityMs,
      fittingsK: p.fittingsK,
      fittingHeadLossM: p.fittingHeadLossM,
      effectiveFallM: p.effectiveFallM,
      efficiency: eta,
      deliveredFlowM3s: q,
      runs: pumpRuns(p, H),
    })),
    combinedDeliveryM3s: sol.combinedFlowM3s,
    combinedPerDayM3PerDay: sol.combinedFlowM3s * 86400,
    totalDriveFlowM3s: totalDrive,
    pumpHeadM: sol.pumpHeadM,
    deliveryFrictionHeadM: sol.frictionHeadM,
    deliveryMinorHeadM: sol.minorHeadM,
    firstPumpAloneM3s: alone.combinedFlowM3s,
    gainOverFirstPump: gain,
    maxLiftM: maxLift,
  };
  if (sourceShare !== undefined) results.sourceShare = sourceShare;
  if (v.staged) results.staged = planStage(v, v.staged, sol, first, nu, line, steps, warnings);
  return finish(results, steps, warnings);
}

type Parsed = z.output<typeof arrayPlannerSchema>;

/** The upper stage; `lower` is the first lower pump as it runs in the array. */
function planStage(
  v: Parsed,
  st: NonNullable<Parsed['staged']>,
  sol: ParallelSolution,
  lower: PumpAtHead,
  nu: number,
  line: ReturnType<typeof lineSpec>,
  steps: Step[],
  warnings: Warning[],
): StagedResult {
  const upper = preparePump(st.upperPump as PumpInput, 0, st.upperFallM, st.upperLiftM, nu, v.closureRatio);
  upper.label = st.upperPump.label ?? 'upper pump';
  const upperLine = st.upperDeliveryLine
    ? lineSpec(st.upperDeliveryLine)
    : { lengthM: 1, insideDiameterM: 0.3, roughnessM: 0, sumK: 0 };
  const up = solveParallel([upper], st.upperFallM, st.upperLiftM, upperLine, nu);
  const upperAt = pumpAtHead(upper, up.pumpHeadM, st.upperFallM);
  const Qu = upper.driveFlowM3s;
  const S = sol.combinedFlowM3s;
  const duty = Math.min(1, S / Qu);
  const top = up.combinedFlowM3s * duty;
  steps.push(
    step(
      'Upper pump: delivery while running',
      'q_u = \\eta_u\\,Q_u\\,\\frac{H_u}{h_u}',
      sub`q_u = ${tq(upperAt.efficiency)} \\times ${tq(Qu, 'm³/s')} \\times \\frac{${tq(upper.effectiveFallM, 'm')}}{${tq(up.pumpHeadM, 'm')}}`,
      up.combinedFlowM3s,
      'm³/s',
      'flow',
    ),
  );
  steps.push(
    step(
      'Share of the day the upper pump can run',
      'd = \\min\\left(1, \\frac{S}{Q_u}\\right)',
      sub`d = \\min\\left(1, \\frac{${tq(S, 'm³/s')}}{${tq(Qu, 'm³/s')}}\\right)`,
      duty,
      '',
    ),
  );
  steps.push(
    step(
      'Average yield at the top',
      '\\bar q_{top} = d\\,q_u',
      sub`\\bar q_{top} = ${tq(duty)} \\times ${tq(up.combinedFlowM3s, 'm³/s')}`,
      top,
      'm³/s',
      'flow',
    ),
  );

  // n copies deliver at most n × one pump alone, so start the search there.
  let needed = 0;
  const one = solveParallel([lower.pump], v.fallM, v.liftM, line, nu).combinedFlowM3s;
  const start = one > 0 ? Math.max(1, Math.ceil(Qu / one - 1e-9)) : 51;
  for (let n = start; n <= ARRAY_LIMITS.lowerCopies; n++) {
    if (solveParallel([lower.pump], v.fallM, v.liftM, line, nu, [n]).combinedFlowM3s >= Qu * (1 - 1e-12)) {
      needed = n;
      break;
    }
  }
  steps.push(
    step(
      'Lower pumps needed to run the upper pump around the clock',
      'n = \\min\\{n : S(n) \\ge Q_u\\}',
      sub`S(n) \\ge ${tq(Qu, 'm³/s')}`,
      needed,
      '',
      undefined,
      `Copies of ${lower.pump.label}, each delivering ${(lower.deliveredFlowM3s * 6e4).toFixed(3)} L/min here, into the same line.`,
    ),
  );
  if (S < Qu) {
    warnings.push(
      warn(
        'upper-pump-part-time',
        say`The lower pumps fill the tank at ${qty('flow', S)} but the upper pump uses ${qty('flow', Qu)}; it can run only about ${(duty * 100).toFixed(0)} % of the time${needed > 0 ? `. About ${needed} lower pumps like ${lower.pump.label} would keep it running around the clock` : ''}.`,
      ),
    );
  }
  if (needed === 0) {
    warnings.push(
      warn(
        'lower-stage-limit',
        `Even ${ARRAY_LIMITS.lowerCopies} lower pumps like the first cannot supply the upper pump through this delivery line; its friction limits the stage. Use a larger line or a smaller upper pump.`,
      ),
    );
  }
  return {
    upperDriveFlowM3s: Qu,
    upperDriveFlowEstimated: upper.driveFlowEstimated,
    upperDeliveredFlowM3s: up.combinedFlowM3s,
    runsAroundTheClock: S >= Qu,
    dutyFraction: duty,
    topYieldM3s: top,
    topYieldPerDayM3PerDay: top * 86400,
    lowerPumpsNeeded: needed,
  };
}
