/**
 * The calculators without their looks: ids, definitions (fields with units and
 * ranges, MDX prop names, form → engine input, the engine call, result rows),
 * the form's state, the server's recompute and the site sheet. No React, Next or
 * database here; components/calculators draws them.
 */
export { CALCULATOR_IDS, isCalculatorId, type CalculatorId } from './ids';
export {
  defineCalculator,
  inUnits,
  type ByUnits,
  type Calculator,
  type CalculatorDef,
  type FieldDef,
  type FieldState,
  type FormState,
  type ResultRow,
} from './types';
export {
  CALCULATORS,
  CALCULATOR_LIST,
  calculatorFields,
  calculatorInputNames,
  getCalculator,
  runCalculator,
  type ResultsOf,
} from './registry';
export {
  computeForm,
  issueMessage,
  recompute,
  resultsDiffer,
  visibleFields,
  type FormOutcome,
  type Recomputed,
} from './recompute';
export { computeFromForm } from './from-form';
export { convertState, hasOwnUnit, initialState, readForm, shareQuery, splitTyped, type OpenIn } from './state';
export { displayQuantity, formatMessage, formatNumber, formatQuantity, inputNumber, readableQuantity } from './format';
export { SERIES_LABELS, seriesOptions, sizeOptions } from './pipes';
export { lossAgainstFlow } from './defs/deliveryLine';
export { surgeByMaterial } from './defs/drivePipeCheck';
export { normalizeSymptoms } from './defs/stallCheck';
export { parseTrials } from './defs/sourceFlow';
export { parseArea } from './defs/demandAndStorage';
export {
  BEYOND_RANGE_WORDS,
  causeStrength,
  verdictFor,
  VERDICT_LIMITS,
  VERDICT_WORDS,
  type Verdict,
  type VerdictLevel,
} from './verdict';
export { typicalEfficiency, percentWords, type TypicalEfficiency } from './typical';
