import type { MessagePart } from './message';

/**
 * Typed input errors. Every calculator validates its own input and throws
 * {@link EngineInputError} naming the field and the range it accepts, so a
 * form can put the message beside the right box.
 */

/** The range a numeric field accepts, in the field's SI unit. */
export interface FieldRange {
  min?: number;
  max?: number;
  /** true when `min` itself is not allowed (e.g. a fall must be > 0). */
  minExclusive?: boolean;
  maxExclusive?: boolean;
  /** SI unit of min and max, e.g. "m", "m³/s", "Pa"; "" when dimensionless. */
  unit: string;
}

/** One field that failed, with a plain-words message. */
export interface FieldIssue {
  /** Dotted path of the field, e.g. "fallM" or "drivePipe.lengthM" or "trials.0.timeS". */
  field: string;
  /** in SI units */
  message: string;
  range?: FieldRange;
  /** the message with its numbers as quantities, for showing in the reader's units (message.ts) */
  parts?: MessagePart[];
}

/** Thrown for invalid input. `field` and `range` describe the first issue; `issues` lists all. */
export class EngineInputError extends Error {
  readonly field: string;
  readonly range?: FieldRange;
  /** never empty, so `issues[0]` is always there */
  readonly issues: [FieldIssue, ...FieldIssue[]];

  constructor(issues: FieldIssue[]) {
    const [first = { field: '(input)', message: 'invalid input' }, ...rest] = issues;
    const list: [FieldIssue, ...FieldIssue[]] = [first, ...rest];
    super(list.map((i) => `${i.field}: ${i.message}`).join('; '));
    this.name = 'EngineInputError';
    this.field = first.field;
    this.range = first.range;
    this.issues = list;
  }
}

/**
 * Describes a range in words.
 * @example
 * describeRange({ min: 0, minExclusive: true, max: 100, unit: 'm' })  // → 'greater than 0 and at most 100 m'
 */
export function describeRange(r: FieldRange): string {
  const u = r.unit ? ` ${r.unit}` : '';
  const lo = r.min === undefined ? '' : `${r.minExclusive ? 'greater than' : 'at least'} ${r.min}`;
  const hi = r.max === undefined ? '' : `${r.maxExclusive ? 'less than' : 'at most'} ${r.max}`;
  if (lo && hi) return `${lo} and ${hi}${u}`;
  return `${lo || hi}${u}`;
}
