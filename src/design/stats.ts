/**
 * Column statistics used to fix basis parameters.
 */

/**
 * Mean and population standard deviation sqrt(mean((x - mean)^2)) of the first `n` entries,
 * by two passes (the second on deviations, so no cancellation). Empty input gives NaN.
 */
export function meanAndSd(x: Float64Array, n = x.length): { mean: number; sd: number } {
  if (n === 0) return { mean: Number.NaN, sd: Number.NaN };
  let mean = sumOf(x, n) / n;
  // One correction step (mean of deviations) keeps the mean exact to rounding for large offsets.
  mean += sumOfDeviations(x, n, mean) / n;
  return { mean, sd: Math.sqrt(sumOfSquaredDeviations(x, n, mean) / n) };
}

// The passes below are separate functions, each one loop followed by nothing but its return, so
// that V8's code optimised in the middle of a long loop never runs into code it has no type
// feedback for (which throws the optimised code away; see DEVELOPERS.md, "Writing hot loops").

function sumOf(x: Float64Array, n: number): number {
  let sum = 0;
  for (let i = 0; i < n; i++) sum += x[i];
  return sum;
}

/** Sum of x[i] - shift over x[0..n), added in order. */
export function sumOfDeviations(x: Float64Array, n: number, shift: number): number {
  let dev = 0;
  for (let i = 0; i < n; i++) dev += x[i] - shift;
  return dev;
}

/** Sum of (x[i] - shift)^2 over x[0..n), added in order. */
export function sumOfSquaredDeviations(x: Float64Array, n: number, shift: number): number {
  let ss = 0;
  for (let i = 0; i < n; i++) {
    const d = x[i] - shift;
    ss += d * d;
  }
  return ss;
}

/** Smallest and largest of the first `n` entries (NaN entries ignored); [Infinity, -Infinity] when empty. */
export function range(x: Float64Array, n = x.length): [number, number] {
  return [smallest(x, n), largest(x, n)];
}

/** Smallest of x[0..n), NaN ignored; Infinity when empty. */
export function smallest(x: Float64Array, n: number): number {
  let lo = Infinity;
  for (let i = 0; i < n; i++) if (x[i] < lo) lo = x[i];
  return lo;
}

/** Largest of x[0..n), NaN ignored; -Infinity when empty. */
export function largest(x: Float64Array, n: number): number {
  let hi = -Infinity;
  for (let i = 0; i < n; i++) if (x[i] > hi) hi = x[i];
  return hi;
}
