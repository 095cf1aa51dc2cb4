import { ENGINE_VERSION, renderMessage } from '@/lib/hydraulics';
import { EngineInputError } from '@/lib/hydraulics';
import type { CalcOutput, UnitSystem } from '@/lib/hydraulics';
import type { FieldIssue } from '@/lib/hydraulics';
import { formatQuantity } from './format';
import { DEFAULT_UNITS } from '@/lib/units/preference';
import { initialState, readForm } from './state';
import type { CalculatorDef, FormState } from './types';

/** The fields a form shows in this state (e.g. the staged pump's only when staged). */
export function visibleFields<R>(def: CalculatorDef<R, string>, state: FormState) {
  return def.visible ? def.fields.filter((f) => def.visible!(f.name, state)) : def.fields;
}

/** A live card's result: the engine's output and the values it ran on, or a message per field. */
export type FormOutcome<R> =
  | { ok: true; output: CalcOutput<R>; input: Record<string, unknown> }
  | { ok: false; fieldErrors: Record<string, string>; general?: string };

/**
 * An engine complaint in the reader's units: "at most 328 ft" for a US reader where the
 * engine says "at most 100 m". Without a reader's system, the engine's own words.
 */
export function issueMessage(issue: FieldIssue, units?: UnitSystem): string {
  if (!units || !issue.parts) return issue.message;
  return renderMessage(issue.parts, (kind, si) => formatQuantity(kind, si, units));
}

/**
 * One keystroke in a card: read the visible fields, run the engine, and put each
 * engine complaint beside the field it names (the rest go in `general`), its numbers
 * in the reader's units when `units` is given.
 */
export function computeForm<R>(def: CalculatorDef<R, string>, state: FormState, units?: UnitSystem): FormOutcome<R> {
  const { values, errors } = readForm(visibleFields(def, state), state);
  if (Object.keys(errors).length > 0) return { ok: false, fieldErrors: errors };
  try {
    return { ok: true, output: def.run(def.toInput ? def.toInput(values) : values), input: values };
  } catch (err) {
    if (err instanceof EngineInputError) {
      const fieldErrors: Record<string, string> = {};
      const known = new Set(def.fields.map((f) => f.name));
      const general: string[] = [];
      for (const issue of err.issues) {
        const field = [...known].find((k) => issue.field === k || issue.field.startsWith(`${k}.`));
        if (field) fieldErrors[field] ??= issueMessage(issue, units);
        else general.push(`${issue.field}: ${issueMessage(issue, units)}`);
      }
      return { ok: false, fieldErrors, general: general.join('; ') || undefined };
    }
    return { ok: false, fieldErrors: {}, general: 'This calculation could not be done with these numbers.' };
  }
}

export type Recomputed<R = unknown> =
  { ok: true; output: CalcOutput<R>; engineVersion: string } | { ok: false; field?: string; message: string };

/**
 * Runs a calculator on the inputs as a reader typed them (each with its unit, as in
 * a share link), exactly as the live card does. Saving and permalinks use this, so
 * a stored result is always the engine's, never the browser's. The first refusal
 * names the field by its form name (`prop`) and label, its numbers in `units` when given.
 */
export function recompute<R>(
  def: CalculatorDef<R, string>,
  form: Record<string, string>,
  units?: UnitSystem,
): Recomputed<R> {
  const state = initialState(def.fields, form, def.defaults, DEFAULT_UNITS, 'none');
  const { values, errors } = readForm(visibleFields(def, state), state);
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
      return {
        ok: false,
        field: f?.prop ?? err.field,
        message: `${f?.label ?? err.field}: ${issueMessage(err.issues[0], units)}`,
      };
    }
    throw err;
  }
}

/** Whether two results differ beyond rounding (relative 1e-9), ignoring key order. */
export function resultsDiffer(a: unknown, b: unknown): boolean {
  if (typeof a === 'number' && typeof b === 'number')
    return Math.abs(a - b) > 1e-9 * Math.max(1, Math.abs(a), Math.abs(b));
  if (Array.isArray(a) && Array.isArray(b)) return a.length !== b.length || a.some((x, i) => resultsDiffer(x, b[i]));
  if (a && b && typeof a === 'object' && typeof b === 'object') {
    const keys = new Set([...Object.keys(a), ...Object.keys(b)]);
    return [...keys].some((k) => resultsDiffer((a as Record<string, unknown>)[k], (b as Record<string, unknown>)[k]));
  }
  return a !== b;
}
