/**
 * Predictions of a block of rows: out[at + i] += sum_j X[j*m + i] w[j] for a column-major m x p
 * block, the columns added one after another, those whose weight is 0 left out. In WebAssembly
 * where it is in use (kernels.wat, `addProducts`), else in JavaScript ({@link addProductsJs}, the
 * reference).
 */
import { facade } from './engine.js';
import { heap, type KernelExports } from './wasm.js';

/**
 * The JavaScript reference of {@link addProducts}: four columns per sweep over the rows, so each
 * output is loaded and stored once per four columns (the sums are those of the plain loop).
 */
export function addProductsJs(out: Float64Array, at: number, X: Float64Array, m: number, w: ArrayLike<number>, p: number): void {
  let j = 0;
  for (; j + 3 < p; j += 4) {
    if (w[j] === 0 || w[j + 1] === 0 || w[j + 2] === 0 || w[j + 3] === 0) {
      for (let q = j; q < j + 4; q++) addColumn(out, at, X, m, w[q], q);
    } else {
      addFourColumns(out, at, X, m, w[j], w[j + 1], w[j + 2], w[j + 3], j);
    }
  }
  for (; j < p; j++) addColumn(out, at, X, m, w[j], j);
}

/** {@link addProducts} in WebAssembly: the same additions in the same order. */
function addProductsWasm(
  k: KernelExports,
  out: Float64Array,
  at: number,
  X: Float64Array,
  m: number,
  w: ArrayLike<number>,
  p: number,
): void {
  const oX = m;
  const oW = oX + m * p;
  const f = heap(k, oW + p);
  f.set(out.subarray(at, at + m));
  f.set(X.subarray(0, m * p), oX);
  for (let j = 0; j < p; j++) f[oW + j] = w[j];
  k.addProducts(0, oX * 8, m, oW * 8, p);
  out.set(f.subarray(0, m), at);
}

/**
 * out[at + i] += sum_j X[j*m + i] w[j] for the m rows of a column-major m x p block, the terms
 * added one after another in column order. Columns whose weight is 0 are left out (so an
 * infinite design value in such a column adds nothing, not NaN).
 *
 * @param out output (length >= at + m)
 * @param at first output index
 * @param X column-major m x p block
 * @param m rows
 * @param w coefficients (length >= p)
 * @param p columns
 */
export const addProducts: (out: Float64Array, at: number, X: Float64Array, m: number, w: ArrayLike<number>, p: number) => void = facade(
  addProductsWasm,
  addProductsJs,
);

// The row loops are functions of their own, each one loop and its return (see DEVELOPERS.md,
// "Writing hot loops"): the loop over columns above then never runs inside code optimised in
// the middle of a row loop.

/** out[at + i] += X[j*m + i] w0 + X[(j+1)*m + i] w1 + X[(j+2)*m + i] w2 + X[(j+3)*m + i] w3, added left to right. */
function addFourColumns(
  out: Float64Array,
  at: number,
  X: Float64Array,
  m: number,
  w0: number,
  w1: number,
  w2: number,
  w3: number,
  j: number,
): void {
  const c0 = j * m;
  const c1 = c0 + m;
  const c2 = c1 + m;
  const c3 = c2 + m;
  for (let i = 0; i < m; i++) out[at + i] = out[at + i] + X[c0 + i] * w0 + X[c1 + i] * w1 + X[c2 + i] * w2 + X[c3 + i] * w3;
}

/** out[at + i] += X[j*m + i] wj; nothing for wj = 0 (so an infinite design value in a column with weight 0 adds nothing, not NaN). */
function addColumn(out: Float64Array, at: number, X: Float64Array, m: number, wj: number, j: number): void {
  if (wj === 0) return;
  const c = j * m;
  for (let i = 0; i < m; i++) out[at + i] += X[c + i] * wj;
}
