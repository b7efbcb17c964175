/**
 * The largest and smallest of many numbers without spreading them into a call: `Math.max(...xs)`
 * passes every element as an argument and throws a RangeError once an array is larger than the
 * engine's argument limit (about 100,000 elements), so no module spreads an array into a call.
 */

/**
 * The largest value, as `Math.max` gives it: NaN when any value is NaN, `start` when there are none.
 * @param values any numbers
 * @param start the result for no values; default -Infinity (as `Math.max()`)
 */
export function maxOf(values: Iterable<number>, start = -Infinity): number {
  let best = start;
  for (const v of values) {
    if (Number.isNaN(v)) return Number.NaN;
    if (v > best) best = v;
  }
  return best;
}

/**
 * The smallest value, as `Math.min` gives it: NaN when any value is NaN, `start` when there are none.
 * @param values any numbers
 * @param start the result for no values; default Infinity (as `Math.min()`)
 */
export function minOf(values: Iterable<number>, start = Infinity): number {
  let best = start;
  for (const v of values) {
    if (Number.isNaN(v)) return Number.NaN;
    if (v < best) best = v;
  }
  return best;
}
