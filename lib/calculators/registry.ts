/**
 * The one list of calculators: each id's definition (name, fields, engine call,
 * result rows). The guides, the calculator pages, worked calculations, site
 * sheets, the seed and the tests all look calculators up here.
 */
import type { CalcOutput } from '@/lib/hydraulics';
import { arrayPlanner } from './defs/arrayPlanner';
import { deliveryLine } from './defs/deliveryLine';
import { demandAndStorage } from './defs/demandAndStorage';
import { drivePipeCheck } from './defs/drivePipeCheck';
import { sourceFlow } from './defs/sourceFlow';
import { stallCheck } from './defs/stallCheck';
import { yieldEstimate } from './defs/yieldEstimate';
import { CALCULATOR_IDS, isCalculatorId, type CalculatorId } from './ids';
import type { Calculator, CalculatorDef, FieldDef } from './types';

// `satisfies` rather than a type annotation: each entry keeps its own result type
// (CALCULATORS['stall-check'].run gives StallCheckResults), and a missing id or a
// definition filed under another id's key fails to compile.
export const CALCULATORS = {
  'yield-estimate': yieldEstimate,
  'array-planner': arrayPlanner,
  'drive-pipe-check': drivePipeCheck,
  'delivery-line': deliveryLine,
  'source-flow': sourceFlow,
  'demand-and-storage': demandAndStorage,
  'stall-check': stallCheck,
} satisfies { readonly [K in CalculatorId]: CalculatorDef<unknown, K> };

/** What a calculator's engine call returns for its results. */
export type ResultsOf<K extends CalculatorId> = ReturnType<(typeof CALCULATORS)[K]['run']>['results'];

/** Every calculator, in the order the site lists them. */
export const CALCULATOR_LIST: readonly Calculator[] = CALCULATOR_IDS.map((id) => CALCULATORS[id]);

/** Looks up a calculator; undefined for an unknown id (e.g. from a URL). Example: getCalculator('yield-estimate')!.run({ driveFlowM3s: 1.26e-4, fallM: 1.22, liftM: 8.84 }). */
export function getCalculator(id: string): Calculator | undefined {
  return isCalculatorId(id) ? CALCULATORS[id] : undefined;
}

/** A calculator's fields, each with its engine name, its form/share-link name (`prop`), label and unit kind. */
export function calculatorFields(id: CalculatorId): readonly FieldDef[] {
  return CALCULATORS[id].fields;
}

/** The names a calculator's form takes (MDX props, share-link keys, a worked calculation's stored inputs). */
export function calculatorInputNames(id: CalculatorId): string[] {
  return calculatorFields(id).map((f) => f.prop);
}

/** Runs a calculator's engine on an engine input (SI, e.g. a request body); throws EngineInputError on bad input. */
export function runCalculator(id: CalculatorId, input: unknown): CalcOutput<unknown> {
  const c: Calculator = CALCULATORS[id];
  return c.run(input);
}
