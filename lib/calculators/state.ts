import {
  asWritten,
  inputUnit,
  parseQuantity,
  toSI,
  UNIT_CHOICES,
  unitSystemOf,
  type QuantityKind,
  type UnitSystem,
} from '@/lib/hydraulics';
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

/**
 * Which given values open in the reader's units: 'defaults' re-expresses the calculator's
 * own defaults written in the other system ("4 ft" opens as 1.22 m for a metric reader);
 * 'all' does the same for MDX props; 'none' keeps everything as written (a share link,
 * a saved calculation, the server's recompute, which must read exactly what was typed).
 */
export type OpenIn = 'defaults' | 'all' | 'none';

/** The form's starting state from MDX props or a share link, in the reader's units. */
export function initialState(
  fields: readonly FieldDef[],
  props: Record<string, string | undefined>,
  defaults: Record<string, string>,
  units: UnitSystem,
  openIn: OpenIn = 'defaults',
): FormState {
  const state: FormState = {};
  for (const f of fields) {
    const given = props[f.prop];
    const raw = given ?? defaults[f.prop] ?? '';
    if (f.type === 'quantity') {
      const { text, unit } = splitTyped(raw);
      const pick = unit && isKnownUnit(f.qty, unit) ? unit : undefined;
      const convert = openIn === 'all' || (openIn === 'defaults' && given === undefined);
      state[f.name] = pick
        ? convert
          ? inReaderUnits(f, { text, unit: pick }, units)
          : { text, unit: pick }
        : { text: raw && !pick && unit ? raw : text, unit: inputUnit(f.qty, units) };
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

/** A value written in the other system, re-expressed as the reader would write it; anything else as it is. */
function inReaderUnits(f: FieldDef & { type: 'quantity' }, s: FieldState, units: UnitSystem): FieldState {
  const system = s.unit === undefined ? undefined : unitSystemOf(s.unit);
  if (system === undefined || system === units) return s;
  try {
    const d = asWritten(f.qty, readQuantity(f.qty, s, f.name), units, f.units ?? UNIT_CHOICES[f.qty]);
    return { text: inputNumber(d.value), unit: d.unit };
  } catch {
    return s;
  }
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

/**
 * Re-expresses every quantity field in the other unit system as a tape would give it
 * (4 ft → 1.22 m, 0.5 US gal/min → 1.9 L/min). Fields that do not parse are left alone.
 */
export function convertState(fields: readonly FieldDef[], state: FormState, units: UnitSystem): FormState {
  const next: FormState = { ...state };
  for (const f of fields) {
    if (f.type !== 'quantity') continue;
    const s = state[f.name];
    if (!s) continue;
    if (s.text.trim() === '') {
      next[f.name] = { ...s, unit: inputUnit(f.qty, units) };
      continue;
    }
    try {
      const d = asWritten(f.qty, readQuantity(f.qty, s, f.name), units, f.units ?? UNIT_CHOICES[f.qty]);
      next[f.name] = { text: inputNumber(d.value), unit: d.unit };
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
