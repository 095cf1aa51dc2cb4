/**
 * Delivery line: friction and fitting losses from the pump to the tank,
 * the head and pressure at the pump, and the smallest standard pipe that
 * keeps the loss under a target.
 */
import * as z from 'zod/mini';
import { sumK, type Fitting } from './fittings';
import { hazenWilliamsHeadLoss, pipeLoss, type FlowRegime } from './friction';
import {
  NOMINAL_LABELS,
  NOMINAL_SIZES,
  PIPE_SERIES,
  defaultSeries,
  resolvePipe,
  type NominalSize,
  type PipeSeries,
} from './pipes';
import { hazenCOf, pipeRunSchema, roughnessOf } from './pipeSchemas';
import { flowM3s, liftM, parseInput, siNumber, waterTempC } from './schemaKit';
import { finish, step, sub, tq, type CalcOutput, type Step, type Warning } from './steps';
import { PRACTICE } from './practice';
import { warn } from './warnings';
import { qty, say } from './message';
import { G, waterProperties } from './water';

export const deliveryLineSchema = z.object({
  /** delivered flow through the line, m³/s */
  flowM3s: flowM3s(),
  /** static lift from the pump to the outlet, m */
  liftM: liftM(),
  line: pipeRunSchema,
  /** series to pick the smallest standard size from; default by material */
  sizingSeries: z.optional(z.enum(PIPE_SERIES)),
  /** largest acceptable friction-plus-fitting loss, m; default 10 % of the lift (PRACTICE.deliveryLossShare: common practice, no published source found) */
  targetLossM: z.optional(siNumber({ min: 0, minExclusive: true, max: 1000, unit: 'm' })),
  /** the line runs where it freezes */
  frostRisk: z._default(z.boolean(), false),
  waterTempC: waterTempC(),
});

export type DeliveryLineInput = z.input<typeof deliveryLineSchema>;

export interface SizedPipe {
  series: PipeSeries;
  nominal: NominalSize;
  insideDiameterM: number;
  lossM: number;
}

export interface DeliveryLineResults {
  velocityMs: number;
  reynolds: number;
  regime: FlowRegime;
  frictionFactor: number;
  frictionFactorSwameeJain: number;
  frictionHeadM: number;
  hazenWilliamsHeadM: number;
  minorHeadM: number;
  staticHeadM: number;
  totalHeadM: number;
  pumpPressurePa: number;
  targetLossM: number;
  withinTarget: boolean;
  /** smallest size in the series meeting the target, or null if none of ½"–4" does */
  smallestPipe: SizedPipe | null;
}

/** Velocity above which plastic water lines are usually upsized (5 ft/s) — common practice, no source. */
const HIGH_VELOCITY = 1.5;

/**
 * Checks a delivery line.
 *
 * Formulas: v = 4Q/(πD²); Re = vD/ν; f from 64/Re (laminar) or Colebrook-White,
 * with Swamee-Jain shown as a cross-check; h_f = f(L/D)v²/(2g) (Darcy-Weisbach);
 * Hazen-Williams h_f = 10.67·L·Q^1.852/(C^1.852·D^4.87) as a second opinion;
 * h_m = ΣK·v²/(2g); total head at the pump h_p = h + h_f + h_m; pressure p = ρ·g·h_p.
 * Units: SI. Range: Q ≤ 0.1 m³/s, L ≤ 10 km, D 5–300 mm.
 * Reference: White, Fluid Mechanics, ch. 6; Colebrook (1939); Swamee & Jain (1976);
 * Williams & Hazen (1920); K values Munson, Young & Okiishi, Table 8.2.
 * @example a far paddock's trough 30 m above its ram, 1 L/min through 300 m of ¾" sch 40 PVC (D = 20.93 mm)
 * const r = checkDeliveryLine({
 *   flowM3s: toSI(1, 'L/min', 'flow'), liftM: 30,
 *   line: { lengthM: 300, insideDiameterM: resolvePipe('pvc-sch40', '3/4').insideDiameterM, material: 'pvc' },
 * }).results
 * r.velocityMs  // ≈ 0.0484
 * // laminar at 10 °C: f = 64/Re
 * r.reynolds  // ≈ 776
 * r.frictionFactor  // ≈ 0.0824
 * // h_f = 0.0824 × 14,334 × 0.0484²/19.61
 * r.frictionHeadM  // ≈ 0.141
 * r.totalHeadM  // ≈ 30.14
 * r.pumpPressurePa / 1000  // ≈ 295.5
 */
export function checkDeliveryLine(input: DeliveryLineInput): CalcOutput<DeliveryLineResults> {
  const v = parseInput(deliveryLineSchema, input);
  const water = waterProperties(v.waterTempC);
  const nu = water.kinematicViscosityM2s;
  const rho = water.densityKgM3;
  const { flowM3s: Q, liftM: h, line } = v;
  const D = line.insideDiameterM;
  const k = sumK(line.fittings as Fitting[]);
  const eps = roughnessOf(line);
  const C = hazenCOf(line);
  const steps: Step[] = [];
  const warnings: Warning[] = [];

  const loss = pipeLoss(Q, line.lengthM, D, eps, nu, k);
  const fr = loss.friction;
  steps.push(
    step(
      'Velocity',
      'v = \\frac{4Q}{\\pi D^2}',
      sub`v = \\frac{4 \\times ${tq(Q, 'm³/s')}}{\\pi \\times (${tq(D, 'm', 'smallLength')})^2}`,
      loss.velocityMs,
      'm/s',
      'velocity',
    ),
  );
  steps.push(
    step(
      'Reynolds number',
      'Re = \\frac{v D}{\\nu}',
      sub`Re = \\frac{${tq(loss.velocityMs, 'm/s')} \\times ${tq(D, 'm', 'smallLength')}}{${tq(nu, 'm²/s')}}`,
      loss.reynolds,
      '',
    ),
  );
  if (fr.regime === 'laminar') {
    steps.push(
      step('Friction factor (laminar)', 'f = \\frac{64}{Re}', sub`f = \\frac{64}{${tq(loss.reynolds)}}`, fr.f, ''),
    );
  } else {
    steps.push(
      step(
        'Friction factor (Colebrook-White)',
        '\\frac{1}{\\sqrt f} = -2\\log_{10}\\left(\\frac{\\varepsilon}{3.7D} + \\frac{2.51}{Re\\sqrt f}\\right)',
        sub`\\varepsilon/D = ${tq(eps / D)},\\; Re = ${tq(loss.reynolds)}`,
        fr.f,
        '',
        undefined,
        fr.regime === 'transitional'
          ? 'Critical zone 2000 ≤ Re < 4000: blended between laminar and Colebrook.'
          : undefined,
      ),
    );
    steps.push(
      step(
        'Friction factor (Swamee-Jain cross-check)',
        'f = \\frac{0.25}{\\left[\\log_{10}\\left(\\frac{\\varepsilon}{3.7D} + \\frac{5.74}{Re^{0.9}}\\right)\\right]^2}',
        sub`\\varepsilon/D = ${tq(eps / D)},\\; Re = ${tq(loss.reynolds)}`,
        fr.fSwameeJain,
        '',
      ),
    );
  }
  steps.push(
    step(
      'Friction loss (Darcy-Weisbach)',
      'h_f = f\\,\\frac{L}{D}\\,\\frac{v^2}{2g}',
      sub`h_f = ${tq(fr.f)} \\times \\frac{${tq(line.lengthM, 'm')}}{${tq(D, 'm', 'smallLength')}} \\times \\frac{(${tq(loss.velocityMs, 'm/s')})^2}{2 \\times ${tq(G, 'm/s²')}}`,
      loss.frictionHeadM,
      'm',
      'length',
    ),
  );
  const hw = hazenWilliamsHeadLoss(Q, line.lengthM, D, C);
  const hazen = step(
    'Friction loss (Hazen-Williams, second opinion)',
    'h_f = \\frac{10.67\\,L\\,Q^{1.852}}{C^{1.852}\\,D^{4.87}}',
    sub`h_f = \\frac{10.67 \\times ${tq(line.lengthM, 'm', null)} \\times (${tq(Q, 'm³/s', null)})^{1.852}}{${tq(C)}^{1.852} \\times (${tq(D, 'm', null)})^{4.87}}`,
    hw,
    'm',
    'length',
    'The constant 10.67 holds for metres and cubic metres a second, so this rule keeps its numbers in those units.',
  );
  // the same rule in feet: 10.67 × 0.0283168^1.852 ÷ 0.3048^4.87 = 4.72 (usually quoted as 4.73)
  const ft = 0.3048;
  hazen.inSystem = {
    US: {
      formula: 'h_f = \\frac{4.72\\,L\\,Q^{1.852}}{C^{1.852}\\,D^{4.87}}',
      substituted: sub`h_f = \\frac{4.72 \\times ${tq(line.lengthM / ft, 'ft', null)} \\times (${tq(Q / ft ** 3, 'ft³/s', null)})^{1.852}}{${tq(C)}^{1.852} \\times (${tq(D / ft, 'ft', null)})^{4.87}}`,
      note: 'The constant 4.72 holds for feet and cubic feet a second, so this rule keeps its numbers in those units.',
    },
  };
  steps.push(hazen);
  steps.push(
    step(
      'Fitting losses',
      'h_m = \\Sigma K\\,\\frac{v^2}{2g}',
      sub`h_m = ${tq(k)} \\times \\frac{(${tq(loss.velocityMs, 'm/s')})^2}{2g}`,
      loss.minorHeadM,
      'm',
      'length',
    ),
  );
  const total = h + loss.frictionHeadM + loss.minorHeadM;
  steps.push(
    step(
      'Head at the pump',
      'h_p = h + h_f + h_m',
      sub`h_p = ${tq(h, 'm')} + ${tq(loss.frictionHeadM, 'm')} + ${tq(loss.minorHeadM, 'm')}`,
      total,
      'm',
      'length',
    ),
  );
  const p = rho * G * total;
  steps.push(
    step(
      'Pressure at the pump',
      'p = \\rho\\,g\\,h_p',
      sub`p = ${tq(rho, 'kg/m³')} \\times ${tq(G, 'm/s²')} \\times ${tq(total, 'm')}`,
      p,
      'Pa',
      'pressure',
    ),
  );

  const target = v.targetLossM ?? PRACTICE.deliveryLossShare.value * h;
  const lossNow = loss.frictionHeadM + loss.minorHeadM;
  const series = v.sizingSeries ?? defaultSeries(line.material);
  let smallest: SizedPipe | null = null;
  for (const n of NOMINAL_SIZES) {
    const spec = resolvePipe(series, n, line.material);
    const l = pipeLoss(Q, line.lengthM, spec.insideDiameterM, eps, nu, k);
    if (l.frictionHeadM + l.minorHeadM <= target) {
      smallest = { series, nominal: n, insideDiameterM: spec.insideDiameterM, lossM: l.frictionHeadM + l.minorHeadM };
      break;
    }
  }
  if (smallest) {
    steps.push(
      step(
        'Smallest size in this series that keeps the loss within the target',
        'h_f + h_m \\le h_{target}',
        sub`\\text{${NOMINAL_LABELS[smallest.nominal]} pipe: } ${tq(smallest.lossM, 'm')} \\le ${tq(target, 'm')}`,
        smallest.insideDiameterM,
        'm',
        'smallLength',
      ),
    );
  } else {
    warnings.push(
      warn(
        'no-standard-pipe-meets-target',
        say`No ${series} size from ½" to 4" keeps the loss under ${qty('length', target)} at this flow and length.`,
      ),
    );
  }

  if (lossNow > target)
    warnings.push(
      warn(
        'delivery-loss-high',
        say`The line loses ${qty('length', lossNow)}, more than the target of ${qty('length', target)} (${((lossNow / h) * 100).toFixed(0)} % of the lift); the pump must push against it.${smallest ? say` ${smallest.nominal}" ${series} would keep it to ${qty('length', smallest.lossM)}.` : ''}`,
      ),
    );
  if (loss.velocityMs > HIGH_VELOCITY)
    warnings.push(
      warn(
        'delivery-velocity-high',
        say`Water moves at ${qty('velocity', loss.velocityMs)}, above the ${qty('velocity', 1.5)} usual for plastic lines; losses and surges grow with speed.`,
      ),
    );
  if (fr.regime === 'transitional')
    warnings.push(
      warn(
        'transitional-flow',
        `Re = ${loss.reynolds.toFixed(0)} lies between 2000 and 4000, where flow flips between laminar and turbulent; the friction factor is uncertain by tens of per cent.`,
      ),
    );
  if (loss.reynolds < 1e4 || D < 0.05 || loss.velocityMs > 3) {
    warnings.push(
      warn(
        'hazen-williams-outside-range',
        say`Hazen-Williams was fitted to turbulent water flow in larger mains; here (Re = ${loss.reynolds.toFixed(0)}, D = ${qty('smallLength', D)}) its ${qty('length', hw)} is only a second opinion — the Darcy-Weisbach ${qty('length', loss.frictionHeadM)} is the one to use.`,
      ),
    );
  }
  if (line.pressureRatingPa !== undefined && p > line.pressureRatingPa) {
    warnings.push(
      warn(
        'delivery-pressure-above-rating',
        say`The pressure at the pump, ${qty('pressure', p)}, is above the line's rating of ${qty('pressure', line.pressureRatingPa)}; use a higher-rated pipe for the lower part of the run.`,
      ),
    );
  }
  if (v.frostRisk)
    warnings.push(
      warn(
        'frost-risk',
        'A full delivery line that freezes splits, and ice stops the pump. Bury it below the local frost depth or drain it for the winter.',
      ),
    );

  return finish(
    {
      velocityMs: loss.velocityMs,
      reynolds: loss.reynolds,
      regime: fr.regime,
      frictionFactor: fr.f,
      frictionFactorSwameeJain: fr.fSwameeJain,
      frictionHeadM: loss.frictionHeadM,
      hazenWilliamsHeadM: hw,
      minorHeadM: loss.minorHeadM,
      staticHeadM: h,
      totalHeadM: total,
      pumpPressurePa: p,
      targetLossM: target,
      withinTarget: lossNow <= target,
      smallestPipe: smallest,
    },
    steps,
    warnings,
  );
}
