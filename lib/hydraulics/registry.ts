/**
 * The calculators by id, for the web UI: each has a name, its zod input
 * schema (SI fields) and a run function returning
 * { results, steps, warnings, engineVersion }.
 */
import type * as z from 'zod/mini';
import { arrayPlannerSchema, planArray } from './arrayPlanner';
import { checkDeliveryLine, deliveryLineSchema } from './deliveryLine';
import { demandAndStorageSchema, planDemandAndStorage } from './demandAndStorage';
import { checkDrivePipe, drivePipeCheckSchema } from './drivePipeCheck';
import { measureSourceFlow, sourceFlowSchema } from './sourceFlow';
import { runStallCheck, stallCheckSchema } from './stallCheck';
import type { CalcOutput } from './steps';
import { estimateYield, yieldEstimateSchema } from './yieldEstimate';

export const CALCULATOR_IDS = [
  'yield-estimate',
  'array-planner',
  'drive-pipe-check',
  'delivery-line',
  'source-flow',
  'demand-and-storage',
  'stall-check',
] as const;
export type CalculatorId = (typeof CALCULATOR_IDS)[number];

export interface Calculator<S extends z.ZodMiniType = z.ZodMiniType, R = unknown> {
  id: CalculatorId;
  name: string;
  schema: S;
  run: (input: z.input<S>) => CalcOutput<R>;
}

function calc<S extends z.ZodMiniType, R>(id: CalculatorId, name: string, schema: S, run: (input: z.input<S>) => CalcOutput<R>): Calculator<S, R> {
  return { id, name, schema, run };
}

export const calculators = {
  'yield-estimate': calc('yield-estimate', 'Yield estimate', yieldEstimateSchema, estimateYield),
  'array-planner': calc('array-planner', 'Array planner', arrayPlannerSchema, planArray),
  'drive-pipe-check': calc('drive-pipe-check', 'Drive pipe check', drivePipeCheckSchema, checkDrivePipe),
  'delivery-line': calc('delivery-line', 'Delivery line', deliveryLineSchema, checkDeliveryLine),
  'source-flow': calc('source-flow', 'Source flow', sourceFlowSchema, measureSourceFlow),
  'demand-and-storage': calc('demand-and-storage', 'Demand and storage', demandAndStorageSchema, planDemandAndStorage),
  'stall-check': calc('stall-check', 'Stall check', stallCheckSchema, runStallCheck),
} as const;

/** Looks up a calculator; undefined for an unknown id (e.g. from a URL). Example: getCalculator('yield-estimate')!.run({ driveFlowM3s: 1.26e-4, fallM: 1.22, liftM: 8.84 }). */
export function getCalculator(id: string): Calculator | undefined {
  return (calculators as Record<string, Calculator>)[id];
}

/** Runs a calculator by id on untrusted input (e.g. a request body); throws EngineInputError on bad input. */
export function runCalculator(id: CalculatorId, input: unknown): CalcOutput<unknown> {
  const c = calculators[id] as unknown as Calculator;
  return c.run(input as never);
}
