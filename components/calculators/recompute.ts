import { ENGINE_VERSION } from '@/lib/hydraulics';
import { EngineInputError } from '@/lib/hydraulics';
import type { CalcOutput } from '@/lib/hydraulics';
import { DEFAULT_UNITS } from '@/lib/units/preference';
import { calculatorDefs } from './defs';
import { initialState, readForm } from './kit/state';

export type Recomputed =
  | { ok: true; output: CalcOutput<unknown>; engineVersion: string }
  | { ok: false; field?: string; message: string };

/**
 * Runs a calculator on the inputs as a reader typed them (each with its unit, as in
 * a share link), exactly as the live card does. Saving and permalinks use this, so
 * a stored result is always the engine's, never the browser's.
 */
export function computeFromForm(tool: string, form: Record<string, string>): Recomputed {
  const def = calculatorDefs[tool];
  if (!def) return { ok: false, field: 'tool', message: `no calculator called ${tool}` };
  const state = initialState(def.fields, form, def.defaults, DEFAULT_UNITS);
  const fields = def.visible ? def.fields.filter((f) => def.visible!(f.name, state)) : def.fields;
  const { values, errors } = readForm(fields, state);
  const firstError = Object.entries(errors)[0];
  if (firstError) {
    const f = def.fields.find((x) => x.name === firstError[0]);
    return { ok: false, field: f?.prop ?? firstError[0], message: `${f?.label ?? firstError[0]}: ${firstError[1]}` };
  }
  try {
    return { ok: true, output: def.run(def.toInput ? def.toInput(values) : values), engineVersion: ENGINE_VERSION };
  } catch (err) {
    if (err instanceof EngineInputError) {
      const f = def.fields.find((x) => err.field === x.name || err.field.startsWith(`${x.name}.`));
      return { ok: false, field: f?.prop ?? err.field, message: `${f?.label ?? err.field}: ${err.issues[0].message}` };
    }
    throw err;
  }
}

/** Whether two results differ beyond rounding (relative 1e-9), ignoring key order. */
export function resultsDiffer(a: unknown, b: unknown): boolean {
  if (typeof a === 'number' && typeof b === 'number') return Math.abs(a - b) > 1e-9 * Math.max(1, Math.abs(a), Math.abs(b));
  if (Array.isArray(a) && Array.isArray(b)) return a.length !== b.length || a.some((x, i) => resultsDiffer(x, b[i]));
  if (a && b && typeof a === 'object' && typeof b === 'object') {
    const keys = new Set([...Object.keys(a), ...Object.keys(b)]);
    return [...keys].some((k) => resultsDiffer((a as Record<string, unknown>)[k], (b as Record<string, unknown>)[k]));
  }
  return a !== b;
}
