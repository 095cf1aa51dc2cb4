/**
 * Helpers shared by the calculators' zod schemas: numeric fields that carry
 * their accepted range (so a failed parse can say which range), and the
 * parse step that turns zod issues into an {@link EngineInputError}.
 */
import * as z from 'zod/mini';
import { EngineInputError, describeRange, type FieldIssue, type FieldRange } from './errors';
import { metricText, qty, renderMessage, say, type MessagePart } from './message';
import { kindOfField, type QuantityKind } from './units';

/** Ranges keyed by the message they produced; the message is built from the range, so the map is exact. */
const RANGE_BY_MESSAGE = new Map<string, FieldRange>();

export interface NumberSpec extends FieldRange {
  integer?: boolean;
}

/**
 * A finite number field in SI units with an accepted range. zod 4 already
 * rejects NaN and ±Infinity for z.number(); the same message is used for a
 * wrong type, a missing value and an out-of-range value so the form always
 * shows the range.
 * @example a fall: rejects 0, −1, NaN and 101 with the range in words
 * const fall = siNumber({ min: 0, minExclusive: true, max: 100, unit: 'm' })
 * [0, -1, NaN, 101].map((x) => fall.safeParse(x).success)  // → [false, false, false, false]
 * fall.safeParse(101).error.issues[0].message  // → 'must be a number greater than 0 and at most 100 m'
 * fall.safeParse(1.2192).success  // → true
 */
export function siNumber(spec: NumberSpec): z.ZodMiniNumber<number> {
  const range: FieldRange = {
    min: spec.min,
    max: spec.max,
    minExclusive: spec.minExclusive,
    maxExclusive: spec.maxExclusive,
    unit: spec.unit,
  };
  const message = `must be ${spec.integer ? 'a whole number' : 'a number'} ${describeRange(range)}`;
  RANGE_BY_MESSAGE.set(message, range);
  const err = { error: message };
  const checks: z.core.$ZodCheck<number>[] = [];
  if (spec.integer) checks.push(z.multipleOf(1, err));
  if (spec.min !== undefined) checks.push(spec.minExclusive ? z.gt(spec.min, err) : z.gte(spec.min, err));
  if (spec.max !== undefined) checks.push(spec.maxExclusive ? z.lt(spec.max, err) : z.lte(spec.max, err));
  const s = z.number(err);
  return checks.length ? s.check(...checks) : s;
}

/** Water temperature, °C; the tables in water.ts cover 0–40 °C. Default 10 °C, a spring-fed source. */
export const waterTempC = () => z._default(siNumber({ min: 0, max: 40, unit: '°C' }), 10);

/** Fall (supply head) from the intake's water surface down to the pump, m. */
export const fallM = () => siNumber({ min: 0, minExclusive: true, max: 100, unit: 'm' });

/** Lift (delivery head) from the pump up to the delivery outlet, m. Must also exceed the fall (checked per calculator). */
export const liftM = () => siNumber({ min: 0, minExclusive: true, max: 1000, unit: 'm' });

/** A flow such as a ram's drive flow or a source's spare flow, m³/s (0.1 m³/s ≈ 1,600 US gal/min). */
export const flowM3s = () => siNumber({ min: 0, minExclusive: true, max: 0.1, unit: 'm³/s' });

/** A ram efficiency (D'Aubuisson), dimensionless. */
export const efficiency = () => siNumber({ min: 0, minExclusive: true, max: 1, unit: '' });

/**
 * Adds a cross-field issue (e.g. lift at or below the fall) with its range, for schemas'
 * superRefine. A message with numbers is written with `say`, so it reaches the reader in
 * their units.
 */
export function addRangeIssue(
  ctx: z.core.$RefinementCtx,
  path: (string | number)[],
  message: string | MessagePart[],
  range: FieldRange,
): void {
  const parts = typeof message === 'string' ? undefined : message;
  const text = parts ? renderMessage(parts, metricText) : (message as string);
  ctx.addIssue({ code: 'custom', message: text, path, params: { range, parts } });
}

function issueParams(issue: z.core.$ZodIssue): { range?: FieldRange; parts?: MessagePart[] } {
  if (issue.code === 'custom') {
    const params = (issue as { params?: { range?: FieldRange; parts?: MessagePart[] } }).params;
    if (params?.range) return params;
  }
  return { range: RANGE_BY_MESSAGE.get(issue.message) };
}

/** The SI unit a range is written in, read back as a quantity kind when the field name does not say. */
const KIND_OF_SI_UNIT: Record<string, QuantityKind> = {
  m: 'length',
  'm³/s': 'flow',
  'm³/day': 'dailyVolume',
  'm³': 'volume',
  'm²': 'area',
  Pa: 'pressure',
  'm/s': 'velocity',
  s: 'time',
  '°C': 'temperature',
};

/**
 * A range in words with its ends as quantities, e.g. "greater than 0 m and at most 100 m".
 * @example
 * rangeParts({ min: 0, minExclusive: true, max: 100, unit: 'm' }, 'length')  // → ['greater than ', { kind: 'length', si: 0 }, ' and at most ', { kind: 'length', si: 100 }]
 */
export function rangeParts(r: FieldRange, kind: QuantityKind): MessagePart[] {
  const lo = r.min === undefined ? undefined : say`${r.minExclusive ? 'greater than' : 'at least'} ${qty(kind, r.min)}`;
  const hi = r.max === undefined ? undefined : say`${r.maxExclusive ? 'less than' : 'at most'} ${qty(kind, r.max)}`;
  return lo && hi ? say`${lo} and ${hi}` : (lo ?? hi ?? []);
}

/** An issue's words with quantities: the schema's own, or its range's ends where the message is the range's. */
function issueParts(field: string, message: string, range: FieldRange | undefined): MessagePart[] | undefined {
  if (!range || range.unit === '') return undefined;
  const kind = kindOfField(field) ?? KIND_OF_SI_UNIT[range.unit];
  const words = describeRange(range);
  if (!kind || !message.endsWith(words)) return undefined;
  return say`${message.slice(0, message.length - words.length)}${rangeParts(range, kind)}`;
}

/**
 * Parses input against a schema; throws EngineInputError listing every failing field with its range.
 * @example a fall of 0 is refused, naming the field and its range (0, 100] m
 * const input = { driveFlowM3s: 1e-4, fallM: 0, liftM: 8 }
 * parseInput(yieldEstimateSchema, input)  // throws EngineInputError
 * const refused = (() => { try { parseInput(yieldEstimateSchema, input) } catch (e) { return e } })()
 * refused.field  // → 'fallM'
 * [refused.range.min, refused.range.minExclusive, refused.range.max, refused.range.unit]  // → [0, true, 100, 'm']
 * @example the message keeps its numbers as quantities, for the reader's units
 * const tooHigh = (() => { try { parseInput(yieldEstimateSchema, { driveFlowM3s: 1e-4, fallM: 101, liftM: 200 }) } catch (e) { return e } })()
 * tooHigh.issues[0].parts  // → ['must be a number greater than ', { kind: 'length', si: 0 }, ' and at most ', { kind: 'length', si: 100 }]
 */
export function parseInput<S extends z.ZodMiniType>(schema: S, input: unknown): z.output<S> {
  const r = schema.safeParse(input);
  if (r.success) return r.data;
  const issues: FieldIssue[] = r.error.issues.map((issue) => {
    const field = issue.path.length > 0 ? issue.path.map(String).join('.') : '(input)';
    const { range, parts } = issueParams(issue);
    const withParts = parts ?? issueParts(field, issue.message, range);
    return { field, message: issue.message, range, ...(withParts ? { parts: withParts } : {}) };
  });
  throw new EngineInputError(issues);
}
