import type { CalculatorDef } from '../kit/types';

// eslint-disable-next-line @typescript-eslint/no-explicit-any -- each def has its own result type
export type AnyCalculatorDef = CalculatorDef<any>;
import { arrayPlannerDef } from './arrayPlanner';
import { deliveryLineDef } from './deliveryLine';
import { demandAndStorageDef } from './demandAndStorage';
import { drivePipeCheckDef } from './drivePipeCheck';
import { sourceFlowDef } from './sourceFlow';
import { stallCheckDef } from './stallCheck';
import { yieldEstimateDef } from './yieldEstimate';

/** Every calculator card, in the order the calculators page lists them. */
export const calculatorDefs: Record<string, AnyCalculatorDef> = {
  'yield-estimate': yieldEstimateDef as unknown as AnyCalculatorDef,
  'array-planner': arrayPlannerDef as unknown as AnyCalculatorDef,
  'drive-pipe-check': drivePipeCheckDef as unknown as AnyCalculatorDef,
  'delivery-line': deliveryLineDef as unknown as AnyCalculatorDef,
  'source-flow': sourceFlowDef as unknown as AnyCalculatorDef,
  'demand-and-storage': demandAndStorageDef as unknown as AnyCalculatorDef,
  'stall-check': stallCheckDef as unknown as AnyCalculatorDef,
};
