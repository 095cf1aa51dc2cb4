import type { CalcOutput, UnitSystem } from '@/lib/hydraulics';
import type { CalculatorId } from './ids';
import type { ResultsOf } from './registry';
import {
  arrayVerdict,
  deliveryLineVerdict,
  demandVerdict,
  drivePipeVerdict,
  sourceFlowVerdict,
  stallVerdict,
  yieldVerdict,
} from './verdict-rules';
import { VERDICT_LIMITS as L, type Verdict, type VerdictLimit } from './verdict-limits';

export {
  BEYOND_RANGE_WORDS,
  causeStrength,
  VERDICT_LIMITS,
  VERDICT_WORDS,
  type Verdict,
  type VerdictLevel,
} from './verdict-limits';

type VerdictRules = { readonly [K in CalculatorId]: (output: CalcOutput<ResultsOf<K>>, units: UnitSystem) => Verdict };

// Every calculator has one: a missing id fails to compile.
const RULES: VerdictRules = {
  'yield-estimate': yieldVerdict,
  'array-planner': arrayVerdict,
  'drive-pipe-check': drivePipeVerdict,
  'delivery-line': deliveryLineVerdict,
  'source-flow': sourceFlowVerdict,
  'demand-and-storage': demandVerdict,
  'stall-check': stallVerdict,
};

const line = (what: string, l: VerdictLimit) => `${what}: ${l.source}`;
const LIFT_CEILING = line(`Highest lift ratio, ${L.maxLiftRatio.value}`, L.maxLiftRatio);
const SOURCE_SHARE = line(`At most ${L.sourceShare.value * 100} % of the source through the pumps`, L.sourceShare);
const DELIVERY_LOSS = line(
  `Delivery friction up to ${L.deliveryLossShare.value * 100} % of the lift`,
  L.deliveryLossShare,
);

/** Where each calculator's verdict lines come from, shown behind the card's Sources. */
const RULE_SOURCES: { readonly [K in CalculatorId]: readonly string[] } = {
  'yield-estimate': [
    LIFT_CEILING,
    line(`Marginal past a lift ratio of ${L.marginalLiftRatio.value}`, L.marginalLiftRatio),
    line(`Least fall, ${L.minFallM.value} m`, L.minFallM),
  ],
  'array-planner': [LIFT_CEILING, SOURCE_SHARE, DELIVERY_LOSS],
  'drive-pipe-check': [
    line(
      `Drive pipe ${L.driveLengthToFallMin.value}–${L.driveLengthToFallMax.value} times the fall`,
      L.driveLengthToFallMin,
    ),
    line(`Rating at least ${L.ratingMargin.value} times the surge peak`, L.ratingMargin),
    line(`PVC fatigue life of at least ${L.fatigueYears.value} years`, L.fatigueYears),
  ],
  'delivery-line': [DELIVERY_LOSS, line('Won’t work when friction is more than the lift', L.deliveryLossWontWork)],
  'source-flow': [SOURCE_SHARE],
  'demand-and-storage': [line(`Delivery at least ${L.demandCover.value} times the demand`, L.demandCover)],
  'stall-check': [
    LIFT_CEILING,
    line(`A strong sign from a score of ${L.strongCause.value}, some sign from ${L.someCause.value}`, L.strongCause),
  ],
};

/**
 * What a calculator's output means for this site: works, marginal or won't work
 * here, and why, in one sentence in the reader's units. The output must be the
 * same calculator's (the card and the saved page only ever pass their own).
 */
export function verdictFor(id: CalculatorId, output: CalcOutput<unknown>, units: UnitSystem): Verdict {
  const rule = RULES[id] as (output: CalcOutput<unknown>, units: UnitSystem) => Verdict;
  return { ...rule(output, units), sources: RULE_SOURCES[id] };
}
