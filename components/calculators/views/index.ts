import type { CalculatorId, ResultsOf } from '@/lib/calculators';
import { arrayPlannerView } from './arrayPlanner';
import { deliveryLineView } from './deliveryLine';
import { drivePipeCheckView } from './drivePipeCheck';
import { stallCheckView } from './stallCheck';
import type { CalculatorView } from './types';
import { yieldEstimateView } from './yieldEstimate';

export type { CalculatorView } from './types';

/** Charts and panels by calculator; a calculator without an entry shows its result rows only. */
export const CALCULATOR_VIEWS: { readonly [K in CalculatorId]?: CalculatorView<ResultsOf<K>> } = {
  'yield-estimate': yieldEstimateView,
  'array-planner': arrayPlannerView,
  'drive-pipe-check': drivePipeCheckView,
  'delivery-line': deliveryLineView,
  'stall-check': stallCheckView,
};

const NO_VIEW: CalculatorView<unknown> = {};

/** A calculator's view for results of its own, read as unknown by the card. */
export function calculatorView(id: CalculatorId): CalculatorView<unknown> {
  return CALCULATOR_VIEWS[id] ?? NO_VIEW;
}
