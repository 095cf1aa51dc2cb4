/**
 * The working of the site plan's own parts (the pump choice, the drive pipe's
 * length, the intake screen, the air chamber), written with step/sub/tq so
 * "show the working" draws every number in the reader's units. The parts the
 * calculators compute bring their own steps.
 */
import { DESIGN_MARGIN, type PumpChoiceResults, type PumpSet } from './pumpChoice';
import { PRACTICE } from './practice';
import { typicalDriveFlow } from './pumpSizes';
import { SCREEN_APPROACH_VELOCITY } from './siteDesign';
import { step, sub, tq, type Step } from './steps';

function setSteps(stage: string, set: PumpSet, liftM: number, lossShare: number, needM3s: number): Step[] {
  const r = typicalDriveFlow(set.size);
  const needDrive = (needM3s * set.pumpHeadM) / (set.efficiency * set.fallM);
  return [
    step(
      `${stage}: head at the pump with the friction accepted`,
      'h_p = h\\,(1 + s)',
      sub`h_p = ${tq(liftM, 'm')} \\times (1 + ${tq(lossShare)})`,
      set.pumpHeadM,
      'm',
    ),
    step(
      `${stage}: typical efficiency at this lift ratio`,
      '\\eta = \\eta_{typ}\\left(\\frac{h_p}{H}\\right)',
      sub`\\eta_{typ}\\left(\\frac{${tq(set.pumpHeadM, 'm')}}{${tq(set.fallM, 'm')}}\\right)`,
      set.efficiency,
      '',
    ),
    step(
      `${stage}: drive flow needed`,
      'Q_n = \\frac{D\\,h_p}{\\eta\\,H}',
      sub`Q_n = \\frac{${tq(needM3s, 'm³/s')} \\times ${tq(set.pumpHeadM, 'm')}}{${tq(set.efficiency)} \\times ${tq(set.fallM, 'm')}}`,
      needDrive,
      'm³/s',
    ),
    step(
      `${stage}: drive flow of each pump, inside its size's range`,
      'Q = \\min\\left(Q_{high},\\ \\max\\left(Q_{low},\\ \\frac{Q_n}{n}\\right)\\right)',
      sub`Q = \\min\\left(${tq(r.highM3s, 'm³/s')},\\ \\max\\left(${tq(r.lowM3s, 'm³/s')},\\ \\frac{${tq(needDrive, 'm³/s')}}{${set.count}}\\right)\\right)`,
      set.driveFlowEachM3s,
      'm³/s',
      undefined,
      r.source,
    ),
    step(
      `${stage}: delivery of ${set.count} pump${set.count > 1 ? 's' : ''}`,
      'V = n\\,\\eta\\,Q\\,\\frac{H}{h_p} \\times 86\\,400\\,\\mathrm{s}',
      sub`V = ${set.count} \\times ${tq(set.efficiency)} \\times ${tq(set.driveFlowEachM3s, 'm³/s')} \\times \\frac{${tq(set.fallM, 'm')}}{${tq(set.pumpHeadM, 'm')}} \\times 86\\,400\\,\\mathrm{s}`,
      set.deliveredM3PerDay,
      'm³/day',
      'dailyVolume',
    ),
  ];
}

/**
 * The pump choice's working: the wanted delivery, then for each stage the head, efficiency, drive flow
 * needed, each pump's drive flow and the delivery; staged, the stage tank's height first.
 * Reference: choosePump.
 * @example one ½" pump for 0.2 m³/day (as choosePump's example): five steps after the wanted delivery
 * const r = choosePump({ fallM: 1.2192, liftM: 8.8392, spareFlowM3s: toSI(10, 'gal/min', 'flow'), demandM3PerDay: 0.2 })
 * const s = pumpChoiceSteps(r, 0.2, 8.8392, 0.1)
 * s.length  // → 6
 * s[0].result.value  // ≈ 0.24
 * s[3].result.value  // ≈ 8.50e-5
 */
export function pumpChoiceSteps(
  r: PumpChoiceResults,
  demandM3PerDay: number,
  liftM: number,
  lossShare: number,
): Step[] {
  const steps = [
    step(
      'Pump choice: delivery wanted',
      'D = 1.2 \\times D_{demand}',
      sub`D = ${tq(DESIGN_MARGIN.value)} \\times ${tq(demandM3PerDay, 'm³/day')}`,
      r.targetM3PerDay,
      'm³/day',
      'dailyVolume',
      `Margin of a fifth: ${DESIGN_MARGIN.source}.`,
    ),
  ];
  if (!r.pumps) return steps;
  const need = r.targetM3PerDay / 86400;
  if (!r.upper) return [...steps, ...setSteps('Pump choice', r.pumps, liftM, lossShare, need)];
  const h1 = r.upper.tankHeightM;
  steps.push(
    step(
      'Pump choice: stage tank height',
      'h_1 = \\sqrt{h\\,H}',
      sub`h_1 = \\sqrt{${tq(liftM, 'm')} \\times ${tq(r.pumps.fallM, 'm')}}`,
      h1,
      'm',
      undefined,
      'Both stages then work at the same lift ratio (common practice, no source).',
    ),
  );
  return [
    ...steps,
    ...setSteps('Pump choice, upper stage', r.upper, liftM, lossShare, need),
    ...setSteps('Pump choice, lower stage', r.pumps, h1, lossShare, r.upper.totalDriveFlowM3s),
  ];
}

/**
 * The drive pipe's length and the intake screen: L_path = √(run² + H²), L = min(10H, max(5H, L_path)),
 * A = Q/v_a. Reference: PRACTICE.driveLengthToFall (common practice); SCREEN_APPROACH_VELOCITY (NMFS 1997).
 * @example a 9 m run at a 1.2192 m fall, 1 US gal/min through the screen
 * const s = supplySteps(1.2192, 9, 9.0822, 6.309e-5)
 * s[0].result.value  // ≈ 9.0822
 * s[1].result.value  // ≈ 9.0822
 * // 6.309e-5 m³/s / 0.06096 m/s
 * s[2].result.value  // ≈ 1.035e-3
 */
export function supplySteps(fallM: number, runM: number, lengthM: number, totalDriveM3s: number): Step[] {
  const lo = PRACTICE.driveLengthToFallMin.value;
  const hi = PRACTICE.driveLengthToFallMax.value;
  return [
    step(
      'Drive pipe: straight path from the intake to the pump',
      'L_{path} = \\sqrt{x^2 + H^2}',
      sub`L_{path} = \\sqrt{(${tq(runM, 'm')})^2 + (${tq(fallM, 'm')})^2}`,
      Math.hypot(runM, fallM),
      'm',
    ),
    step(
      `Drive pipe: length inside ${lo}–${hi} times the fall`,
      `L = \\min\\left(${hi}H,\\ \\max\\left(${lo}H,\\ L_{path}\\right)\\right)`,
      sub`L = \\min\\left(${tq(hi * fallM, 'm')},\\ \\max\\left(${tq(lo * fallM, 'm')},\\ ${tq(Math.hypot(runM, fallM), 'm')}\\right)\\right)`,
      lengthM,
      'm',
      undefined,
      `${PRACTICE.driveLengthToFallMin.source}; a longer path gets a standpipe.`,
    ),
    step(
      'Intake screen: open area for the approach velocity',
      'A = \\frac{Q}{v_a}',
      sub`A = \\frac{${tq(totalDriveM3s, 'm³/s')}}{${tq(SCREEN_APPROACH_VELOCITY.value, 'm/s')}}`,
      totalDriveM3s / SCREEN_APPROACH_VELOCITY.value,
      'm²',
      undefined,
      SCREEN_APPROACH_VELOCITY.source,
    ),
  ];
}

/**
 * The air chamber by the delivery-pipe rule, V = π/4·D²·L. Reference: AIR_CHAMBER_RULE (common practice).
 * @example 60.65 m of ½" DR 17 (D = 18.83 mm): 16.9 L
 * airChamberStep(0.018826, 60.6476, 'common practice').result.value  // ≈ 0.01688
 */
export function airChamberStep(insideDiameterM: number, lengthM: number, source: string): Step {
  return step(
    'Air chamber: as large as the delivery line holds',
    'V = \\frac{\\pi}{4}\\,D^2\\,L',
    sub`V = \\frac{\\pi}{4} \\times (${tq(insideDiameterM, 'm', 'smallLength')})^2 \\times ${tq(lengthM, 'm')}`,
    (Math.PI / 4) * insideDiameterM * insideDiameterM * lengthM,
    'm³',
    undefined,
    source,
  );
}
