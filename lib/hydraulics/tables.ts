/**
 * Lookup in the engine's small property tables (water, weir coefficients):
 * rows sorted by their first column, read by linear interpolation.
 */

/** A row: the column looked up first, then the values. */
export type Row = readonly [number, ...number[]];
/** A table of at least two rows, so every lookup has a pair to interpolate in. */
export type Table<R extends Row> = readonly [R, R, ...R[]];

/**
 * The pair of neighbouring rows to interpolate in at x: the first pair whose
 * upper row reaches x, or the last pair when x lies beyond the table (the
 * caller clamps x first when it must not extrapolate).
 * @example
 * bracketRows([[0, 10], [10, 20], [20, 40]], 15)  // → [[10, 20], [20, 40]]
 * bracketRows([[0, 10], [10, 20], [20, 40]], 10)  // → [[0, 10], [10, 20]]
 * bracketRows([[0, 10], [10, 20], [20, 40]], 99)  // → [[10, 20], [20, 40]]
 */
export function bracketRows<R extends Row>(table: Table<R>, x: number): [R, R] {
  let a = table[0];
  let b = table[1];
  for (let i = 2; i < table.length && b[0] < x; i++) {
    const next = table[i];
    if (next === undefined) break;
    a = b;
    b = next;
  }
  return [a, b];
}
