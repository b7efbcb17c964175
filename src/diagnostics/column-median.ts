/**
 * Medians of training columns, computed once per column and shared by every reader (swing,
 * charts): selection on a scratch copy, remembered per column array.
 */
import { largest } from '../design/stats.js';

const remembered = new WeakMap<Float64Array, { n: number; median: number }>();

/**
 * Median of the first n values of a column: the middle value, or the mean of the two middle
 * values when n is even; NaN when n = 0. Remembered per column array (and n), so a second
 * reader gets it for free. The column is not modified.
 *
 * @param values the column (length >= n)
 * @param n rows to take
 * @param scratch optional work array of length >= n (default: a new one)
 */
export function columnMedian(values: Float64Array, n: number, scratch?: Float64Array): number {
  const known = remembered.get(values);
  if (known !== undefined && known.n === n) return known.median;
  let median = Number.NaN;
  if (n > 0) {
    const s = scratch !== undefined && scratch.length >= n ? scratch.subarray(0, n) : new Float64Array(n);
    median = (n >= BRACKET_MIN_ROWS ? bracketedMedian(values, n, s) : null) ?? selectedMedian(values, n, s);
  }
  remembered.set(values, { n, median });
  return median;
}

/**
 * {@link columnMedian} of the first n values of a column, read off the same values already sorted
 * ascending (`sorted[0..n)`, the order of the built-in typed-array sort), and remembered as
 * columnMedian remembers it. The median's value is fixed by the sorted values, so it equals the
 * selection's except where the selection may return either of two equal values: a middle value of
 * 0 (-0 or +0) or a NaN anywhere (sorted last); then it selects as columnMedian does.
 *
 * @param values the column (length >= n)
 * @param n rows to take (n >= 1)
 * @param sorted values[0..n) sorted ascending (length >= n)
 * @param scratch optional work array for the selection (length >= n)
 */
export function medianOfSorted(values: Float64Array, n: number, sorted: Float64Array, scratch?: Float64Array): number {
  const upper = n >> 1;
  const high = sorted[upper];
  const low = n % 2 === 1 ? high : sorted[upper - 1];
  if (n < 1 || Number.isNaN(sorted[n - 1]) || high === 0 || low === 0) return columnMedian(values, n, scratch);
  const median = n % 2 === 1 ? high : (low + high) / 2;
  remembered.set(values, { n, median });
  return median;
}

/** Columns of at least this many rows try {@link bracketedMedian} first. */
const BRACKET_MIN_ROWS = 16384;
/** Rows in the bracketing sample. */
const BRACKET_SAMPLE = 2048;
/** Sample ranks on each side of the sample's middle that bound the bracket (about 9 standard deviations of the middle's rank). */
const BRACKET_HALF_WIDTH = 200;

/** The median by selection on a copy of all n values (in `work`, length >= n). */
function selectedMedian(values: Float64Array, n: number, work: Float64Array): number {
  const s = work.subarray(0, n);
  s.set(values.subarray(0, n));
  return middleOf(s, n, n >> 1);
}

/**
 * The median of a[0..m) given that the wanted middle ranks are `upper` (and `upper - 1` when n is
 * even) of the whole column, counted from a's first value: selection on a.
 */
function middleOf(a: Float64Array, n: number, upper: number): number {
  const value = selectKth(a, upper);
  if (n % 2 === 1) return value;
  // The lower middle is the largest value left of the upper middle after selection.
  return (largest(a, upper) + value) / 2;
}

/**
 * The exact median in one pass over the column and a selection among a tenth of it: the middle
 * ranks are bracketed by two values of a sorted even-stride sample, the pass counts the values
 * below the bracket and gathers those inside it, and the middle is selected among those (the
 * sampling step of Floyd & Rivest, "Expected time bounds for selection", Communications of the ACM
 * 18(3), 1975). Returns null when the bracket misses a middle rank or holds too many values (the
 * caller then selects among all of them), so the result is always the exact median.
 */
function bracketedMedian(values: Float64Array, n: number, work: Float64Array): number | null {
  const sample = new Float64Array(BRACKET_SAMPLE);
  for (let t = 0; t < BRACKET_SAMPLE; t++) sample[t] = values[Math.floor((t * n) / BRACKET_SAMPLE)];
  sample.sort();
  const lo = sample[BRACKET_SAMPLE / 2 - BRACKET_HALF_WIDTH];
  const hi = sample[BRACKET_SAMPLE / 2 + BRACKET_HALF_WIDTH];
  const inside = gatherBracket(values, n, lo, hi, work, Math.min(n, work.length));
  if (inside < 0) return null;
  const below = countBelow(values, n, lo);
  const upper = n >> 1;
  const lower = n % 2 === 1 ? upper : upper - 1;
  // Both middle ranks must fall among the gathered values.
  if (lower < below || upper >= below + inside) return null;
  return middleOf(work.subarray(0, inside), n, upper - below);
}

// The passes below are one loop and a return each (see DEVELOPERS.md, "Writing hot loops").

/**
 * One pass: copies the values in [lo, hi] to `out` (in column order) and returns how many; -1 when
 * more than `capacity` values fall in the bracket.
 */
function gatherBracket(values: Float64Array, n: number, lo: number, hi: number, out: Float64Array, capacity: number): number {
  let inside = 0;
  for (let i = 0; i < n; i++) {
    const v = values[i];
    if (v >= lo && v <= hi) {
      if (inside === capacity) return -1;
      out[inside++] = v;
    }
  }
  return inside;
}

/** Values below `lo` among values[0..n). */
function countBelow(values: Float64Array, n: number, lo: number): number {
  let below = 0;
  for (let i = 0; i < n; i++) if (values[i] < lo) below++;
  return below;
}

/**
 * k-th smallest value (0-based) of a, partially reordering it so that a[i] <= a[k] for i < k
 * (Hoare's selection, "FIND", Communications of the ACM 4(7), 1961; middle-of-three pivot).
 *
 * @param a values (reordered in place)
 * @param k rank, 0 <= k < a.length
 */
export function selectKth(a: Float64Array, k: number): number {
  let lo = 0;
  let hi = a.length - 1;
  while (hi > lo) {
    const mid = (lo + hi) >> 1;
    let x = a[lo];
    let y = a[mid];
    let z = a[hi];
    // Sort the three with plain swaps (no array literals: see DEVELOPERS.md, "Writing hot loops").
    let t: number;
    if (x > y) {
      t = x;
      x = y;
      y = t;
    }
    if (y > z) {
      t = y;
      y = z;
      z = t;
    }
    if (x > y) {
      t = x;
      x = y;
      y = t;
    }
    const pivot = y;
    let i = lo;
    let j = hi;
    while (i <= j) {
      while (a[i] < pivot) i++;
      while (a[j] > pivot) j--;
      if (i <= j) {
        const t = a[i];
        a[i] = a[j];
        a[j] = t;
        i++;
        j--;
      }
    }
    if (k <= j) hi = j;
    else if (k >= i) lo = i;
    else return a[k];
  }
  return a[k];
}
