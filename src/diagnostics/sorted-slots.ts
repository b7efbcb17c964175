/**
 * One sort of a column that serves two readers: the ascending values (the swing grid is built from
 * them, diagnostics/swing.ts) and, for every row, the index of its value among the distinct values
 * (the spike figure's mean target per value sums each row into its value's slot,
 * diagnostics/spikes.ts), so that the rows need not look their values up again.
 */
import { borrowInts, returnInts } from '../core/scratch.js';

/**
 * Most moves of the insertion sorts, per row: more declines the column (its distinct values are
 * not spread evenly). Repeated values cost none (equal values stay in row order).
 */
const MOVES_PER_ROW = 16;

/**
 * Sorts column[0..n) into out[0..n) ascending in the order of the built-in typed-array sort (-0
 * before +0), and sets slots[r] to the index of row r's value among the distinct values of the
 * sorted column (values equal to `===` share one: -0 and +0 are one value, as the packing of
 * distinct values keeps them). A distribution sort of the row indices (Knuth, The Art of Computer
 * Programming, vol. 3, 2nd ed., sec. 5.2.5: about n/4 buckets of equal width between the
 * extremes, insertion sort in each). Returns false, with `out` and `slots` untouched, when the
 * column holds a NaN, its extremes are equal or not finite, or the insertion sorts would move
 * values more than 16 times per row (distinct values bunched in few buckets); the caller then
 * sorts another way.
 *
 * @param column the values (not modified; length >= n)
 * @param n rows (n >= 1)
 * @param out receives the sorted values (length >= n)
 * @param slots receives each row's slot (length >= n)
 */
export function sortWithSlots(column: Float64Array, n: number, out: Float64Array, slots: Int32Array): boolean {
  if (n < 2) return false;
  const ends = new Float64Array(2);
  if (!extremes(column, n, ends)) return false;
  const lo = ends[0];
  const hi = ends[1];
  const buckets = Math.max(1, n >> 2);
  const scale = buckets / (hi - lo);
  if (!(hi > lo) || !Number.isFinite(lo) || !Number.isFinite(hi) || !Number.isFinite(scale) || !(scale > 0)) return false;
  const start = borrowInts(buckets + 1);
  const order = borrowInts(n);
  try {
    countBuckets(column, n, lo, scale, buckets - 1, start);
    prefixSums(start, buckets);
    placeRows(column, n, lo, scale, buckets - 1, start, order);
    // placeRows advanced each bucket's start to the next one's: bucket b now runs from start[b - 1].
    if (!sortBuckets(column, order, start, buckets, MOVES_PER_ROW * n)) return false;
    writeSorted(column, order, n, out, slots);
    return true;
  } finally {
    returnInts(order);
    returnInts(start);
  }
}

// The passes are one loop each (see DEVELOPERS.md, "Writing hot loops").

/** ends = [smallest, largest] of column[0..n); false when a value is NaN. */
function extremes(column: Float64Array, n: number, ends: Float64Array): boolean {
  let lo = Infinity;
  let hi = -Infinity;
  for (let i = 0; i < n; i++) {
    const v = column[i];
    if (Number.isNaN(v)) return false;
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  ends[0] = lo;
  ends[1] = hi;
  return true;
}

/** start[b + 1] = rows whose bucket is b (start all zeros, buckets + 1 long). */
function countBuckets(column: Float64Array, n: number, lo: number, scale: number, last: number, start: Int32Array): void {
  for (let i = 0; i < n; i++) start[Math.min(last, Math.floor((column[i] - lo) * scale)) + 1]++;
}

/** Turns the counts of {@link countBuckets} into each bucket's first position. */
function prefixSums(start: Int32Array, buckets: number): void {
  for (let b = 0; b < buckets; b++) start[b + 1] += start[b];
}

/** order[...] = the rows bucket by bucket, in row order within each; start[b] ends at bucket b's end. */
function placeRows(column: Float64Array, n: number, lo: number, scale: number, last: number, start: Int32Array, order: Int32Array): void {
  for (let i = 0; i < n; i++) order[start[Math.min(last, Math.floor((column[i] - lo) * scale))]++] = i;
}

/**
 * Insertion sort of each bucket's rows by value (bucket b at order[b > 0 ? start[b - 1] : 0 ..
 * start[b])); false, leaving `order` part sorted, as soon as more than `budget` moves were made.
 */
function sortBuckets(column: Float64Array, order: Int32Array, start: Int32Array, buckets: number, budget: number): boolean {
  let from = 0;
  let left = budget;
  for (let b = 0; b < buckets; b++) {
    const end = start[b];
    for (let i = from + 1; i < end; i++) {
      const row = order[i];
      const v = column[row];
      let j = i - 1;
      while (j >= from && sortsBefore(v, column[order[j]])) {
        if (--left < 0) return false;
        order[j + 1] = order[j];
        j--;
      }
      order[j + 1] = row;
    }
    from = end;
  }
  return true;
}

/** a < b in the order of the built-in sort (-0 before +0). */
function sortsBefore(a: number, b: number): boolean {
  return a < b || (a === 0 && b === 0 && Object.is(a, -0) && !Object.is(b, -0));
}

/** out[i] = the i-th smallest value; slots[row] = its distinct value's index (a new slot where the value changes, `!==`). */
function writeSorted(column: Float64Array, order: Int32Array, n: number, out: Float64Array, slots: Int32Array): void {
  let slot = -1;
  let previous = 0;
  for (let i = 0; i < n; i++) {
    const row = order[i];
    const v = column[row];
    if (i === 0 || v !== previous) slot++;
    previous = v;
    out[i] = v;
    slots[row] = slot;
  }
}
