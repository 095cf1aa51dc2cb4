/**
 * What one keystroke costs in a calculator card: read every field of the form
 * (units included) and run the engine. Target: well under one animation frame (16.7 ms).
 *   npx vitest bench --run bench/keystroke.bench.ts
 */
import { bench, describe } from 'vitest';
import { CALCULATOR_LIST, initialState, readForm, visibleFields } from '@/lib/calculators';

describe('one keystroke: read the form and recompute', () => {
  for (const def of CALCULATOR_LIST) {
    const state = initialState(def.fields, {}, def.defaults, 'US');
    const fields = visibleFields(def, state);
    bench(def.id, () => {
      const { values } = readForm(fields, state);
      def.run(def.toInput ? def.toInput(values) : values);
    });
  }
});
