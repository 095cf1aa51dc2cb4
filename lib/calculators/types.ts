import type * as z from 'zod/mini';
import type { CalcOutput, QuantityKind, UnitSystem } from '@/lib/hydraulics';
import type { CalculatorId } from './ids';

/** Words that name quantities, written once for each system's reader. */
export type ByUnits = Readonly<Record<UnitSystem, string>>;

/** The reader's words from words written once or once per system. */
export function inUnits(text: string | ByUnits | undefined, units: UnitSystem): string | undefined {
  return text === undefined || typeof text === 'string' ? text : text[units];
}

/** One input of a calculator. `name` is the engine's (dotted) field; `prop` the MDX/share-link name. */
export type FieldDef =
  | {
      type: 'quantity';
      name: string;
      prop: string;
      label: string;
      qty: QuantityKind;
      help?: string | ByUnits;
      units?: readonly string[];
    }
  | {
      type: 'number';
      name: string;
      prop: string;
      label: string;
      help?: string | ByUnits;
      min?: number;
      max?: number;
      step?: number;
      percent?: boolean;
    }
  | {
      type: 'select';
      name: string;
      prop: string;
      label: string;
      help?: string | ByUnits;
      options: readonly { value: string; label: string }[];
      /** reads what an MDX prop or share link gives ("3/4 in") into an option value ("3/4") */
      normalize?: (raw: string) => string;
      /** a pipe size's series field: the pair starts from the metric series for a metric reader (pipes.ts) */
      seriesField?: string;
    }
  | {
      type: 'checks';
      name: string;
      prop: string;
      label: string;
      help?: string | ByUnits;
      options: readonly { value: string; label: string }[];
      normalize?: (raw: string) => string;
    }
  | {
      type: 'text';
      name: string;
      prop: string;
      label: string;
      help?: string | ByUnits;
      /** an example, in each system where it names units */
      placeholder?: string | ByUnits;
    };

/** What the reader typed: text per field, and the unit picked for quantity fields. */
export interface FieldState {
  text: string;
  unit?: string;
}
export type FormState = Record<string, FieldState>;

export interface ResultRow {
  label: string;
  value: number | string;
  qty?: QuantityKind;
  /** a unit of its own when not a quantity kind (e.g. "beats/min", "%") */
  unit?: string;
  emphasis?: boolean;
}

/**
 * A calculator without its looks: what it is called, its fields, how the form
 * becomes the engine's input, the engine call and which results to show. The
 * card, the server's recompute and the site sheet all read this one definition.
 *
 * The functions are declared as methods on purpose: a definition for one result
 * type then stands in for `Calculator` (results `unknown`) without a cast, and
 * `rows` is only ever handed what the same definition's `run` returned.
 */
export interface CalculatorDef<R = unknown, Id extends string = CalculatorId> {
  readonly id: Id;
  /** as the site lists it and as the card's heading */
  readonly name: string;
  /** one line for the list of calculators and the page's description */
  readonly line: string;
  /** the card's line under its heading */
  readonly blurb: string;
  /** guide slug that explains this calculator */
  readonly guide: string;
  /** the engine's input schema (SI fields), to check an engine input without running it */
  readonly schema: z.ZodMiniType;
  readonly fields: readonly FieldDef[];
  /** starting values as MDX props would give them, e.g. { fall: '4 ft' } */
  readonly defaults: Readonly<Record<string, string>>;
  /**
   * defaults a metric reader starts from instead, for free-text fields the unit switch cannot
   * re-express (a bucket trial "5 gal in 42 s" is written "10 L in 22 s" by a metric reader)
   */
  readonly metricDefaults?: Readonly<Record<string, string>>;
  /** turns parsed fields into the engine input (extra fields, defaults, arrays) */
  toInput?(values: Record<string, unknown>): unknown;
  /** the engine call, on an engine input (SI); throws EngineInputError naming the field */
  run(input: unknown): CalcOutput<R>;
  rows(results: R): ResultRow[];
  /**
   * The efficiency an empty efficiency field stands for, and the band around it, from a
   * run with that field empty (lib/calculators/typical.ts); null when the results lack one.
   */
  efficiencyBand?(results: R): { typical: number; low: number; high: number } | null;
  /** fields shown only when this holds (e.g. staged-only inputs) */
  visible?(fieldName: string, state: FormState): boolean;
}

/** Any calculator, its results unknown until run. */
export type Calculator = CalculatorDef<unknown>;

/**
 * A calculator from its engine function and the rest of its definition. The
 * engine function comes first so that its result type types `rows`, and the
 * definition keeps its own id type, so the registry can check each key against it.
 *
 * The engine parses its own input (parseInput against its zod schema) and throws
 * EngineInputError naming the field, so what a form produced may go in unchecked:
 * the engine function's typed parameter is for callers who build an input by hand.
 */
export function defineCalculator<I, R, const Id extends string>(
  engine: (input: I) => CalcOutput<R>,
  def: Omit<CalculatorDef<R, Id>, 'run'>,
): CalculatorDef<R, Id> {
  return { ...def, run: (input) => engine(input as I) };
}
