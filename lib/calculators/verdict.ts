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
import type { Verdict } from './verdict-limits';

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

/**
 * What a calculator's output means for this site: works, marginal or won't work
 * here, and why, in one sentence in the reader's units. The output must be the
 * same calculator's (the card and the saved page only ever pass their own).
 */
export function verdictFor(id: CalculatorId, output: CalcOutput<unknown>, units: UnitSystem): Verdict {
  const rule = RULES[id] as (output: CalcOutput<unknown>, units: UnitSystem) => Verdict;
  return rule(output, units);
}
