/**
 * Helpers shared by the calculators' zod schemas: numeric fields that carry
 * their accepted range (so a failed parse can say which range), and the
 * parse step that turns zod issues into an {@link EngineInputError}.
 */
import * as z from 'zod/mini';
import { EngineInputError, describeRange, type FieldIssue, type FieldRange } from './errors';

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

/** Adds a cross-field issue (e.g. lift at or below the fall) with its range, for schemas' superRefine. */
export function addRangeIssue(
  ctx: z.core.$RefinementCtx,
  path: (string | number)[],
  message: string,
  range: FieldRange,
): void {
  ctx.addIssue({ code: 'custom', message, path, params: { range } });
}

function issueRange(issue: z.core.$ZodIssue): FieldRange | undefined {
  if (issue.code === 'custom') {
    const params = (issue as { params?: { range?: FieldRange } }).params;
    if (params?.range) return params.range;
  }
  return RANGE_BY_MESSAGE.get(issue.message);
}

/**
 * Parses input against a schema; throws EngineInputError listing every failing field with its range.
 * @example a fall of 0 is refused, naming the field and its range (0, 100] m
 * const input = { driveFlowM3s: 1e-4, fallM: 0, liftM: 8 }
 * parseInput(yieldEstimateSchema, input)  // throws EngineInputError
 * const refused = (() => { try { parseInput(yieldEstimateSchema, input) } catch (e) { return e } })()
 * refused.field  // → 'fallM'
 * [refused.range.min, refused.range.minExclusive, refused.range.max, refused.range.unit]  // → [0, true, 100, 'm']
 */
export function parseInput<S extends z.ZodMiniType>(schema: S, input: unknown): z.output<S> {
  const r = schema.safeParse(input);
  if (r.success) return r.data;
  const issues: FieldIssue[] = r.error.issues.map((issue) => ({
    field: issue.path.length > 0 ? issue.path.map(String).join('.') : '(input)',
    message: issue.message,
    range: issueRange(issue),
  }));
  throw new EngineInputError(issues);
}
