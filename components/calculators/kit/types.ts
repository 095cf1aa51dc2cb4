import type { ReactNode } from 'react';
import type { QuantityKind, UnitSystem } from '@/lib/hydraulics';
import type { CalcOutput } from '@/lib/hydraulics';

/** One input of a calculator card. `name` is the engine's (dotted) field; `prop` the MDX/share-link name. */
export type FieldDef =
  | { type: 'quantity'; name: string; prop: string; label: string; qty: QuantityKind; help?: string; units?: readonly string[] }
  | { type: 'number'; name: string; prop: string; label: string; help?: string; min?: number; max?: number; step?: number; percent?: boolean }
  | {
      type: 'select';
      name: string;
      prop: string;
      label: string;
      help?: string;
      options: readonly { value: string; label: string }[];
      /** reads what an MDX prop or share link gives ("3/4 in") into an option value ("3/4") */
      normalize?: (raw: string) => string;
    }
  | {
      type: 'checks';
      name: string;
      prop: string;
      label: string;
      help?: string;
      options: readonly { value: string; label: string }[];
      normalize?: (raw: string) => string;
    }
  | { type: 'text'; name: string; prop: string; label: string; help?: string; placeholder?: string };

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

export interface CalculatorDef<R = unknown> {
  id: string;
  title: string;
  blurb: string;
  fields: readonly FieldDef[];
  /** starting values as MDX props would give them, e.g. { fall: '4 ft' } */
  defaults: Record<string, string>;
  /** turns parsed fields into the engine input (extra fields, defaults, arrays) */
  toInput?: (values: Record<string, unknown>) => unknown;
  run: (input: unknown) => CalcOutput<R>;
  rows: (results: R) => ResultRow[];
  chart?: (results: R, units: UnitSystem, input: Record<string, unknown>) => ReactNode;
  /** a panel of its own under the result rows (e.g. the stall check's ranked causes) */
  extra?: (results: R, units: UnitSystem) => ReactNode;
  /** fields shown only when `when(values)` holds (e.g. staged-only inputs) */
  visible?: (fieldName: string, state: FormState) => boolean;
  /** guide slug that explains this calculator */
  guide: string;
}
