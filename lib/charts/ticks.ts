/**
 * Round tick values for a chart axis, after Heckbert, "Nice numbers for graph labels",
 * Graphics Gems (1990): the step is 1, 2 or 5 times a power of ten, and the axis runs
 * from a multiple of the step below the data to one above it, so a reader sees
 * 0, 25, 50 rather than 4.8, 29.8, 54.8.
 */

/** A "nice" number near x: 1, 2, 5 or 10 times a power of ten (rounded, or the next one up). */
export function niceNumber(x: number, round: boolean): number {
  if (!(x > 0) || !Number.isFinite(x)) throw new RangeError(`niceNumber needs a positive finite number, got ${x}`);
  const exponent = Math.floor(Math.log10(x));
  const fraction = x / 10 ** exponent;
  let nice: number;
  if (round) nice = fraction < 1.5 ? 1 : fraction < 3 ? 2 : fraction < 7 ? 5 : 10;
  else nice = fraction <= 1 ? 1 : fraction <= 2 ? 2 : fraction <= 5 ? 5 : 10;
  // 10 ** -2 is 0.01 exactly only once rounded; the decimals keep 0.1 × 3 from printing 0.30000000000000004
  return Number((nice * 10 ** exponent).toFixed(Math.max(0, -exponent)));
}

export interface Ticks {
  /** The axis ends: a whole number of steps, enclosing the data. */
  min: number;
  max: number;
  step: number;
  values: number[];
  /** Decimal places that print every tick exactly (0 for a step of 5, 1 for 0.5, 2 for 0.25's 0.2 step). */
  decimals: number;
}

/**
 * Ticks for data spanning [lo, hi], about `count` of them (Heckbert's "loose labelling").
 * An empty span (one value) widens to a unit around it so the axis still has a length.
 */
export function niceTicks(lo: number, hi: number, count = 5): Ticks {
  if (!Number.isFinite(lo) || !Number.isFinite(hi))
    throw new RangeError(`niceTicks needs finite ends, got ${lo}, ${hi}`);
  if (lo > hi) [lo, hi] = [hi, lo];
  if (lo === hi) {
    const pad = lo === 0 ? 1 : Math.abs(lo) / 2;
    lo -= pad;
    hi += pad;
    if (lo < 0 && hi - 2 * pad >= 0) lo = 0;
  }
  const n = Math.max(2, Math.round(count));
  const range = niceNumber(hi - lo, false);
  const step = niceNumber(range / (n - 1), true);
  const decimals = Math.max(0, -Math.floor(Math.log10(step)));
  const fix = (v: number) => Number(v.toFixed(decimals)) + 0; // + 0 turns -0 into 0
  const min = fix(Math.floor(lo / step + 1e-9) * step);
  const max = fix(Math.ceil(hi / step - 1e-9) * step);
  const values: number[] = [];
  for (let i = 0; min + i * step <= max + step / 2; i++) values.push(fix(min + i * step));
  return { min, max, step, values, decimals };
}

/** A tick as printed: the step's decimals, thousands grouped, never e-notation. */
export function formatTick(v: number, decimals: number): string {
  return v.toLocaleString('en-US', { minimumFractionDigits: decimals, maximumFractionDigits: decimals });
}

/** The span of some values, always including `also` (the reader's own point) and, if asked, zero. */
export function spanOf(values: number[], also: number[] = [], withZero = false): [number, number] {
  const all = [...values, ...also, ...(withZero ? [0] : [])].filter(Number.isFinite);
  if (!all.length) return [0, 1];
  return [Math.min(...all), Math.max(...all)];
}
