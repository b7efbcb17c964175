/**
 * One block of the refinement pass (fit/index.ts, RefinementPass): the residuals r = y - X w of
 * the block's rows in double-double arithmetic and the compensated dot product of each column
 * with them (Ogita, Rump & Oishi 2005, "Accurate sum and dot product", SIAM J. Sci. Comput.
 * 26(6), algorithm Dot2). In WebAssembly where it is in use (kernels.wat, `refine`), else in
 * JavaScript ({@link refineRowsJs}, the reference).
 */
import { facade } from './engine.js';
import { sumOfSquares, type BadValue } from './qr-fold.js';
import { heap, type KernelExports } from './wasm.js';

/** What {@link refineRows} returns besides the updated sums. */
export interface RefineOutcome {
  /** Sum of squares of the residuals' high parts (0 when a value was not finite). */
  sumOfSquares: number;
  /** The first value that is not finite (X in column-major order, then y), or null. */
  bad: BadValue | null;
}

/** The JavaScript reference of {@link refineRows}. */
export function refineRowsJs(
  X: Float64Array,
  y: Float64Array,
  m: number,
  w: Float64Array,
  gHi: Float64Array,
  gLo: Float64Array,
): RefineOutcome {
  const p = w.length;
  const atX = firstNotFinite(X, m * p);
  if (atX >= 0) return { sumOfSquares: 0, bad: { row: atX % m, column: Math.floor(atX / m) } };
  const atY = firstNotFinite(y, m);
  if (atY >= 0) return { sumOfSquares: 0, bad: { row: atY, column: -1 } };
  const hi = new Float64Array(m);
  const lo = new Float64Array(m);
  residualsInto(X, y, m, w, hi, lo);
  const ss = sumOfSquares(hi, m);
  for (let j = 0; j < p; j++) addColumnDot2(X, j * m, m, hi, lo, gHi, gLo, j);
  return { sumOfSquares: ss, bad: null };
}

/** {@link refineRows} in WebAssembly: the same operations in the same order. */
function refineRowsWasm(
  k: KernelExports,
  X: Float64Array,
  y: Float64Array,
  m: number,
  w: Float64Array,
  gHi: Float64Array,
  gLo: Float64Array,
): RefineOutcome {
  const p = w.length;
  const oY = m * p;
  const oW = oY + m;
  const oHi = oW + p;
  const oLo = oHi + m;
  const oGHi = oLo + m;
  const oGLo = oGHi + p;
  const f = heap(k, oGLo + p);
  f.set(X.subarray(0, m * p));
  f.set(y.subarray(0, m), oY);
  const atX = k.firstNotFinite(0, m * p);
  if (atX >= 0) return { sumOfSquares: 0, bad: { row: atX % m, column: Math.floor(atX / m) } };
  const atY = k.firstNotFinite(oY * 8, m);
  if (atY >= 0) return { sumOfSquares: 0, bad: { row: atY, column: -1 } };
  f.set(w, oW);
  f.set(gHi, oGHi);
  f.set(gLo, oGLo);
  const sumOfSquares = k.refine(0, oY * 8, m, oW * 8, p, oHi * 8, oLo * 8, oGHi * 8, oGLo * 8);
  gHi.set(f.subarray(oGHi, oGHi + p));
  gLo.set(f.subarray(oGLo, oGLo + p));
  return { sumOfSquares, bad: null };
}

/**
 * One block of the refinement pass: checks X (m x p, column-major, p = w.length) and y (m) for
 * finiteness, then adds to (gHi[j], gLo[j]) the compensated dot product of column j with the
 * residuals y - X w (as double-double numbers hi + lo), in place.
 * @returns the sum of squares of the residuals' high parts, or where a value is not finite
 *   (nothing added then)
 */
export const refineRows: (
  X: Float64Array,
  y: Float64Array,
  m: number,
  w: Float64Array,
  gHi: Float64Array,
  gLo: Float64Array,
) => RefineOutcome = facade(refineRowsWasm, refineRowsJs);

// The row loops below are functions of their own, each a loop and its return (see DEVELOPERS.md,
// "Writing hot loops").

/** Index of the first NaN or infinite value among v[0..n), or -1 (JavaScript only). */
export function firstNotFinite(v: Float64Array, n: number): number {
  for (let i = 0; i < n; i++) if (!Number.isFinite(v[i])) return i;
  return -1;
}

/**
 * Adds to the running (gHi[j], gLo[j]) the dot product of column j of X (from `col`, m rows) with
 * r = hi + lo: Dot2 with hi, plus the plain dot with lo.
 */
function addColumnDot2(
  X: Float64Array,
  col: number,
  m: number,
  hi: Float64Array,
  lo: Float64Array,
  gHi: Float64Array,
  gLo: Float64Array,
  j: number,
): void {
  let sum = gHi[j];
  let comp = gLo[j];
  for (let i = 0; i < m; i++) {
    const a = X[col + i];
    const prod = a * hi[i];
    const t = sum + prod;
    const z = t - sum;
    comp += sum - (t - z) + (prod - z) + twoProductError(a, hi[i], prod) + a * lo[i];
    sum = t;
  }
  gHi[j] = sum;
  gLo[j] = comp;
}

/**
 * r = y - X w for a column-major m x p block (p = w.length) as double-double numbers hi + lo
 * (written to the length-m arrays `hi` and `lo`), each entry by a compensated dot product (Dot2).
 * JavaScript only: the refinement pass's WebAssembly does the same inside `refine`.
 */
export function residualsInto(X: Float64Array, y: Float64Array, m: number, w: Float64Array, hi: Float64Array, lo: Float64Array): void {
  const p = w.length;
  for (let i = 0; i < m; i++) {
    let s = y[i];
    let c = 0;
    for (let j = 0; j < p; j++) {
      const a = -X[j * m + i];
      const prod = a * w[j];
      const t = s + prod;
      const z = t - s;
      c += s - (t - z) + (prod - z) + twoProductError(a, w[j], prod);
      s = t;
    }
    // Renormalise (s, c) into hi + lo with |lo| <= ulp(hi) / 2 (TwoSum).
    const h = s + c;
    const z = h - s;
    hi[i] = h;
    lo[i] = s - (h - z) + (c - z);
  }
}

/** Exact error of a floating-point product (Dekker / Veltkamp splitting): a*b - fl(a*b). */
function twoProductError(a: number, b: number, prod: number): number {
  const SPLIT = 134217729; // 2^27 + 1
  let t = SPLIT * a;
  const ah = t - (t - a);
  const al = a - ah;
  t = SPLIT * b;
  const bh = t - (t - b);
  const bl = b - bh;
  return al * bl - (prod - ah * bh - ah * bl - al * bh);
}
