/**
 * The shape every calculator returns, and helpers to write the worked steps
 * so a reader can redo each number by hand. A step keeps each number it puts
 * into a formula as a value with its quantity kind rather than as SI text, so
 * the page can show it in the reader's units; the TeX around the numbers is
 * KaTeX-ready.
 */
import type { QuantityKind, UnitSystem } from './units';
import type { MessagePart } from './message';
import { ENGINE_VERSION } from './version';
import { EngineInputError } from './errors';

/** A number in the working: its SI value, the SI unit it is written in, and its kind when it converts. */
export interface StepValue {
  value: number;
  /** SI unit as shown, e.g. "m³/s"; "" when dimensionless */
  unit: string;
  /**
   * quantity kind, so the UI can show it in the reader's units; absent where the number is
   * bound to the unit written (a rule's empirical constant only holds in those units)
   */
  kind?: QuantityKind;
}

/** @deprecated name kept for readers of older code: a step's answer is a {@link StepValue}. */
export type StepResult = StepValue;

/** A piece of a substituted formula: TeX text, or a number to show in the reader's units. */
export type StepPart = string | StepValue;

/** One line of the working: what is computed, the rule, the numbers put in, the answer. */
export interface Step {
  title: string;
  /** the formula in TeX */
  formula: string;
  /** the formula with the numbers put in: TeX pieces and values, joined in order */
  substituted: StepPart[];
  result: StepValue;
  /** a reference or a note on the assumption, plain words */
  note?: string;
  /**
   * The same rule as one system's reader writes it, where the published rule holds only
   * in the other system's units (a weir equation in feet): its constant changes with them.
   */
  inSystem?: Partial<Record<UnitSystem, { formula: string; substituted: StepPart[]; note?: string }>>;
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

/** The kind each SI unit converts as, unless a call names another (a diameter is a small length). */
const KIND_OF_UNIT: Record<string, QuantityKind> = {
  m: 'length',
  'm³/s': 'flow',
  'm/s': 'velocity',
  Pa: 'pressure',
  'm³/day': 'dailyVolume',
  'm³': 'volume',
  'm²': 'area',
  s: 'time',
  W: 'power',
};

/**
 * A number to put into a formula. Its kind follows its SI unit (m → length, m³/s → flow, Pa →
 * pressure, …); pass `kind` where the unit alone is not enough (a bore is a small length, a
 * modulus is not a pressure), or `null` where the rule's constants only hold in the unit written.
 * Units outside the list (kg/m³, m/s², ft in a rule written in feet) are shown as written.
 * @example
 * tq(1.2192, 'm')  // → { value: 1.2192, unit: 'm', kind: 'length' }
 * tq(0.05, 'm', 'smallLength').kind  // → 'smallLength'
 * tq(7.25)  // → { value: 7.25, unit: '' }
 * tq(9.25e-6, 'm³/s', null)  // → { value: 9.25e-6, unit: 'm³/s' }
 */
export function tq(x: number, unit = '', kind?: QuantityKind | null): StepValue {
  const k = kind === null ? undefined : (kind ?? KIND_OF_UNIT[unit]);
  return k ? { value: x, unit, kind: k } : { value: x, unit };
}

type Slot = StepPart | StepPart[] | number;

/**
 * Tag for a substituted formula: TeX text with numbers from {@link tq} in `${…}`; plain numbers
 * (a count, a stated constant) and lists of parts are allowed too.
 * @example
 * sub`r = \\frac{${tq(8.839, 'm')}}{${tq(1.219, 'm')}}`.length  // → 5
 * sub`n = ${3}`  // → ['n = 3']
 */
export function sub(text: TemplateStringsArray, ...slots: Slot[]): StepPart[] {
  const parts: StepPart[] = [];
  const push = (p: StepPart) => {
    const last = parts[parts.length - 1];
    if (typeof p === 'string' && typeof last === 'string') parts[parts.length - 1] = last + p;
    else if (p !== '') parts.push(p);
  };
  text.forEach((t, i) => {
    push(t);
    if (i >= slots.length) return;
    const s = slots[i] as Slot;
    if (Array.isArray(s)) s.forEach(push);
    else push(typeof s === 'number' ? String(s) : s);
  });
  return parts;
}

/**
 * Parts joined with a separator, for a sum of any length.
 * @example
 * joinParts([tq(1), tq(2)], ' + ')  // → [{ value: 1, unit: '' }, ' + ', { value: 2, unit: '' }]
 */
export function joinParts(items: StepPart[], sep: string): StepPart[] {
  return items.flatMap((p, i) => (i === 0 ? [p] : [sep, p]));
}

/**
 * The substituted formula in TeX, each number drawn by `show` (the page passes the reader's units).
 * @example
 * partsTex(['r = ', tq(2, 'm')], (v) => String(v.value * 10))  // → 'r = 20'
 */
export function partsTex(parts: readonly StepPart[], show: (v: StepValue) => string): string {
  return parts.map((p) => (typeof p === 'string' ? p : show(p))).join('');
}

/**
 * The substituted formula in SI, four significant figures: for checks against references.
 * @example
 * siTex(['r = \\frac{', tq(8.8392, 'm'), '}{', tq(1.2192, 'm'), '}'])  // → 'r = \\frac{8.839\\,\\mathrm{m}}{1.219\\,\\mathrm{m}}'
 */
export function siTex(parts: readonly StepPart[]): string {
  return partsTex(parts, (v) => `${texNum(v.value)}${texUnit(v.unit)}`);
}

/**
 * Builds a step. The answer's kind follows its unit as in {@link tq} unless given.
 * @example
 * const s = step('Lift ratio', 'r = h/H', sub`r = ${tq(8.839, 'm')}/${tq(1.219, 'm')}`, 7.25, '')
 * [s.title, s.formula, s.substituted.length]  // → ['Lift ratio', 'r = h/H', 4]
 * s.result  // → { value: 7.25, unit: '' }
 * step('Head', 'h', 'h', 3, 'm').result.kind  // → 'length'
 */
export function step(
  title: string,
  formula: string,
  substituted: string | StepPart[],
  value: number,
  unit: string,
  kind?: QuantityKind,
  note?: string,
): Step {
  const s: Step = {
    title,
    formula,
    substituted: typeof substituted === 'string' ? [substituted] : substituted,
    result: tq(value, unit, kind),
  };
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
