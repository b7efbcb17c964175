/**
 * Medians of training columns, computed once per column and shared by every reader (swing,
 * charts): selection on a scratch copy, remembered per column array.
 */

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
    s.set(values.subarray(0, n));
    const upper = selectKth(s, n >> 1);
    if (n % 2 === 1) median = upper;
    else {
      // The lower middle is the largest value left of the upper middle after selection.
      let lower = -Infinity;
      for (let i = 0; i < n >> 1; i++) if (s[i] > lower) lower = s[i];
      median = (lower + upper) / 2;
    }
  }
  remembered.set(values, { n, median });
  return median;
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
    if (x > y) [x, y] = [y, x];
    if (y > z) [y, z] = [z, y];
    if (x > y) [x, y] = [y, x];
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
