import { DISPLAY_UNITS, fromSI, parseQuantity, toSI, type QuantityKind, type UnitSystem } from '@/lib/hydraulics';
import { EngineInputError } from '@/lib/hydraulics';
import { inputNumber } from './format';
import { metricPipeDefault } from './pipes';
import type { FieldDef, FieldState, FormState } from './types';

/** Splits "4 ft" into { text: '4', unit: 'ft' }; a bare number keeps `unit` undefined. */
export function splitTyped(value: string): { text: string; unit?: string } {
  const m = /^\s*([+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:e[+-]?\d+)?)\s*(.*?)\s*$/i.exec(value);
  const [, text, unit] = m ?? [];
  if (text === undefined) return { text: value.trim() };
  return { text, unit: unit || undefined };
}

/** Does the text carry its own unit ("4 ft", "3/4 in", "¾\"") rather than a bare number? */
export function hasOwnUnit(text: string): boolean {
  const t = text.trim();
  if (t === '' || /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:e[+-]?\d+)?$/i.test(t)) return false;
  return /[a-zA-Z"'″′%]|\//.test(t) || /[½¼¾]/.test(t);
}

/** The form's starting state from MDX props or a share link, in the reader's units. */
export function initialState(
  fields: readonly FieldDef[],
  props: Record<string, string | undefined>,
  defaults: Record<string, string>,
  units: UnitSystem,
): FormState {
  const state: FormState = {};
  for (const f of fields) {
    const raw = props[f.prop] ?? defaults[f.prop] ?? '';
    if (f.type === 'quantity') {
      const { text, unit } = splitTyped(raw);
      const pick = unit && isKnownUnit(f.qty, unit) ? unit : undefined;
      state[f.name] = pick
        ? { text, unit: pick }
        : { text: raw && !pick && unit ? raw : text, unit: DISPLAY_UNITS[f.qty][units] };
    } else if (f.type === 'checks') {
      state[f.name] = { text: f.normalize ? f.normalize(raw) : raw };
    } else if (f.type === 'select') {
      const v = f.normalize ? f.normalize(raw) : raw;
      state[f.name] = { text: f.options.some((o) => o.value === v) ? v : (f.options[0]?.value ?? '') };
    } else {
      state[f.name] = { text: raw };
    }
  }
  if (units === 'metric') metricPipeDefaults(fields, props, state);
  return state;
}

/** A pipe the MDX or share link does not name starts, for a metric reader, from the metric series. */
function metricPipeDefaults(fields: readonly FieldDef[], props: Record<string, string | undefined>, state: FormState) {
  for (const f of fields) {
    if (f.type !== 'select' || f.seriesField === undefined) continue;
    const series = fields.find((x) => x.name === f.seriesField);
    if (!series || props[f.prop] !== undefined || props[series.prop] !== undefined) continue;
    const size = state[f.name]?.text;
    const from = state[series.name]?.text;
    if (size === undefined || from === undefined) continue;
    let pick: ReturnType<typeof metricPipeDefault>;
    try {
      pick = metricPipeDefault(from, size);
    } catch {
      continue; // a default the US tables do not know stays as it is
    }
    if (!pick) continue;
    state[f.name] = { text: pick.size };
    state[series.name] = { text: pick.series };
  }
}

function isKnownUnit(qty: QuantityKind, unit: string): boolean {
  try {
    toSI(1, unit, qty);
    return true;
  } catch {
    return false;
  }
}

/** Re-expresses every quantity field in the other unit system (4 ft → 1.219 m). Fields that do not parse are left alone. */
export function convertState(fields: readonly FieldDef[], state: FormState, units: UnitSystem): FormState {
  const next: FormState = { ...state };
  for (const f of fields) {
    if (f.type !== 'quantity') continue;
    const s = state[f.name];
    if (!s) continue;
    try {
      const si = readQuantity(f.qty, s, f.name);
      const unit = DISPLAY_UNITS[f.qty][units];
      next[f.name] = { text: inputNumber(fromSI(si, unit, f.qty)), unit };
    } catch {
      /* leave what the reader typed */
    }
  }
  return next;
}

function readQuantity(qty: QuantityKind, s: FieldState, field: string): number {
  if (hasOwnUnit(s.text)) return parseQuantity(s.text, qty, field);
  const t = s.text.trim();
  if (t === '') throw new EngineInputError([{ field, message: 'is needed' }]);
  const n = Number(t);
  if (!Number.isFinite(n)) throw new EngineInputError([{ field, message: `could not read "${s.text}" as a number` }]);
  return toSI(n, s.unit ?? '', qty, field);
}

function setPath(obj: Record<string, unknown>, dotted: string, value: unknown) {
  const parts = dotted.split('.');
  // split always gives at least one part: the last is the key, the rest the objects on the way
  const last = parts.pop() ?? dotted;
  let cur = obj;
  for (const p of parts) {
    if (typeof cur[p] !== 'object' || cur[p] === null) cur[p] = {};
    cur = cur[p] as Record<string, unknown>;
  }
  cur[last] = value;
}

/** Reads the form into SI values keyed by engine field, with a message per field that does not read. */
export function readForm(
  fields: readonly FieldDef[],
  state: FormState,
): { values: Record<string, unknown>; errors: Record<string, string> } {
  const values: Record<string, unknown> = {};
  const errors: Record<string, string> = {};
  for (const f of fields) {
    const s = state[f.name] ?? { text: '' };
    try {
      if (f.type === 'quantity') {
        if (s.text.trim() === '') continue; // optional fields may be left empty; the engine says when one is needed
        setPath(values, f.name, readQuantity(f.qty, s, f.name));
      } else if (f.type === 'number') {
        const t = s.text.trim().replace(/%$/, '');
        if (t === '') continue;
        const n = Number(t);
        if (!Number.isFinite(n))
          throw new EngineInputError([{ field: f.name, message: `could not read "${s.text}" as a number` }]);
        // an efficiency may be typed as 60 or 60% or 0.6
        setPath(values, f.name, f.percent && (n > 1 || s.text.trim().endsWith('%')) ? n / 100 : n);
      } else if (f.type === 'checks') {
        setPath(
          values,
          f.name,
          s.text
            .split(',')
            .map((x) => x.trim())
            .filter(Boolean),
        );
      } else if (s.text !== '') {
        setPath(values, f.name, s.text);
      }
    } catch (err) {
      errors[f.name] = err instanceof EngineInputError ? err.issues[0].message : String(err);
    }
  }
  return { values, errors };
}

/** The share link's query: each field as the reader typed it, with its unit. */
export function shareQuery(fields: readonly FieldDef[], state: FormState): URLSearchParams {
  const q = new URLSearchParams();
  for (const f of fields) {
    const s = state[f.name];
    if (!s || s.text.trim() === '') continue;
    q.set(
      f.prop,
      f.type === 'quantity' && !hasOwnUnit(s.text) && s.unit ? `${s.text.trim()} ${s.unit}` : s.text.trim(),
    );
  }
  return q;
}
