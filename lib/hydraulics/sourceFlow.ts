/**
 * Source flow: how much water the brook or spring gives, by bucket and
 * stopwatch, by a V-notch weir, or by timing a float; and how much of it a
 * plan would take.
 */
import * as z from 'zod/mini';
import { flowM3s, parseInput, siNumber } from './schemaKit';
import { finish, joinParts, step, sub, tq, type CalcOutput, type Step, type Warning } from './steps';
import { PRACTICE } from './practice';
import { warn } from './warnings';
import { qty, say } from './message';
import { WEIR_ANGLE_RANGE, fromFeet, toFeet, vNotch90Usbr, vNotchFlow, weirCoefficients, weirLimits } from './weirs';

const base = {
  /** total drive flow the plan would take from the source, m³/s */
  plannedDrawM3s: z.optional(flowM3s()),
};

const bucketSchema = z.object({
  method: z.literal('bucket'),
  trials: z
    .array(
      z.object({
        /** volume caught, m³ (a 5-gallon bucket is 0.018927 m³) */
        volumeM3: siNumber({ min: 0, minExclusive: true, max: 2, unit: 'm³' }),
        /** time to fill, s */
        timeS: siNumber({ min: 0.5, max: 3600, unit: 's' }),
      }),
    )
    .check(z.minLength(1), z.maxLength(50)),
  ...base,
});

const vNotchSchema = z.object({
  method: z.literal('v-notch'),
  /** head above the notch's vertex, measured upstream (≥ 4 heads back), m */
  notchHeadM: siNumber({ min: 0, minExclusive: true, max: 1, unit: 'm' }),
  angleDeg: z._default(siNumber({ min: WEIR_ANGLE_RANGE[0], max: WEIR_ANGLE_RANGE[1], unit: '°' }), 90),
  /** height of the notch vertex above the approach channel's bed, m */
  crestHeightM: z.optional(siNumber({ min: 0, minExclusive: true, max: 10, unit: 'm' })),
  /** width of the approach channel, m */
  approachWidthM: z.optional(siNumber({ min: 0, minExclusive: true, max: 50, unit: 'm' })),
  ...base,
});

const floatSchema = z.object({
  method: z.literal('float'),
  /** distance the float travels, m */
  distanceM: siNumber({ min: 0, minExclusive: true, max: 1000, unit: 'm' }),
  /** times of the float runs, s */
  timesS: z.array(siNumber({ min: 0.2, max: 3600, unit: 's' })).check(z.minLength(1), z.maxLength(50)),
  /** stream width at the reach, m */
  widthM: siNumber({ min: 0, minExclusive: true, max: 100, unit: 'm' }),
  /** mean depth across the reach, m */
  meanDepthM: siNumber({ min: 0, minExclusive: true, max: 10, unit: 'm' }),
  /** mean velocity ÷ surface velocity; 0.85 typical (see measureSourceFlow) */
  coefficient: z._default(siNumber({ min: 0.5, max: 1, unit: '' }), 0.85),
  ...base,
});

export const sourceFlowSchema = z.discriminatedUnion('method', [bucketSchema, vNotchSchema, floatSchema]);
export type SourceFlowInput = z.input<typeof sourceFlowSchema>;

export interface SampleStats {
  n: number;
  meanM3s: number;
  /** sample standard deviation (n − 1), m³/s; 0 for one trial */
  sdM3s: number;
  minM3s: number;
  maxM3s: number;
  /** coefficient of variation sd/mean */
  cv: number;
}

export interface SourceFlowResults {
  method: 'bucket' | 'v-notch' | 'float';
  flowM3s: number;
  flowPerDayM3PerDay: number;
  stats?: SampleStats;
  weir?: { ce: number; khM: number; usbr90M3s?: number };
  surfaceVelocityMs?: number;
  /** planned draw ÷ measured flow */
  planShare?: number;
}

function stats(values: readonly number[]): SampleStats {
  const n = values.length;
  const mean = values.reduce((a, b) => a + b, 0) / n;
  const ss = values.reduce((a, b) => a + (b - mean) * (b - mean), 0);
  const sd = n > 1 ? Math.sqrt(ss / (n - 1)) : 0;
  return { n, meanM3s: mean, sdM3s: sd, minM3s: Math.min(...values), maxM3s: Math.max(...values), cv: sd / mean };
}

/**
 * Measures the flow of a source.
 *
 * Bucket: qᵢ = Vᵢ/tᵢ; mean q̄ = Σqᵢ/n; sample standard deviation
 * s = √(Σ(qᵢ − q̄)²/(n − 1)); min and max.
 * V-notch: Kindsvater-Shen, Q = 4.28·Ce·tan(θ/2)·(h₁ + k_h)^2.5 (ft, ft³/s), with
 * the USBR 90° equation Q = 2.49·h₁^2.48 as a cross-check (weirs.ts).
 * Float: Q = k·v_s·w·d̄ with v_s the mean of L/tᵢ and k = 0.85 typical — the
 * ratio of mean to surface velocity. Reference for k: Rantz, S.E. and others
 * (1982), "Measurement and Computation of Streamflow, Volume 1: Measurement of
 * Stage and Discharge", USGS Water-Supply Paper 2175 (the float-measurement
 * section and its coefficient of about 0.85 are from memory), and the USBR
 * Water Measurement Manual's float method (from memory).
 * Units: SI. Range: as the schema (bucket 1–50 trials of 0.5–3600 s; notch
 * head ≤ 1 m at 25°–100°; float 1–50 runs, coefficient 0.5–1).
 * Reference: as above.
 * @example a hill brook caught in a 5-US-gallon bucket (0.018927 m³) in 12.0, 12.6 and 11.4 s
 * const trials = [12, 12.6, 11.4].map((timeS) => ({ volumeM3: 0.018927, timeS }))
 * const r = measureSourceFlow({ method: 'bucket', trials })
 * // qᵢ = Vᵢ/tᵢ in L/s
 * r.steps[0].result.value * 1000  // ≈ 1.5773 ±0.0001
 * r.steps[1].result.value * 1000  // ≈ 1.5021
 * r.steps[2].result.value * 1000  // ≈ 1.6603
 * r.results.flowM3s * 1000  // ≈ 1.580
 * r.results.stats.sdM3s * 1000  // ≈ 0.0791
 * r.results.stats.minM3s * 1000  // ≈ 1.502
 * r.results.stats.maxM3s * 1000  // ≈ 1.660
 */
export function measureSourceFlow(input: SourceFlowInput): CalcOutput<SourceFlowResults> {
  const v = parseInput(sourceFlowSchema, input);
  const steps: Step[] = [];
  const warnings: Warning[] = [];
  let flow: number;
  const results: Partial<SourceFlowResults> = { method: v.method };

  if (v.method === 'bucket') {
    const q = v.trials.map((t) => t.volumeM3 / t.timeS);
    v.trials.forEach((t, i) =>
      steps.push(
        step(
          `Trial ${i + 1}`,
          'q_i = \\frac{V_i}{t_i}',
          sub`q_{${i + 1}} = \\frac{${tq(t.volumeM3, 'm³')}}{${tq(t.timeS, 's')}}`,
          t.volumeM3 / t.timeS,
          'm³/s',
          'flow',
        ),
      ),
    );
    const s = stats(q);
    steps.push(
      step(
        'Mean of the trials',
        '\\bar q = \\frac{1}{n}\\sum q_i',
        sub`\\bar q = \\frac{${joinParts(
          q.map((x) => tq(x, 'm³/s')),
          ' + ',
        )}}{${s.n}}`,
        s.meanM3s,
        'm³/s',
        'flow',
      ),
    );
    steps.push(
      step(
        'Spread (sample standard deviation)',
        's = \\sqrt{\\frac{\\sum (q_i - \\bar q)^2}{n - 1}}',
        `s,\\; n = ${s.n}`,
        s.sdM3s,
        'm³/s',
        'flow',
      ),
    );
    flow = s.meanM3s;
    results.stats = s;
    if (s.n < 3)
      warnings.push(
        warn('few-trials', `Only ${s.n} trial${s.n === 1 ? '' : 's'}; time at least three fills and use the mean.`),
      );
    if (s.cv > 0.1)
      warnings.push(
        warn(
          'bucket-spread-high',
          `The trials differ by ${(s.cv * 100).toFixed(0)} % (standard deviation over mean); check that all the flow goes into the bucket and time more fills.`,
        ),
      );
  } else if (v.method === 'v-notch') {
    const { ce, khFt } = weirCoefficients(v.angleDeg);
    flow = vNotchFlow(v.notchHeadM, v.angleDeg);
    const hFt = toFeet(v.notchHeadM);
    const khM = fromFeet(khFt);
    const ks = step(
      'V-notch discharge (Kindsvater-Shen)',
      'Q = 4.28\\,C_e\\tan\\tfrac{\\theta}{2}\\,(h_1 + k_h)^{2.5}',
      sub`Q = 4.28 \\times ${tq(ce)} \\times \\tan ${tq(v.angleDeg / 2)}^{\\circ} \\times (${tq(hFt, 'ft', null)} + ${tq(khFt, 'ft', null)})^{2.5}`,
      flow,
      'm³/s',
      'flow',
      'USBR Water Measurement Manual ch. 7, its rule in feet and cubic feet a second.',
    );
    // 4.28 is 8/15·√(2g) in feet; in metres it is 8/15·√(2 × 9.81) = 2.36, the same rule
    ks.inSystem = {
      metric: {
        formula: 'Q = 2.36\\,C_e\\tan\\tfrac{\\theta}{2}\\,(h_1 + k_h)^{2.5}',
        substituted: sub`Q = 2.36 \\times ${tq(ce)} \\times \\tan ${tq(v.angleDeg / 2)}^{\\circ} \\times (${tq(v.notchHeadM, 'm', null)} + ${tq(khM, 'm', null)})^{2.5}`,
        note: 'USBR Water Measurement Manual ch. 7, its rule written in metres and cubic metres a second (4.28 in feet is 8/15·√(2g); in metres, 2.36).',
      },
    };
    steps.push(ks);
    results.weir = { ce, khM };
    if (v.angleDeg === 90) {
      const u = vNotch90Usbr(v.notchHeadM);
      results.weir.usbr90M3s = u;
      const cross = step(
        'Cross-check: USBR 90° equation',
        'Q = 2.49\\,h_1^{2.48}',
        sub`Q = 2.49 \\times (${tq(hFt, 'ft', null)})^{2.48}`,
        u,
        'm³/s',
        'flow',
        'In feet and cubic feet a second.',
      );
      // in metres: 2.49 × 0.3048^(3 − 2.48) = 1.34
      cross.inSystem = {
        metric: {
          formula: 'Q = 1.34\\,h_1^{2.48}',
          substituted: sub`Q = 1.34 \\times (${tq(v.notchHeadM, 'm', null)})^{2.48}`,
          note: 'In metres and cubic metres a second.',
        },
      };
      steps.push(cross);
    }
    const lim = weirLimits();
    if (v.notchHeadM < lim.minHeadM || v.notchHeadM > lim.maxHeadM) {
      warnings.push(
        warn(
          'weir-head-out-of-range',
          say`A head of ${qty('smallLength', v.notchHeadM)} is outside the ${qty('smallLength', 0.061)} to ${qty('smallLength', 0.381)} the weir equations hold for; ${v.notchHeadM < lim.minHeadM ? 'use a narrower notch' : 'use a wider notch or a larger weir'}.`,
        ),
      );
    }
    const P = v.crestHeightM;
    const B = v.approachWidthM;
    if (
      (P !== undefined && (v.notchHeadM / P > 0.4 || P < lim.minCrestM)) ||
      (B !== undefined && (v.notchHeadM / B > 0.2 || B < lim.minWidthM))
    ) {
      warnings.push(
        warn(
          'weir-not-fully-contracted',
          say`The pool behind the weir is too shallow or narrow for a fully contracted notch (h/P ≤ 0.4, h/B ≤ 0.2, P ≥ ${qty('length', lim.minCrestM)}, B ≥ ${qty('length', lim.minWidthM)}); the reading will run a few per cent low or high.`,
        ),
      );
    }
  } else {
    const vs = v.timesS.map((t) => v.distanceM / t);
    const s = stats(vs);
    const vMean = s.meanM3s;
    steps.push(
      step(
        'Surface velocity (mean of runs)',
        'v_s = \\frac{1}{n}\\sum \\frac{L}{t_i}',
        sub`v_s = \\frac{1}{${s.n}}\\sum \\frac{${tq(v.distanceM, 'm')}}{t_i}`,
        vMean,
        'm/s',
        'velocity',
      ),
    );
    flow = v.coefficient * vMean * v.widthM * v.meanDepthM;
    steps.push(
      step(
        'Flow (float method)',
        'Q = k\\,v_s\\,w\\,\\bar d',
        sub`Q = ${tq(v.coefficient)} \\times ${tq(vMean, 'm/s')} \\times ${tq(v.widthM, 'm')} \\times ${tq(v.meanDepthM, 'm', 'smallLength')}`,
        flow,
        'm³/s',
        'flow',
        'k = 0.85 typical: USGS WSP 2175 (Rantz et al. 1982), from memory.',
      ),
    );
    results.surfaceVelocityMs = vMean;
    if (s.n < 3)
      warnings.push(
        warn('few-trials', `Only ${s.n} float run${s.n === 1 ? '' : 's'}; time at least three and use the mean.`),
      );
  }

  results.flowM3s = flow;
  results.flowPerDayM3PerDay = flow * 86400;
  if (v.plannedDrawM3s !== undefined) {
    const share = v.plannedDrawM3s / flow;
    results.planShare = share;
    steps.push(
      step(
        'Share of the flow the plan takes',
        '\\frac{Q_{plan}}{Q_{source}}',
        sub`\\frac{${tq(v.plannedDrawM3s, 'm³/s')}}{${tq(flow, 'm³/s')}}`,
        share,
        '',
      ),
    );
    if (share > 1) {
      warnings.push(
        warn(
          'plan-exceeds-source',
          `The plan needs ${(share * 100).toFixed(0)} % of the measured flow; the intake will run dry and draw air. Measure again in the driest month and plan for less.`,
        ),
      );
    } else if (share > PRACTICE.sourceShareCaution.value) {
      warnings.push(
        warn(
          'plan-takes-large-share',
          `The plan takes ${(share * 100).toFixed(0)} % of the measured flow, more than the ${PRACTICE.sourceShareCaution.value * 100} % the engine allows for (${PRACTICE.sourceShareCaution.source}); in a dry month the source may not keep up, and the reach between intake and waste outlet runs low.`,
        ),
      );
    }
    warnings.push(
      warn(
        'diversion-rules',
        `The plan takes ${(share * 100).toFixed(0)} % of the stream through the pumps (most returns below the pump). Local rules decide how much may be diverted, and whether water rights or a permit are needed.`,
      ),
    );
  }
  return finish(results as SourceFlowResults, steps, warnings);
}
