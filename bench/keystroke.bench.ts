/**
 * What one keystroke costs in a calculator card: read every field of the form
 * (units included) and run the engine. Target: well under one animation frame (16.7 ms).
 *   npx vitest bench --run bench/keystroke.bench.ts
 */
import { bench, describe } from 'vitest';
import { calculatorDefs } from '@/components/calculators/defs';
import { initialState, readForm } from '@/components/calculators/kit/state';

describe('one keystroke: read the form and recompute', () => {
  for (const [id, def] of Object.entries(calculatorDefs)) {
    const state = initialState(def.fields, {}, def.defaults, 'US');
    const fields = def.visible ? def.fields.filter((f) => def.visible!(f.name, state)) : def.fields;
    bench(id, () => {
      const { values } = readForm(fields, state);
      def.run(def.toInput ? def.toInput(values) : values);
    });
  }
});
