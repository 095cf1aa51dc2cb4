'use client';

import { useEffect, useMemo, useRef, useState } from 'react';
import { computeForm } from '@/lib/calculators/recompute';
import { convertState, initialState, type OpenIn } from '@/lib/calculators/state';
import type { CalculatorDef, FormState } from '@/lib/calculators/types';
import { useUnits } from '@/components/units/UnitsProvider';

/**
 * A calculator form's state in the reader's units, and the engine's outcome of it: the
 * boxes open from props or defaults, and the site-wide unit switch re-expresses them.
 * The calculator card and the site planner both keep their forms here.
 */
export function useFormState<R>(
  def: CalculatorDef<R, string>,
  props: Record<string, string | undefined> = {},
  openIn?: OpenIn,
) {
  const { units } = useUnits();
  const defaultsIn = (u: typeof units) => (u === 'metric' ? { ...def.defaults, ...def.metricDefaults } : def.defaults);
  const [state, setState] = useState<FormState>(() =>
    initialState(def.fields, props, defaultsIn(units), units, openIn),
  );
  const lastUnits = useRef(units);

  // The site-wide unit switch re-expresses what is in the boxes, so the same quantity shows converted.
  useEffect(() => {
    if (lastUnits.current !== units) {
      const [from, to] = [defaultsIn(lastUnits.current), defaultsIn(units)];
      lastUnits.current = units;
      setState((s) => {
        const next = convertState(def.fields, s, units);
        // a worded default in the other system ("5 gal in 42 s") still untouched opens as this system's own
        for (const f of def.fields)
          if (f.type === 'text' && s[f.name]?.text === from[f.prop] && to[f.prop] !== undefined)
            next[f.name] = { ...next[f.name], text: to[f.prop] };
        return next;
      });
    }
    // eslint-disable-next-line react-hooks/exhaustive-deps -- defaultsIn reads only def, listed through its parts
  }, [units, def.fields, def.defaults, def.metricDefaults]);

  const outcome = useMemo(() => computeForm(def, state, units), [def, state, units]);
  /** one field's text or unit changed */
  const set = (name: string, patch: Partial<{ text: string; unit: string }>) =>
    setState((s) => ({ ...s, [name]: { ...s[name], ...patch } as FormState[string] }));
  return { units, state, outcome, set };
}
