/**
 * A site plan's verdict (works, marginal, won't work here) with its reason
 * and what would change it, the cautions that apply to the site, and the
 * delivery month by month.
 */
import { maxLiftRatio } from './efficiency';
import { qty, say, type MessagePart } from './message';
import { NOMINAL_LABELS } from './pipes';
import { PRACTICE, fallRarelyViable } from './practice';
import { DESIGN_MARGIN, type PumpChoiceResults } from './pumpChoice';
import { typicalDriveFlow } from './pumpSizes';
import { monthlyFlows, type SupplyDesign } from './siteDesign';
import type { StageDesign } from './sitePlan';
import type { SitePlanSurvey } from './siteSurvey';
import type { ArrayPlannerResults } from './arrayPlanner';
import type { Warning } from './steps';
import { warn } from './warnings';

export const VERDICTS = ['works', 'marginal', 'wont-work'] as const;
export type VerdictWord = (typeof VERDICTS)[number];

/** Below this share of the demand a plan is "won't work here" rather than marginal (common practice, no source). */
export const WONT_WORK_SHARE = { value: 0.5, source: 'common practice, no published source found' } as const;

export interface Verdict {
  verdict: VerdictWord;
  reason: MessagePart[];
  /** each a sentence: more fall, staging, less demand, more storage, … */
  wouldChange: MessagePart[][];
}

/**
 * The verdict: won't work when the fall is at or below PRACTICE.minFallM, no pump runs, or the design
 * delivers under half the demand; marginal under 1.2 × demand; works otherwise.
 * Units: m³/day. Reference: PRACTICE.minFallM; DESIGN_MARGIN, WONT_WORK_SHARE (common practice, no source).
 * @example 0.6 m³/day against 1 m³/day: marginal
 * const survey = { fallM: 1.2192, liftM: 8.8392, spareFlowM3s: 6e-4, reserveDays: 3 }
 * verdictFor(survey, { arrangement: 'single', pumps: { totalDriveFlowM3s: 3e-4 } }, 1, 0.6).verdict  // → 'marginal'
 * verdictFor(survey, { arrangement: 'single', pumps: { totalDriveFlowM3s: 3e-4 } }, 1, 0.4).verdict  // → 'wont-work'
 * verdictFor(survey, { arrangement: 'single', pumps: { totalDriveFlowM3s: 3e-4 } }, 1, 1.3).verdict  // → 'works'
 * @example a fall read off a map asks first for a level
 * const mapped = { fallM: 1.2192, liftM: 8.8392, spareFlowM3s: 6e-4, reserveDays: 3, fallMethod: 'gps-or-map' }
 * verdictFor(mapped, { arrangement: 'single', pumps: { totalDriveFlowM3s: 3e-4 } }, 1, 1.3).wouldChange.length  // → 3
 */
export function verdictFor(
  v: Pick<SitePlanSurvey, 'fallM' | 'liftM' | 'spareFlowM3s' | 'reserveDays'> & { fallMethod?: string },
  pump: Pick<PumpChoiceResults, 'arrangement' | 'why'> & { pumps: { totalDriveFlowM3s: number } | null },
  demand: number,
  delivered: number,
): Verdict {
  const verdict = judge(v, pump, demand, delivered);
  // a map or GPS height can be out by more than a ram's whole fall, so the verdict rests on a level
  if (v.fallMethod === 'gps-or-map')
    verdict.wouldChange.unshift(
      say`A fall measured with a level: a map or GPS reading can be out by more than ${qty('length', v.fallM)}.`,
    );
  return verdict;
}

function judge(
  v: Pick<SitePlanSurvey, 'fallM' | 'liftM' | 'spareFlowM3s' | 'reserveDays'>,
  pump: Pick<PumpChoiceResults, 'arrangement' | 'why'> & { pumps: { totalDriveFlowM3s: number } | null },
  demand: number,
  delivered: number,
): Verdict {
  const H = v.fallM;
  const day = (x: number) => qty('dailyVolume', x);
  const lessDemand = say`Less demand: at most ${day(delivered / DESIGN_MARGIN.value)} would leave a fifth to spare.`;
  const moreFall =
    delivered > 0
      ? say`More fall: about ${qty('length', (H * demand * DESIGN_MARGIN.value) / delivered)} would deliver the demand and a fifth more (delivery grows about in step with the fall).`
      : say`More fall: every extra ${qty('length', 0.3048)} of fall adds about as much delivery as a pump.`;
  const staging = say`Staging: pumps on the source fill a tank partway up, and pumps driven from that tank lift the rest.`;
  const storage = say`More storage: a tank for more than ${v.reserveDays} days carries the site through short dry spells.`;
  if (fallRarelyViable(H))
    return {
      verdict: 'wont-work',
      reason: say`A fall of ${qty('length', H)} is at or below the ${qty('length', PRACTICE.minFallM.value)} a ram needs to beat reliably (${PRACTICE.minFallM.source}).`,
      wouldChange: [
        say`More fall: bring the intake further upstream or set the pump lower, to more than ${qty('length', PRACTICE.minFallM.value)}.`,
      ],
    };
  if (pump.arrangement === 'none' || !pump.pumps) {
    const changes: MessagePart[][] = [];
    if (v.spareFlowM3s < typicalDriveFlow('1/2').lowM3s)
      changes.push(
        say`A source that spares at least ${qty('flow', typicalDriveFlow('1/2').lowM3s)} in the driest month.`,
      );
    else
      changes.push(
        say`More fall: at least ${qty('length', v.liftM / maxLiftRatio('homemade'))} would bring the lift within one homemade ram's reach.`,
      );
    return { verdict: 'wont-work', reason: pump.why, wouldChange: changes };
  }
  const changes = [moreFall, lessDemand];
  if (pump.arrangement !== 'staged' && v.liftM / H > 12) changes.push(staging);
  if (delivered < WONT_WORK_SHARE.value * demand)
    return {
      verdict: 'wont-work',
      reason: say`The best design here delivers ${day(delivered)}, less than half the ${day(demand)} needed.`,
      wouldChange: changes,
    };
  if (delivered < DESIGN_MARGIN.value * demand)
    return {
      verdict: 'marginal',
      reason:
        delivered < demand
          ? say`The design delivers ${day(delivered)}, short of the ${day(demand)} needed; storage carries only part of the gap.`
          : say`The design delivers ${day(delivered)} against ${day(demand)} needed, less than a fifth to spare.`,
      wouldChange: [...changes, storage],
    };
  return {
    verdict: 'works',
    reason: say`The design delivers ${day(delivered)} against ${day(demand)} needed.`,
    wouldChange: [
      say`A driest month sparing less than ${qty('flow', pump.pumps.totalDriveFlowM3s)} would starve the pumps: measure again in a dry spell.`,
      say`A demand above ${day(delivered)} would outrun it.`,
    ],
  };
}

/**
 * The lowest pressure rating a stage's pump side must hold: its drive pipe (or threaded joints) and
 * its delivery line, which a blocked line (a shut valve at the tank) loads to the shut-off pressure.
 * Units: Pa. Reference: the stage's own ratings (pipes.ts).
 * @example ¾" PVC sch 80 at 690 psi (4.757 MPa) and ½" HDPE DR 17 at 125 psi (862 kPa): the line
 * pumpSideRating({ drivePipe: { weakestRatingPa: 4757000 }, deliveryLine: { pressureRatingPa: 862000 } })  // → 862000
 */
export function pumpSideRating(s: Pick<StageDesign, 'drivePipe' | 'deliveryLine'>): number {
  return Math.min(s.drivePipe.weakestRatingPa, s.deliveryLine.pressureRatingPa);
}

/**
 * The cautions a site plan shows: pressure, water in motion, frost, drinking water, diversion rights.
 * @example a freezing drinking-water site with no pumps yet still gets its cautions
 * const codes = siteCautions({ freezes: true, drinkingWater: true }, [], null, null).map((w) => w.code)
 * codes  // → ['plan-water-in-motion', 'plan-freezes', 'drinking-water-untreated', 'diversion-rules']
 */
export function siteCautions(
  v: Pick<SitePlanSurvey, 'freezes' | 'drinkingWater'>,
  stages: readonly StageDesign[],
  supply: SupplyDesign | null,
  array: ArrayPlannerResults | null,
): Warning[] {
  const out: Warning[] = [];
  const peak = stages.reduce((m, s) => Math.max(m, s.drivePipe.shutOffPressurePa), 0);
  // a blocked delivery line (a shut valve at the tank, a float valve put on it by mistake) sees
  // the shut-off pressure too, so the relief valve guards the delivery line's rating as well
  const weakest = stages.reduce((m, s) => Math.min(m, pumpSideRating(s)), Infinity);
  const working = stages.reduce((m, s) => Math.max(m, s.deliveryLine.pumpPressurePa), 0);
  if (stages.length > 0)
    out.push(
      warn(
        'plan-pressure',
        say`Against a shut delivery the pump can reach ${qty('pressure', peak)}. Fit a pressure gauge and a relief valve set above the working ${qty('pressure', working)} and below ${qty('pressure', weakest)}, the lowest rating on the pump side, build the air chamber only of pressure-rated parts (never glass), and stop the pump before closing its delivery valve.`,
      ),
    );
  out.push(
    warn(
      'plan-water-in-motion',
      'Streams rise fast and banks are slippery: never work at the intake alone or in high water, and keep hands clear of the waste valve while it beats.',
    ),
  );
  if (v.freezes)
    out.push(
      warn(
        'plan-freezes',
        'Where it freezes: house or drain the pump and drive pipe before a hard frost, bury the delivery line below the local frost depth, and keep ice off the intake screen.',
      ),
    );
  if (v.drinkingWater)
    out.push(
      warn(
        'drinking-water-untreated',
        'Ram-pumped surface water is untreated: test it and treat it before drinking, and keep livestock away from the intake.',
      ),
    );
  if (!array)
    out.push(
      warn('diversion-rules', 'Local rules decide how much water may be diverted and whether a permit is needed.'),
    );
  if (supply?.standpipe && stages[0])
    out.push(
      warn(
        'plan-standpipe-needed',
        say`The intake is ${qty('length', stages[0].drivePipe.pathM)} from the pump, more than ${PRACTICE.driveLengthToFallMax.value} times the fall: bring the water in a supply pipe to a standpipe or supply tank, and run the ${qty('length', stages[0].drivePipe.lengthM)} drive pipe from there.`,
      ),
    );
  return out;
}

export interface MonthlyDelivery {
  /** January to December */
  months: { month: number; spareFlowM3s: number; deliveredM3PerDay: number; demandM3PerDay: number }[];
  method: string;
}

export const MONTHLY_METHOD =
  'flow between the driest and wettest months on a cosine, six months apart; each month the pumps opened up to take that flow, up to the top of their size range, delivery in proportion to drive flow from the design (common practice, no source)';

/**
 * Delivery in each month: Q_m on the cosine (monthlyFlows), the pumps' drive flow
 * min(n·Q_high, Q_m), delivery scaled by it from the design's (tuned to the demand).
 * Units: m³/s, m³/day. Reference: MONTHLY_METHOD (common practice, no source).
 * @example one ½" pump (1–3 US gal/min) tuned to 1.5 gal/min, the whole August flow; 4 gal/min spare in February: delivery doubles
 * const pump = { pumps: { size: '1/2', count: 1, totalDriveFlowM3s: toSI(1.5, 'gal/min', 'flow') } }
 * const survey = { spareFlowM3s: toSI(1.5, 'gal/min', 'flow'), wetFlowM3s: toSI(4, 'gal/min', 'flow'), driestMonth: 8 }
 * monthlyDelivery(survey, pump, 0.1, 0.08).months[1].deliveredM3PerDay  // ≈ 0.2
 * monthlyDelivery(survey, pump, 0.1, 0.08).months[7].deliveredM3PerDay  // ≈ 0.1
 */
export function monthlyDelivery(
  v: Pick<SitePlanSurvey, 'spareFlowM3s' | 'wetFlowM3s' | 'driestMonth'>,
  pump: {
    pumps: { size: keyof typeof NOMINAL_LABELS; count: number; totalDriveFlowM3s: number } | null;
    upper?: { deliveredM3PerDay: number };
  },
  deliveredDry: number,
  demand: number,
): MonthlyDelivery {
  const flows = monthlyFlows(v.spareFlowM3s, v.wetFlowM3s ?? v.spareFlowM3s, v.driestMonth);
  const set = pump.pumps;
  const months = flows.map((f, i) => {
    let q = deliveredDry;
    if (set && set.totalDriveFlowM3s > 0) {
      const Q = Math.min(set.count * typicalDriveFlow(set.size).highM3s, f);
      q = (deliveredDry * Q) / set.totalDriveFlowM3s;
      // staged: the upper pump cannot deliver more than it does running all day
      if (pump.upper) q = Math.min(q, Math.max(deliveredDry, pump.upper.deliveredM3PerDay));
    }
    return { month: i + 1, spareFlowM3s: f, deliveredM3PerDay: q, demandM3PerDay: demand };
  });
  return { months, method: MONTHLY_METHOD };
}
