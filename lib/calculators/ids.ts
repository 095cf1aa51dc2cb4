/**
 * The calculators' ids, in the order the site lists them. Each id names one
 * definition in ./defs; the registry (./registry.ts) checks that every id has
 * its definition and that each definition carries its own id.
 */
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

/** Narrows an id from a URL, a database row or a request to a calculator's id. */
export function isCalculatorId(id: string): id is CalculatorId {
  return (CALCULATOR_IDS as readonly string[]).includes(id);
}
