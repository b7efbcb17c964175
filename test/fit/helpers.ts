/** Test helpers for the fitting engine: seeded random designs and small dense algebra. */
import { Matrix } from 'ml-matrix';

/** Park-Miller minimal standard generator, uniform in (0, 1); seeded so failures reproduce. */
export function seeded(seed: number): () => number {
  let state = seed;
  return () => {
    state = (state * 16807) % 2147483647;
    return state / 2147483647;
  };
}

/** A column-major n x p design with an intercept column and uniform(-1, 1) columns, and y = X w + noise. */
export function randomProblem(n: number, p: number, seed: number, noise = 0.1): { X: Float64Array; y: Float64Array; w: Float64Array } {
  const rnd = seeded(seed);
  const X = new Float64Array(n * p);
  for (let i = 0; i < n; i++) X[i] = 1;
  for (let k = n; k < n * p; k++) X[k] = 2 * rnd() - 1;
  const w = Float64Array.from({ length: p }, (_, j) => j + 1);
  const y = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let t = noise * (2 * rnd() - 1);
    for (let j = 0; j < p; j++) t += X[j * n + i] * w[j];
    y[i] = t;
  }
  return { X, y, w };
}

/** Column-major Float64Array -> ml-matrix Matrix. */
export function toMatrix(A: Float64Array, rows: number, cols: number): Matrix {
  const M = new Matrix(rows, cols);
  for (let j = 0; j < cols; j++) for (let i = 0; i < rows; i++) M.set(i, j, A[j * rows + i]);
  return M;
}

/** Rows [from, to) of a column-major n x p matrix, column-major. */
export function sliceRows(X: Float64Array, n: number, p: number, from: number, to: number): Float64Array {
  const m = to - from;
  const out = new Float64Array(m * p);
  for (let j = 0; j < p; j++) out.set(X.subarray(j * n + from, j * n + to), j * m);
  return out;
}

/** Stacks two column-major blocks with p columns vertically. */
export function stackRows(A: Float64Array, ma: number, B: Float64Array, mb: number, p: number): Float64Array {
  const m = ma + mb;
  const out = new Float64Array(m * p);
  for (let j = 0; j < p; j++) {
    out.set(A.subarray(j * ma, (j + 1) * ma), j * m);
    out.set(B.subarray(j * mb, (j + 1) * mb), j * m + ma);
  }
  return out;
}

/** max_i |a_i - b_i| / max(max_i |b_i|, tiny). */
export function maxRelDiff(a: ArrayLike<number>, b: ArrayLike<number>): number {
  let d = 0;
  let scale = 0;
  for (let i = 0; i < b.length; i++) {
    d = Math.max(d, Math.abs(a[i] - b[i]));
    scale = Math.max(scale, Math.abs(b[i]));
  }
  return d / Math.max(scale, Number.MIN_VALUE);
}

/** A short description of two vectors for failure messages. */
export function show(actual: ArrayLike<number>, expected: ArrayLike<number>, tol: number): string {
  return `actual [${Array.from(actual)
    .map((v) => v.toPrecision(8))
    .join(', ')}], expected [${Array.from(expected)
    .map((v) => v.toPrecision(8))
    .join(', ')}], max rel diff ${maxRelDiff(actual, expected).toExponential(2)}, tolerance ${tol}`;
}
