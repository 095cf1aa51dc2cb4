/**
 * Yield estimate: how much a ram delivers from its drive flow, fall and lift.
 */
import * as z from 'zod/mini';
import {
  PUMP_TYPES,
  dAubuissonEfficiency,
  EFFICIENCY_BANDS,
  efficiencyBand,
  maxLiftRatio,
  rankineEfficiency,
  type BandAtRatio,
  type PumpType,
} from './efficiency';
import { addRangeIssue, efficiency, fallM, flowM3s, liftM, parseInput, siNumber, waterTempC } from './schemaKit';
import { finish, step, sub, tq, type CalcOutput, type Step, type Warning } from './steps';
import { PRACTICE, fallRarelyViable } from './practice';
import { warn } from './warnings';
import { qty, say } from './message';
import { G, waterProperties } from './water';

export const yieldEstimateSchema = z
  .object({
    /** drive flow Q entering the drive pipe, m³/s */
    driveFlowM3s: flowM3s(),
    /** fall H from the intake's water surface down to the pump, m */
    fallM: fallM(),
    /** lift h from the pump up to the delivery outlet, m */
    liftM: liftM(),
    pumpType: z._default(z.enum(PUMP_TYPES), 'homemade'),
    /** D'Aubuisson efficiency to assume; omit to use the typical value for the pump type at this lift ratio */
    efficiency: z.optional(efficiency()),
    /** measured delivered flow q, m³/s, to work out the pump's actual efficiency */
    measuredDeliveredFlowM3s: z.optional(flowM3s()),
    /** number of points on the delivery-against-lift curve */
    curvePoints: z._default(siNumber({ min: 5, max: 100, unit: '', integer: true }), 25),
    waterTempC: waterTempC(),
  })
  .check(
    z.superRefine((v, ctx) => {
      if (v.liftM <= v.fallM) {
        addRangeIssue(
          ctx,
          ['liftM'],
          say`must be greater than the fall (${qty('length', v.fallM)}): a ram lifts water above its source`,
          {
            min: v.fallM,
            minExclusive: true,
            max: 1000,
            unit: 'm',
          },
        );
      }
      const q = v.measuredDeliveredFlowM3s;
      if (q !== undefined) {
        if (q >= v.driveFlowM3s) {
          addRangeIssue(
            ctx,
            ['measuredDeliveredFlowM3s'],
            'must be less than the drive flow: a ram delivers only part of the water it uses',
            {
              min: 0,
              minExclusive: true,
              max: v.driveFlowM3s,
              maxExclusive: true,
              unit: 'm³/s',
            },
          );
        } else if (v.liftM > v.fallM && q * v.liftM > v.driveFlowM3s * v.fallM) {
          const maxQ = (v.driveFlowM3s * v.fallM) / v.liftM;
          addRangeIssue(
            ctx,
            ['measuredDeliveredFlowM3s'],
            say`implies an efficiency above 1; at this fall and lift it can be at most ${qty('smallFlow', maxQ)} — check the measurements`,
            {
              min: 0,
              minExclusive: true,
              max: maxQ,
              unit: 'm³/s',
            },
          );
        }
      }
    }),
  );

export type YieldEstimateInput = z.input<typeof yieldEstimateSchema>;

export interface YieldCurvePoint {
  liftM: number;
  deliveryM3s: number;
}

export interface YieldEstimateResults {
  liftRatio: number;
  efficiencyUsed: number;
  efficiencySource: 'given' | 'typical';
  band: BandAtRatio;
  deliveredFlowM3s: number;
  wasteFlowM3s: number;
  deliveredPerDayM3PerDay: number;
  powerInW: number;
  powerOutW: number;
  /** largest lift at which this pump type is expected to deliver at this fall, m */
  maxLiftM: number;
  measured?: { dAubuisson: number; rankine: number };
  curve: YieldCurvePoint[];
}

/**
 * Delivery of a ram against lift, for the chart. The efficiency follows the
 * typical band's shape, scaled to pass through the efficiency used at the
 * given lift, so delivery falls as lift rises.
 */
function deliveryCurve(
  pumpType: PumpType,
  Q: number,
  H: number,
  h: number,
  etaUsed: number,
  points: number,
): YieldCurvePoint[] {
  const rMax = maxLiftRatio(pumpType);
  const top = Math.min(rMax * H, Math.max(3 * h, 10 * H));
  const bottom = 1.2 * H;
  const typAtLift = efficiencyBand(pumpType, h / H).typical;
  const curve: YieldCurvePoint[] = [];
  for (let i = 0; i < points; i++) {
    const l = bottom + ((top - bottom) * i) / (points - 1);
    const typ = efficiencyBand(pumpType, l / H).typical;
    const eta = typAtLift > 0 ? Math.min(1, (etaUsed * typ) / typAtLift) : etaUsed;
    curve.push({ liftM: l, deliveryM3s: (eta * Q * H) / l });
  }
  return curve;
}

/**
 * Estimates a ram's delivery from its drive flow, fall and lift.
 *
 * Formulas: q = η·Q·H/h (D'Aubuisson); waste Q − q; daily volume q·86,400 s;
 * power in ρ·g·Q·H and out ρ·g·q·h. With a measured q, efficiency both as
 * D'Aubuisson q·h/(Q·H) and Rankine q·(h−H)/((Q−q)·H).
 * Units: Q, q m³/s; H, h m (both measured from the pump); η dimensionless; power W.
 * Range: 0 < H ≤ 100 m, H < h ≤ 1000 m, 0 < Q ≤ 0.1 m³/s, 0 < η ≤ 1.
 * Reference: D'Aubuisson relation as used by e.g. Water for the World RWS.4.D.5,
 * D = S·F·E/L; efficiency bands in efficiency.ts (Building Trades Pocketbook table, × 0.33/0.66 for homemade rams).
 * @example a smallholding's ½-inch ram on a spring-fed brook
 * // Q = 2 US gal/min (1.2618e-4 m³/s), H = 4 ft (1.2192 m), h = 29 ft (8.8392 m): h/H = 7.25,
 * // typical homemade η = 0.5 × 0.5538 (Pocketbook) = 0.2769 → q = 0.2769 × 1.2618e-4 × 1.2192/8.8392 (289 mL/min, 416 L/day)
 * const r = estimateYield({ driveFlowM3s: toSI(2, 'gal/min', 'flow'), fallM: 1.2192, liftM: 8.8392 }).results
 * r.liftRatio  // ≈ 7.25
 * r.efficiencyUsed  // ≈ 0.2769
 * r.deliveredFlowM3s  // ≈ 4.819e-6
 * fromSI(r.deliveredFlowM3s, 'mL/min', 'flow')  // ≈ 289.1
 * r.deliveredPerDayM3PerDay * 1000  // ≈ 416.3
 * // power in = 999.7 × 9.80665 × 1.2618e-4 × 1.2192
 * r.powerInW  // ≈ 1.51
 */
export function estimateYield(input: YieldEstimateInput): CalcOutput<YieldEstimateResults> {
  const v = parseInput(yieldEstimateSchema, input);
  const { driveFlowM3s: Q, fallM: H, liftM: h, pumpType } = v;
  const water = waterProperties(v.waterTempC);
  const rho = water.densityKgM3;
  const steps: Step[] = [];
  const warnings: Warning[] = [];

  const r = h / H;
  steps.push(step('Lift ratio', 'r = \\frac{h}{H}', sub`r = \\frac{${tq(h, 'm')}}{${tq(H, 'm')}}`, r, ''));

  const band = efficiencyBand(pumpType, r);
  const eta = v.efficiency ?? band.typical;
  steps.push(
    step(
      v.efficiency === undefined ? 'Typical efficiency at this lift ratio' : 'Efficiency (given)',
      '\\eta',
      v.efficiency === undefined
        ? sub`\\eta_{\\text{typ}}(r = ${tq(r)}) = ${tq(band.typical)}\\quad(\\text{band } ${tq(band.low)}\\text{--}${tq(band.high)})`
        : sub`\\eta = ${tq(eta)}`,
      eta,
      '',
      undefined,
      v.efficiency === undefined ? `Typical band for the pump type: ${EFFICIENCY_BANDS[pumpType].source}.` : undefined,
    ),
  );

  const q = (eta * Q * H) / h;
  steps.push(
    step(
      'Delivered flow',
      'q = \\eta\\,Q\\,\\frac{H}{h}',
      sub`q = ${tq(eta)} \\times ${tq(Q, 'm³/s')} \\times \\frac{${tq(H, 'm')}}{${tq(h, 'm')}}`,
      q,
      'm³/s',
      'flow',
    ),
  );
  const waste = Q - q;
  steps.push(step('Waste flow', 'Q_w = Q - q', sub`Q_w = ${tq(Q, 'm³/s')} - ${tq(q, 'm³/s')}`, waste, 'm³/s', 'flow'));
  const perDay = q * 86400;
  steps.push(
    step(
      'Delivered per day',
      'V_{24h} = q \\times 86\\,400\\,\\mathrm{s}',
      sub`V_{24h} = ${tq(q, 'm³/s')} \\times 86\\,400\\,\\mathrm{s}`,
      perDay,
      'm³/day',
      'dailyVolume',
    ),
  );
  const pIn = rho * G * Q * H;
  steps.push(
    step(
      'Hydraulic power in',
      'P_{in} = \\rho\\,g\\,Q\\,H',
      sub`P_{in} = ${tq(rho, 'kg/m³')} \\times ${tq(G, 'm/s²')} \\times ${tq(Q, 'm³/s')} \\times ${tq(H, 'm')}`,
      pIn,
      'W',
      'power',
    ),
  );
  const pOut = rho * G * q * h;
  steps.push(
    step(
      'Hydraulic power out',
      'P_{out} = \\rho\\,g\\,q\\,h',
      sub`P_{out} = ${tq(rho, 'kg/m³')} \\times ${tq(G, 'm/s²')} \\times ${tq(q, 'm³/s')} \\times ${tq(h, 'm')}`,
      pOut,
      'W',
      'power',
    ),
  );

  let measured: YieldEstimateResults['measured'];
  const qm = v.measuredDeliveredFlowM3s;
  if (qm !== undefined) {
    const d = dAubuissonEfficiency(Q, qm, H, h);
    const rk = rankineEfficiency(Q, qm, H, h);
    measured = { dAubuisson: d, rankine: rk };
    steps.push(
      step(
        "Measured efficiency (D'Aubuisson)",
        '\\eta_D = \\frac{q\\,h}{Q\\,H}',
        sub`\\eta_D = \\frac{${tq(qm, 'm³/s')} \\times ${tq(h, 'm')}}{${tq(Q, 'm³/s')} \\times ${tq(H, 'm')}}`,
        d,
        '',
      ),
    );
    steps.push(
      step(
        'Measured efficiency (Rankine)',
        '\\eta_R = \\frac{q\\,(h - H)}{(Q - q)\\,H}',
        sub`\\eta_R = \\frac{${tq(qm, 'm³/s')} \\times ${tq(h - H, 'm')}}{${tq(Q - qm, 'm³/s')} \\times ${tq(H, 'm')}}`,
        rk,
        '',
      ),
    );
    if (d < band.low) {
      warnings.push(
        warn(
          'efficiency-below-typical',
          `The measured efficiency, ${d.toFixed(2)}, is below the typical ${band.low.toFixed(2)}–${band.high.toFixed(2)} for this pump type at a lift ratio of ${r.toFixed(1)}. Tuning the waste valve, clearing air and checking the valves usually helps.`,
        ),
      );
    }
  }

  const maxLift = maxLiftRatio(pumpType) * H;
  if (fallRarelyViable(H))
    warnings.push(
      warn(
        'fall-below-minimum',
        say`A fall of ${qty('length', H)} is at or below the ${qty('length', PRACTICE.minFallM.value)} most rams need to beat reliably; such a site is rarely viable (${PRACTICE.minFallM.source}).`,
      ),
    );
  if (r < 2)
    warnings.push(
      warn(
        'lift-ratio-low',
        `The lift is only ${r.toFixed(1)} times the fall; the ram wastes most of its water for little height. Check whether a simpler gravity line or another pump suits better.`,
      ),
    );
  if (band.typical <= 0) {
    warnings.push(
      warn(
        'lift-ratio-beyond-range',
        say`A lift of ${r.toFixed(1)} times the fall is beyond what a ${pumpType} ram is expected to manage (about ${maxLiftRatio(pumpType)} times, ${qty('length', maxLift)} here). Look for more fall or lift in stages.`,
      ),
    );
  }
  if (v.efficiency !== undefined && v.efficiency > band.high) {
    warnings.push(
      warn(
        'efficiency-above-typical',
        `An efficiency of ${v.efficiency.toFixed(2)} is above the typical ${band.low.toFixed(2)}–${band.high.toFixed(2)} for this pump type at this lift ratio; the estimate may be optimistic.`,
      ),
    );
  }

  const results: YieldEstimateResults = {
    liftRatio: r,
    efficiencyUsed: eta,
    efficiencySource: v.efficiency === undefined ? 'typical' : 'given',
    band,
    deliveredFlowM3s: q,
    wasteFlowM3s: waste,
    deliveredPerDayM3PerDay: perDay,
    powerInW: pIn,
    powerOutW: pOut,
    maxLiftM: maxLift,
    curve: deliveryCurve(pumpType, Q, H, h, eta, v.curvePoints),
  };
  if (measured) results.measured = measured;
  return finish(results, steps, warnings);
}
