/**
 * Walks a model's rows in blocks, building the design block by block so that no n x p matrix is
 * ever held: memory is one block of `rows x p` doubles.
 */
import type { ModelData } from '../data/model-data.js';
import type { Design } from './design-matrix.js';
import { addProductsInto, wasmKernels } from '../kernels/wasm.js';

/**
 * Rows per block for a design of p columns: about 64 K doubles (512 KiB), at least 64 rows. Small
 * enough to stay in cache between building a block and folding it (the QR works on pieces of a
 * few hundred rows of it), and to keep each pass's buffer from weighing on peak memory; large
 * enough that the per-block overhead does not show.
 */
export function blockRows(p: number): number {
  return Math.max(64, Math.floor((1 << 16) / Math.max(1, p)));
}

/**
 * Calls `visit(X, start, m)` for consecutive blocks of rows; `X` is column-major m x p and is
 * reused between calls (copy it to keep it).
 */
export function forEachBlock(
  design: Design,
  data: Pick<ModelData, 'inputs' | 'rows'>,
  visit: (X: Float64Array, start: number, m: number) => void,
): void {
  const size = blockRows(design.p);
  const buffer = new Float64Array(Math.min(size, Math.max(1, data.rows)) * design.p);
  for (let start = 0; start < data.rows; start += size) {
    const m = Math.min(size, data.rows - start);
    design.fill(data.inputs, start, m, buffer);
    visit(buffer, start, m);
  }
}

/** Predictions Phi w for every row of `data`, block by block (length `data.rows`). */
export function predictRows(design: Design, data: Pick<ModelData, 'inputs' | 'rows'>, w: ArrayLike<number>): Float64Array {
  const out = new Float64Array(data.rows);
  forEachBlock(design, data, (X, start, m) => addProducts(out, start, X, m, w, design.p));
  return out;
}

/**
 * out[at + i] += sum_j X[j*m + i] w[j] for the m rows of a column-major m x p block, the terms
 * added one after another in column order (four columns per sweep over the rows, so each
 * output is loaded and stored once per four columns; the sums are those of the plain loop).
 * Columns whose weight is 0 are left out.
 *
 * @param out output (length >= at + m)
 * @param at first output index
 * @param X column-major m x p block
 * @param m rows
 * @param w coefficients (length >= p)
 * @param p columns
 */
export function addProducts(out: Float64Array, at: number, X: Float64Array, m: number, w: ArrayLike<number>, p: number): void {
  // In WebAssembly where it is in use (fit/wasm-kernels.ts; the same additions in the same order).
  const kernels = wasmKernels();
  if (kernels !== null) {
    addProductsInto(kernels, out, at, X, m, w, p);
    return;
  }
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

// The row loops are functions of their own, each one loop and its return (see DEVELOPERS.md,
// "Writing hot loops"): the loop over columns above then never runs inside code optimised in
// the middle of a row loop.

/** out[at + i] += X[j*m + i] w0 + X[(j+1)*m + i] w1 + X[(j+2)*m + i] w2 + X[(j+3)*m + i] w3, added left to right. */
function addFourColumns(out: Float64Array, at: number, X: Float64Array, m: number, w0: number, w1: number, w2: number, w3: number, j: number): void {
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
