/**
 * Stall check: from a site sheet and the symptoms, the likely causes,
 * ranked, each with the reason worked out from the numbers and the guide
 * that explains the fix.
 */
import * as z from 'zod/mini';
import { DRIVE_PIPE_GUIDES } from './drivePipeCheck';
import { PUMP_TYPES, dAubuissonEfficiency, efficiencyBand, maxLiftRatio } from './efficiency';
import { sumK, type Fitting } from './fittings';
import { pipeLoss } from './friction';
import { MATERIAL_PROPS, NOMINAL_SIZES, NOMINAL_LABELS } from './pipes';
import { drivePipeSchema, pipeRunSchema, roughnessOf } from './pipeSchemas';
import { typicalDriveFlow } from './pumpSizes';
import { estimateDriveFlow } from './ramCycle';
import { EngineInputError } from './errors';
import { addRangeIssue, fallM, flowM3s, liftM, parseInput, siNumber, waterTempC } from './schemaKit';
import { metricText, qty, renderMessage, said, say, type MessagePart } from './message';
import { STALL_CAUSES, SYMPTOMS, type StallCauseCode, type Symptom } from './stallCauses';
import { finish, step, sub, tq, type CalcOutput, type Step, type Warning } from './steps';
import { waveSpeed } from './transients';
import { PRACTICE } from './practice';
import { warn } from './warnings';
import { G, waterProperties } from './water';

export const siteSheetSchema = z.object({
  fallM: fallM(),
  liftM: liftM(),
  drivePipe: drivePipeSchema,
  /** flow the source can spare, m³/s */
  sourceSpareFlowM3s: z.optional(flowM3s()),
  /** measured drive flow of one pump, m³/s */
  driveFlowM3s: z.optional(flowM3s()),
  /** measured delivery of all pumps together, m³/s */
  deliveredFlowM3s: z.optional(flowM3s()),
  pumpSize: z.optional(z.enum(NOMINAL_SIZES)),
  pumpCount: z._default(siNumber({ min: 1, max: 20, unit: '', integer: true }), 1),
  pumpType: z._default(z.enum(PUMP_TYPES), 'homemade'),
  deliveryLine: z.optional(pipeRunSchema),
  beatsPerMinute: z.optional(siNumber({ min: 1, max: 400, unit: 'beats/min' })),
  /** depth of the drive pipe's mouth below the intake's water surface, m */
  intakeSubmergenceM: z.optional(siNumber({ min: 0, max: 10, unit: 'm' })),
  wasteOutletSubmerged: z.optional(z.boolean()),
  screenAtIntake: z.optional(z.boolean()),
  frostRisk: z.optional(z.boolean()),
  waterTempC: waterTempC(),
});

export const stallCheckSchema = z
  .object({
    site: siteSheetSchema,
    symptoms: z._default(z.array(z.enum(SYMPTOMS)).check(z.maxLength(SYMPTOMS.length)), []),
  })
  .check(
    z.superRefine((v, ctx) => {
      if (v.site.liftM <= v.site.fallM) {
        addRangeIssue(ctx, ['site', 'liftM'], say`must be greater than the fall (${qty('length', v.site.fallM)})`, {
          min: v.site.fallM,
          minExclusive: true,
          max: 1000,
          unit: 'm',
        });
      }
    }),
  );

export type StallCheckInput = z.input<typeof stallCheckSchema>;

export interface StallCause {
  code: StallCauseCode;
  title: string;
  /** the reason in metric words, for logs and callers with no reader */
  reason: string;
  /** the reason with its numbers as quantities, to write in the reader's units */
  reasonParts: MessagePart[];
  score: number;
  guide: string;
  /** true when the site sheet's numbers (not only the symptoms) point to this cause */
  fromNumbers: boolean;
}

export interface StallCheckResults {
  causes: StallCause[];
  liftRatio: number;
  lengthToFall: number;
  lengthToDiameter: number;
  /** drive flow of all pumps, measured or estimated, m³/s */
  totalDriveFlowM3s: number;
  driveFlowEstimated: boolean;
  expectedDeliveryM3s: number;
  expectedBeatsPerMinute: number;
  measuredEfficiency?: number;
  sourceShare?: number;
}

type Evidence = { state: 'problem' | 'ok' | 'unknown'; strength?: number; reason: string | MessagePart[] };

/** Usual beat rate of small rams, beats per minute — common practice, no source. */
const BPM_RANGE = [PRACTICE.beatsPerMinuteMin.value, PRACTICE.beatsPerMinuteMax.value] as const;

function score(code: StallCauseCode, symptoms: readonly Symptom[], ev: Evidence): number {
  const weights = symptoms
    .map((s) => (STALL_CAUSES[code].symptoms as Partial<Record<Symptom, number>>)[s] ?? 0)
    .filter((w) => w > 0);
  const sym = weights.length ? Math.max(...weights) + 0.1 * (weights.length - 1) : 0;
  let s: number;
  // What the numbers show outweighs what the symptoms suggest: a full-strength problem (≥ 0.6) ranks above
  // any cause the symptoms alone point to (unknown: at most 0.5 · 1.1), whichever box the asker ticked.
  if (ev.state === 'problem') s = 0.6 * (ev.strength ?? 1) + 0.4 * sym;
  else if (ev.state === 'ok') s = 0.15 * sym;
  else s = 0.5 * sym;
  return Math.round(Math.min(1, s) * 1000) / 1000;
}

const reasonOf = (r: string | MessagePart[]) =>
  typeof r === 'string' ? { reason: r, reasonParts: [r] } : { reason: renderMessage(r, metricText), reasonParts: r };

const f2 = (x: number, d = 2) => x.toFixed(d);
const lpm = (q: number) => qty('flow', q);

/**
 * Ranks the likely causes of a stall or weak delivery.
 *
 * Evidence worked out from the site sheet, each cause marked a problem, ruled
 * out (ok) or unknown:
 *  - drive pipe: L/H against 5–10 and L/D against 150–1000 (DRIVE_PIPE_GUIDES);
 *  - drive flow: n·Q₁ (Q₁ measured, or {@link estimateDriveFlow} with the
 *    fittings) against the source's spare flow — a problem above 90 %;
 *  - lift: r = h/H against the pump type's band — a problem when the typical
 *    efficiency is 0 or r > r_max/2;
 *  - stiffness: Korteweg wave speed c = √((K/ρ)/(1 + K·D/(E·e))) for a
 *    flexible material against √(K/ρ) for a rigid one;
 *  - beat: the counted rate against 40–120 per minute (common practice, no
 *    source) and the model's 60/(t_a + t_d);
 *  - delivery: measured η_D = q·h/(Q·H) against the band's low edge; a q·h above
 *    Q·H with a measured Q is refused as impossible (EngineInputError);
 *  - intake: submergence against S = D·(1 + 2.3·Fr), Fr = v₀/√(gD) (ANSI/HI
 *    9.8-1998, Pump Intake Design, Hydraulic Institute — the formula from memory);
 *  - fittings: ΔH = ΣK·v_c²/(2g) of the fall, strength min(1, 5·ΔH/H); none
 *    listed is unknown, not ruled out (a question's site sheet has no box for them);
 *  - delivery line: h_f + h_m at the measured or expected delivery against
 *    10 % of the lift (common practice, no source).
 * Score of a cause, with w the largest weight of the reported symptoms for it
 * plus 0.1 for each further matching symptom (stallCauses.ts):
 *   problem: 0.6·strength + 0.4·w (strength 0–1, default 1); ok: 0.15·w;
 *   unknown: 0.5·w; capped at 1 and rounded to 0.001. A full-strength problem the
 *   numbers show (≥ 0.6) so outranks any cause only the symptoms suggest (≤ 0.55). Causes scoring 0 are
 *   left out; the rest are sorted by score, then by code.
 * Units: SI (m, m³/s, Pa). Range: as the site-sheet schema (H ≤ 100 m,
 * H < h ≤ 1000 m, drive pipe ≤ 500 m, 1–20 pumps, 1–400 beats/min, 0–40 °C).
 * Reference: as listed above; causes, symptom weights and guides in stallCauses.ts.
 * @example a cabin's ram on a seasonal creek, 4 ft fall, 29 ft lift, 20 ft of ½" HDPE DR 11 drive pipe, "weak delivery"
 * const p = resolvePipe('hdpe-dr11', '1/2')
 * const drivePipe = { lengthM: 6.096, insideDiameterM: p.insideDiameterM, wallThicknessM: p.wallThicknessM, material: 'hdpe' }
 * const site = { fallM: 1.2192, liftM: 8.8392, drivePipe }
 * const r = runStallCheck({ site, symptoms: ['weak-delivery'] }).results
 * // the flexible pipe ranks first: a problem (strength 1) with weight 0.6 for weak delivery, 0.6 × 1 + 0.4 × 0.6
 * r.causes[0].code  // → 'flexible-drive-pipe'
 * r.causes[0].score  // ≈ 0.84
 * // wave speed ≈ 310 m/s (E = 0.9 GPa) against ≈ 1450 m/s rigid, water at 10 °C
 * const w = waterProperties(10)
 * waveSpeed(w.bulkModulusPa, w.densityKgM3, p.insideDiameterM, 0.9e9, p.wallThicknessM)  // ≈ 310 ±1%
 * Math.sqrt(w.bulkModulusPa / w.densityKgM3)  // ≈ 1450 ±1%
 * r.liftRatio  // ≈ 7.25
 * r.lengthToFall  // ≈ 5.0
 */
export function runStallCheck(input: StallCheckInput): CalcOutput<StallCheckResults> {
  const v = parseInput(stallCheckSchema, input);
  const s = v.site;
  const sym = v.symptoms;
  const water = waterProperties(s.waterTempC);
  const nu = water.kinematicViscosityM2s;
  const H = s.fallM;
  const h = s.liftM;
  const dp = s.drivePipe;
  const D = dp.insideDiameterM;
  const L = dp.lengthM;
  const mat = MATERIAL_PROPS[dp.material];
  const k = sumK(dp.fittings as Fitting[]);
  const steps: Step[] = [];
  const warnings: Warning[] = [];
  const ev = {} as Record<StallCauseCode, Evidence>;

  const lh = L / H;
  const ld = L / D;
  steps.push(step('Drive pipe length against fall', '\\frac{L}{H}', sub`\\frac{${tq(L, 'm')}}{${tq(H, 'm')}}`, lh, ''));
  const lhMin = Math.min(...DRIVE_PIPE_GUIDES.filter((g) => g.ratio === 'L/H').map((g) => g.min));
  const lhMax = Math.max(...DRIVE_PIPE_GUIDES.filter((g) => g.ratio === 'L/H').map((g) => g.max));
  const outLH = lh < lhMin || lh > lhMax;
  const outLD = ld < 150 || ld > 1000;
  ev['drive-pipe-outside-range'] = {
    state: outLH || outLD ? 'problem' : 'ok',
    reason: say`The drive pipe is ${qty('length', L)}: ${f2(lh, 1)} times the fall (guides ${lhMin}–${lhMax}) and ${ld.toFixed(0)} times its bore (guide 150–1000)${outLH || outLD ? ', outside the usual range' : ', inside the usual range'}.`,
  };

  const eps = roughnessOf(dp);
  const straight = estimateDriveFlow({ fallM: H, pumpHeadM: h, lengthM: L, insideDiameterM: D, roughnessM: eps, nu });
  const actual =
    k > 0
      ? estimateDriveFlow({ fallM: H, pumpHeadM: h, lengthM: L, insideDiameterM: D, roughnessM: eps, nu, fittingsK: k })
      : straight;
  const qEach = s.driveFlowM3s ?? actual.driveFlowM3s;
  const totalDrive = qEach * s.pumpCount;
  steps.push(
    step(
      s.driveFlowM3s === undefined ? 'Drive flow of all pumps (estimated)' : 'Drive flow of all pumps (measured)',
      'Q = n\\,Q_1',
      sub`Q = ${s.pumpCount} \\times ${tq(qEach, 'm³/s')}`,
      totalDrive,
      'm³/s',
      'flow',
    ),
  );

  if (s.sourceSpareFlowM3s !== undefined) {
    const share = totalDrive / s.sourceSpareFlowM3s;
    ev['drive-flow-above-source'] = {
      state: share > 0.9 ? 'problem' : 'ok',
      strength: share > 1 ? 1 : 0.6,
      reason: say`The pumps use ${lpm(totalDrive)}${s.driveFlowM3s === undefined ? ' (estimated)' : ''}, ${(share * 100).toFixed(0)} % of the ${lpm(s.sourceSpareFlowM3s)} the source spares${share > 0.9 ? '; the intake draws down and sucks air' : ''}.`,
    };
  } else {
    ev['drive-flow-above-source'] = {
      state: 'unknown',
      reason: say`The pumps use about ${lpm(totalDrive)}; measure what the source spares in the driest month to compare.`,
    };
  }

  const r = h / H;
  const band = efficiencyBand(s.pumpType, r);
  const rMax = maxLiftRatio(s.pumpType);
  steps.push(step('Lift ratio', 'r = \\frac{h}{H}', sub`r = \\frac{${tq(h, 'm')}}{${tq(H, 'm')}}`, r, ''));
  ev['lift-too-high'] = {
    state: band.typical <= 0 || r > rMax / 2 ? 'problem' : 'ok',
    strength: band.typical <= 0 ? 1 : 0.6,
    reason: say`The lift is ${f2(r, 1)} times the fall; a ${s.pumpType} ram is expected to manage up to about ${rMax} times, and its typical efficiency here is ${f2(band.typical)}.`,
  };

  const c =
    dp.wallThicknessM !== undefined
      ? waveSpeed(water.bulkModulusPa, water.densityKgM3, D, mat.youngsModulusPa, dp.wallThicknessM)
      : undefined;
  const cRigid = Math.sqrt(water.bulkModulusPa / water.densityKgM3);
  ev['flexible-drive-pipe'] = {
    state: mat.rigid ? 'ok' : 'problem',
    reason: mat.rigid
      ? say`The drive pipe is ${mat.label}, stiff enough to carry the pressure wave${c ? say` (wave speed ≈ ${qty('velocity', c)})` : ''}.`
      : say`The drive pipe is ${mat.label}: it stretches under the surge${c ? say` (wave speed ≈ ${qty('velocity', c)} against ≈ ${qty('velocity', cRigid)} in a rigid pipe)` : ''} and soaks up the energy the pump needs.`,
  };

  const bpmModel = actual.beatsPerMinute;
  steps.push(
    step(
      'Beat rate the model expects',
      'n = \\frac{60}{t_a + t_d}',
      sub`n = \\frac{60}{${tq(actual.cycleTimeS, 's')}}`,
      bpmModel,
      '',
    ),
  );
  const size = s.pumpSize;
  const sizeRange = size ? typicalDriveFlow(size) : undefined;
  if (s.beatsPerMinute !== undefined) {
    const out = s.beatsPerMinute < BPM_RANGE[0] || s.beatsPerMinute > BPM_RANGE[1];
    const fast = s.beatsPerMinute > BPM_RANGE[1];
    ev['waste-valve-setting'] = {
      state: out ? 'problem' : 'ok',
      strength: 0.7,
      reason: say`It beats ${s.beatsPerMinute.toFixed(0)} times a minute (usual ${BPM_RANGE[0]}–${BPM_RANGE[1]}; the model expects about ${bpmModel.toFixed(0)} for this fall and drive pipe)${out ? (fast ? ': a short stroke or light valve shuts before the water gains speed' : ': a long stroke or heavy valve wastes water between beats') : ''}.`,
    };
  } else if (
    size &&
    sizeRange &&
    s.driveFlowM3s !== undefined &&
    (s.driveFlowM3s > sizeRange.highM3s || s.driveFlowM3s < sizeRange.lowM3s)
  ) {
    ev['waste-valve-setting'] = {
      state: 'problem',
      strength: 0.5,
      reason: say`The measured drive flow, ${lpm(s.driveFlowM3s)}, is outside the ${lpm(sizeRange.lowM3s)}–${lpm(sizeRange.highM3s)} typical of a ${NOMINAL_LABELS[size]} pump (common practice, no published source found); the waste valve's stroke or weight sets it.`,
    };
  } else {
    ev['waste-valve-setting'] = {
      state: 'unknown',
      reason: say`Count the beats per minute: the model expects about ${bpmModel.toFixed(0)} for this fall and drive pipe; far off that, reset the stroke and weight.`,
    };
  }

  const expected = (band.typical * totalDrive * H) / h;
  let measuredEff: number | undefined;
  if (s.deliveredFlowM3s !== undefined && s.deliveredFlowM3s * h > totalDrive * H) {
    if (s.driveFlowM3s !== undefined) {
      const maxQ = (totalDrive * H) / h;
      throw new EngineInputError([
        {
          field: 'site.deliveredFlowM3s',
          ...said(
            say`implies an efficiency above 1 with the measured drive flow; at this fall and lift it can be at most ${qty('smallFlow', maxQ)} — check the measurements`,
          ),
          range: { min: 0, minExclusive: true, max: maxQ, unit: 'm³/s' },
        },
      ]);
    }
    ev['delivery-valve-or-snifter'] = {
      state: 'unknown',
      reason: say`It delivers ${qty('smallFlow', s.deliveredFlowM3s)}, more than the estimated drive flow of ${lpm(totalDrive)} could lift; measure the drive flow at the waste valve.`,
    };
  } else if (s.deliveredFlowM3s !== undefined) {
    measuredEff = dAubuissonEfficiency(totalDrive, s.deliveredFlowM3s, H, h);
    steps.push(
      step(
        "Measured efficiency (D'Aubuisson)",
        '\\eta_D = \\frac{q\\,h}{Q\\,H}',
        sub`\\eta_D = \\frac{${tq(s.deliveredFlowM3s, 'm³/s')} \\times ${tq(h, 'm')}}{${tq(totalDrive, 'm³/s')} \\times ${tq(H, 'm')}}`,
        measuredEff,
        '',
      ),
    );
    const low = measuredEff < band.low;
    ev['delivery-valve-or-snifter'] = {
      state: low ? 'problem' : 'ok',
      strength: 0.6,
      reason: say`It delivers ${qty('smallFlow', s.deliveredFlowM3s)}, an efficiency of ${f2(measuredEff)} against a typical ${f2(band.low)}–${f2(band.high)}${low ? '; a leaking or sticking delivery valve returns water at every beat' : ''}.`,
    };
  } else {
    ev['delivery-valve-or-snifter'] = {
      state: 'unknown',
      reason: say`Expected delivery is about ${qty('smallFlow', expected)}; measure it at the tank, and check the delivery valve seats and the snifter hole.`,
    };
  }

  if (s.intakeSubmergenceM !== undefined) {
    const fr = straight.fullFlowVelocityMs / Math.sqrt(G * D);
    const need = D * (1 + 2.3 * fr);
    steps.push(
      step(
        'Intake submergence needed (HI 9.8)',
        'S = D\\,(1 + 2.3\\,Fr),\\; Fr = \\frac{v}{\\sqrt{gD}}',
        sub`S = ${tq(D, 'm', 'smallLength')} \\times (1 + 2.3 \\times ${tq(fr)})`,
        need,
        'm',
        'length',
      ),
    );
    ev['air-in-drive-pipe'] = {
      state: s.intakeSubmergenceM < need ? 'problem' : 'ok',
      reason: say`The drive pipe's mouth is ${qty('smallLength', s.intakeSubmergenceM)} under the surface; at ${qty('velocity', straight.fullFlowVelocityMs)} it needs about ${qty('smallLength', need)} to keep a vortex from drawing air${s.intakeSubmergenceM < need ? '' : ' — enough'}.`,
    };
  } else {
    ev['air-in-drive-pipe'] = {
      state: 'unknown',
      reason:
        'Check that the drive pipe falls steadily with no high points, its joints are tight and its mouth is well under water.',
    };
  }

  ev['flooded-waste-outlet'] =
    s.wasteOutletSubmerged === undefined
      ? {
          state: 'unknown',
          reason: 'Check that the waste water falls clear of the valve and the stream has not risen over it.',
        }
      : {
          state: s.wasteOutletSubmerged ? 'problem' : 'ok',
          reason: s.wasteOutletSubmerged
            ? 'The waste outlet is under water: the valve cannot open fully against the backed-up water.'
            : 'The waste outlet discharges clear.',
        };
  ev.debris =
    s.screenAtIntake === undefined
      ? { state: 'unknown', reason: 'Look for leaves, grit or a frog in the intake, the drive pipe and both valves.' }
      : {
          state: s.screenAtIntake ? 'ok' : 'problem',
          strength: 0.5,
          reason: s.screenAtIntake
            ? 'The intake is screened; still check the screen is clear.'
            : 'The intake has no screen, so leaves and grit reach the valves.',
        };
  ev['waterlogged-air-chamber'] = {
    state: 'unknown',
    reason: 'Without air the chamber cannot cushion the beat: drain it and check the snifter or bladder.',
  };
  ev['frozen-line'] =
    s.frostRisk === undefined
      ? { state: 'unknown', reason: 'In frost, ice in an exposed delivery line stops the flow.' }
      : {
          state: s.frostRisk ? 'problem' : 'ok',
          reason: s.frostRisk
            ? 'The site freezes: an exposed or shallow delivery line freezes first.'
            : 'The site sheet says it does not freeze.',
        };
  ev['fall-too-small'] = {
    state: H < 0.5 ? 'problem' : 'ok',
    reason: say`The fall is ${qty('length', H)}; most rams need at least ${qty('length', PRACTICE.minFallM.value)} (Water for the World RWS.4.D.5).`,
  };

  const vc = straight.closureVelocityMs * (qEach / straight.driveFlowM3s);
  const dH = (k * vc * vc) / (2 * G);
  ev['fittings-in-drive-pipe'] =
    k > 0
      ? {
          state: 'problem',
          strength: Math.min(1, (5 * dH) / H),
          reason: say`Fittings in the drive pipe (ΣK = ${f2(k)}) take about ${qty('smallLength', dH)} of the ${qty('length', H)} fall (${((dH / H) * 100).toFixed(1)} %) at the closing velocity of ${qty('velocity', vc)}.`,
        }
      : // no fittings listed is not the same as none: the asker's site sheet has no box for them
        {
          state: 'unknown',
          reason: 'Elbows, tees or a part-closed valve in the drive pipe each take some of the fall: keep it straight.',
        };

  if (s.deliveryLine) {
    const q = s.deliveredFlowM3s ?? expected;
    const dl = s.deliveryLine;
    const l = pipeLoss(q, dl.lengthM, dl.insideDiameterM, roughnessOf(dl), nu, sumK(dl.fittings as Fitting[]));
    const loss = l.frictionHeadM + l.minorHeadM;
    ev['delivery-line-friction'] = {
      state: loss > 0.1 * h ? 'problem' : 'ok',
      reason: say`At ${qty('smallFlow', q)} the delivery line loses ${qty('length', loss)}, ${((loss / h) * 100).toFixed(1)} % of the lift${loss > 0.1 * h ? ' — more than the 10 % usually allowed' : ''}.`,
    };
  } else {
    ev['delivery-line-friction'] = {
      state: 'unknown',
      reason: 'Add the delivery line to the site sheet to check its friction.',
    };
  }
  ev['start-procedure'] = {
    state: 'unknown',
    reason: 'Fill the delivery line from below, then work the waste valve by hand until it keeps beating on its own.',
  };

  const causes: StallCause[] = (Object.keys(ev) as StallCauseCode[])
    .map((code) => ({
      code,
      title: STALL_CAUSES[code].title,
      ...reasonOf(ev[code].reason),
      score: score(code, sym, ev[code]),
      guide: STALL_CAUSES[code].guide,
      fromNumbers: ev[code].state === 'problem',
    }))
    .filter((x) => x.score > 0)
    .sort((a, b) => b.score - a.score || a.code.localeCompare(b.code));

  if (s.wasteOutletSubmerged) {
    warnings.push(
      warn(
        'high-water-safety',
        'A flooded pump means high water: streams rise fast and banks are slippery. Never work on the pump alone or in high water.',
      ),
    );
  }
  if (sym.includes('hammering') || sym.includes('waterlogged-air-chamber')) {
    warnings.push(
      warn(
        'air-chamber-safety',
        "An air chamber holds stored energy, and a ram beating against a closed valve keeps charging it. Stop the ram first (close the drive pipe's valve or hold the waste valve shut), then isolate the delivery, then bleed the chamber through a bleed valve of its own while watching a pressure gauge on the pump side, before opening anything. Never use glass or unrated parts.",
      ),
    );
  }
  if (sym.includes('delivery-stops-in-frost') || s.frostRisk) {
    warnings.push(
      warn('frost-risk', 'Freezing splits pumps and pipe: drain what you cannot bury below the frost depth.'),
    );
  }

  const results: StallCheckResults = {
    causes,
    liftRatio: r,
    lengthToFall: lh,
    lengthToDiameter: ld,
    totalDriveFlowM3s: totalDrive,
    driveFlowEstimated: s.driveFlowM3s === undefined,
    expectedDeliveryM3s: expected,
    expectedBeatsPerMinute: bpmModel,
  };
  if (measuredEff !== undefined) results.measuredEfficiency = measuredEff;
  if (s.sourceSpareFlowM3s !== undefined) results.sourceShare = totalDrive / s.sourceSpareFlowM3s;
  return finish(results, steps, warnings);
}
