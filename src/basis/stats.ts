/**
 * Column statistics used to fix basis parameters.
 */

/**
 * Mean and population standard deviation sqrt(mean((x - mean)^2)) of the first `n` entries,
 * by two passes (the second on deviations, so no cancellation). Empty input gives NaN.
 */
export function meanAndSd(x: Float64Array, n = x.length): { mean: number; sd: number } {
  if (n === 0) return { mean: Number.NaN, sd: Number.NaN };
  let sum = 0;
  for (let i = 0; i < n; i++) sum += x[i];
  let mean = sum / n;
  // One correction step (mean of deviations) keeps the mean exact to rounding for large offsets.
  let dev = 0;
  for (let i = 0; i < n; i++) dev += x[i] - mean;
  mean += dev / n;
  let ss = 0;
  for (let i = 0; i < n; i++) {
    const d = x[i] - mean;
    ss += d * d;
  }
  return { mean, sd: Math.sqrt(ss / n) };
}

/** Smallest and largest of the first `n` entries; [Infinity, -Infinity] when empty. */
export function range(x: Float64Array, n = x.length): [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  for (let i = 0; i < n; i++) {
    const v = x[i];
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  return [lo, hi];
}
