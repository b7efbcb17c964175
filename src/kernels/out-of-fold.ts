/**
 * Squared out-of-fold errors of a block of rows for one coefficient setting
 * (diagnostics/cross-validation.ts, outOfFoldErrors): each row is predicted with the coefficients
 * fitted without its fold, and (y - prediction)^2 is added to its fold's sum, in row order. In
 * WebAssembly where it is in use (kernels.wat, `outOfFold`), else in JavaScript
 * ({@link outOfFoldRowsJs}, the reference).
 */
import { facade } from './engine.js';
import { addProductsJs } from './products.js';
import { heap, type KernelExports } from './wasm.js';

/** The JavaScript's predictions and one fold's coefficients (grown as needed; never re-entered). */
let pred = new Float64Array(0);
let column = new Float64Array(0);

/** The JavaScript reference of {@link outOfFoldRows}. */
export function outOfFoldRowsJs(
  X: Float64Array,
  m: number,
  p: number,
  W: Float64Array,
  kFolds: number,
  folds: Int32Array,
  single: number,
  y: Float64Array,
  errors: number[],
): void {
  if (pred.length < m) pred = new Float64Array(m);
  if (column.length < p) column = new Float64Array(p);
  pred.fill(0, 0, m);
  if (single >= 0) {
    // Every row of one fold: its coefficients, zero weights left out as in addProducts.
    for (let j = 0; j < p; j++) column[j] = W[j * kFolds + single];
    addProductsJs(pred, 0, X, m, column, p);
  } else {
    // Column-major sweep: for each column, add its contribution with the row's fold coefficient.
    for (let j = 0; j < p; j++) addFoldColumn(pred, X, j * m, W, j * kFolds, folds, m);
  }
  addSquaredErrors(errors, y, pred, folds, m);
}

/** {@link outOfFoldRows} in WebAssembly: the same operations in the same order. */
function outOfFoldRowsWasm(
  k: KernelExports,
  X: Float64Array,
  m: number,
  p: number,
  W: Float64Array,
  kFolds: number,
  folds: Int32Array,
  single: number,
  y: Float64Array,
  errors: number[],
): void {
  const oW = m * p;
  const oY = oW + p * kFolds;
  const oPred = oY + m;
  const oColumn = oPred + m;
  const oErrors = oColumn + p;
  const oFolds = oErrors + kFolds;
  const f = heap(k, oFolds + Math.ceil(m / 2));
  f.set(X.subarray(0, m * p));
  f.set(W.subarray(0, p * kFolds), oW);
  f.set(y.subarray(0, m), oY);
  for (let q = 0; q < kFolds; q++) f[oErrors + q] = errors[q];
  new Int32Array(f.buffer, oFolds * 8, m).set(folds.subarray(0, m));
  k.outOfFold(0, m, p, oW * 8, kFolds, oFolds * 8, single, oY * 8, oPred * 8, oColumn * 8, oErrors * 8);
  for (let q = 0; q < kFolds; q++) errors[q] = f[oErrors + q];
}

/**
 * Adds one block's squared out-of-fold errors to errors[f] for one setting.
 * @param X column-major m x p block
 * @param W coefficient j fitted without fold f at W[j * kFolds + f] (length >= p kFolds)
 * @param folds the fold of each of the m rows
 * @param single the fold of every row, or -1 when they differ
 * @param y the m rows' targets
 * @param errors per fold (length kFolds), added to in place
 */
export const outOfFoldRows: (
  X: Float64Array,
  m: number,
  p: number,
  W: Float64Array,
  kFolds: number,
  folds: Int32Array,
  single: number,
  y: Float64Array,
  errors: number[],
) => void = facade(outOfFoldRowsWasm, outOfFoldRowsJs);

// The row loops are functions of their own, one loop each (see DEVELOPERS.md, "Writing hot loops").

/** pred[i] += X[col + i] * W[base + folds[i]] for i < m. */
function addFoldColumn(
  pred: Float64Array,
  X: Float64Array,
  col: number,
  W: Float64Array,
  base: number,
  folds: Int32Array,
  m: number,
): void {
  for (let i = 0; i < m; i++) pred[i] += X[col + i] * W[base + folds[i]];
}

/** errors[folds[i]] += (y[i] - pred[i])^2 for i < m, in row order. */
function addSquaredErrors(errors: number[], y: Float64Array, pred: Float64Array, folds: Int32Array, m: number): void {
  for (let i = 0; i < m; i++) {
    const r = y[i] - pred[i];
    errors[folds[i]] += r * r;
  }
}
