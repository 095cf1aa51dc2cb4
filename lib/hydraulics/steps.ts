/**
 * The shape every calculator returns, and helpers to write the worked steps
 * in TeX (KaTeX-ready) so a reader can redo each number by hand.
 */
import type { QuantityKind } from './units';
import type { MessagePart } from './message';
import { ENGINE_VERSION } from './version';
import { EngineInputError } from './errors';

export interface StepResult {
  value: number;
  /** SI unit as shown, e.g. "m³/s"; "" when dimensionless */
  unit: string;
  /** quantity kind, so the UI can convert with toDisplay() */
  kind?: QuantityKind;
}

/** One line of the working: what is computed, the formula, the numbers put in, the answer. */
export interface Step {
  title: string;
  /** the formula in TeX */
  formula: string;
  /** the formula with values and units substituted, in TeX */
  substituted: string;
  result: StepResult;
  /** a reference or a note on the assumption, plain words */
  note?: string;
}

export type Severity = 'info' | 'caution' | 'danger';

export interface Warning {
  /** stable code, listed in WARNING_CODES */
  code: string;
  severity: Severity;
  /** plain words, with the numbers that triggered it (in SI units) */
  message: string;
  /** the same words with each number as a quantity, for showing in the reader's units (message.ts) */
  parts?: MessagePart[];
  /** guide topic slug to read */
  guide: string;
}

export interface CalcOutput<R> {
  results: R;
  steps: Step[];
  warnings: Warning[];
  engineVersion: string;
}

const unitTexCache = new Map<string, string>();

/**
 * TeX for a unit.
 * @example
 * texUnit('m³/s')  // → '\\,\\mathrm{m^{3}/s}'
 */
export function texUnit(unit: string): string {
  if (!unit) return '';
  const hit = unitTexCache.get(unit);
  if (hit !== undefined) return hit;
  const u = unit.replace(/³/g, '^{3}').replace(/²/g, '^{2}').replace(/°/g, '^{\\circ}').replace(/·/g, '\\cdot ');
  const tex = `\\,\\mathrm{${u}}`;
  if (unitTexCache.size < 256) unitTexCache.set(unit, tex);
  return tex;
}

/**
 * A number in TeX with `sig` significant figures; scientific form below 0.001
 * or from 10⁶ up. (Rounded by arithmetic rather than toPrecision, which is
 * several times slower in V8 and this runs dozens of times per calculation.)
 * @example
 * texNum(1.2192)  // → '1.219'
 * texNum(8.948e-6)  // → '8.948\\times10^{-6}'
 */
export function texNum(x: number, sig = 4): string {
  if (x === 0 || !Number.isFinite(x)) return x === 0 ? '0' : String(x);
  const e = Math.floor(Math.log10(Math.abs(x)));
  if (e < -3 || e >= 6) {
    const q = 10 ** (sig - 1);
    let m = Math.round((x / 10 ** e) * q) / q;
    let ex = e;
    if (Math.abs(m) >= 10) {
      m /= 10;
      ex += 1;
    }
    return `${m}\\times10^{${ex}}`;
  }
  const d = sig - 1 - e;
  if (d <= 0) {
    const p = 10 ** -d;
    return String(Math.round(x / p) * p);
  }
  const p = 10 ** d;
  return String(Math.round(x * p) / p);
}

/**
 * A value with its unit in TeX.
 * @example
 * tq(1.2192, 'm')  // → '1.219\\,\\mathrm{m}'
 */
export function tq(x: number, unit = '', sig = 4): string {
  return `${texNum(x, sig)}${texUnit(unit)}`;
}

/**
 * Builds a step.
 * @example
 * const s = step('Lift ratio', 'r = h/H', 'r = 8.839/1.219', 7.25, '')
 * [s.title, s.formula, s.substituted]  // → ['Lift ratio', 'r = h/H', 'r = 8.839/1.219']
 * s.result  // → { value: 7.25, unit: '' }
 */
export function step(
  title: string,
  formula: string,
  substituted: string,
  value: number,
  unit: string,
  kind?: QuantityKind,
  note?: string,
): Step {
  const s: Step = { title, formula, substituted, result: { value, unit } };
  if (kind) s.result.kind = kind;
  if (note) s.note = note;
  return s;
}

function assertFinite(v: unknown, path: string): void {
  if (typeof v === 'number') {
    if (!Number.isFinite(v)) {
      throw new EngineInputError([
        {
          field: '(input)',
          message: `these values are outside what the calculation can handle (${path} came out infinite); check each value and its unit`,
        },
      ]);
    }
    return;
  }
  if (Array.isArray(v)) {
    for (let i = 0; i < v.length; i++) assertFinite(v[i], `${path}[${i}]`);
    return;
  }
  if (v && typeof v === 'object') {
    for (const k of Object.keys(v)) assertFinite((v as Record<string, unknown>)[k], `${path}.${k}`);
  }
}

/**
 * Wraps results into the common output and checks that no NaN or Infinity
 * escapes. Inputs are validated first, but extreme valid values can still
 * overflow in between; that is refused as bad input (a 4xx), never a crash.
 * @example
 * finish({ q: 1 }, [], []).engineVersion  // → ENGINE_VERSION
 * finish({ q: 0 / 0 }, [], [])  // throws EngineInputError
 */
export function finish<R>(results: R, steps: Step[], warnings: Warning[]): CalcOutput<R> {
  assertFinite(results, 'results');
  for (const s of steps) assertFinite(s.result.value, `step "${s.title}"`);
  return { results, steps, warnings, engineVersion: ENGINE_VERSION };
}
