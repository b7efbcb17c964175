/**
 * The row kernels of kernels.wat (the QR fold, the refinement pass, leverages, predictions,
 * out-of-fold errors, polynomial columns and the design's range check), compiled once per
 * thread, and the wrappers that copy arrays into the module's memory and back. Each kernel
 * computes what the JavaScript it stands in for computes, to the bit; the JavaScript stays as the
 * fallback where WebAssembly is not available (`node --jitless`) or turned off
 * ({@link useWasmKernels}), and as the reference the tests compare with.
 *
 * Why: a small model's row loops run once or twice over a few thousand rows, mostly in V8's
 * interpreter, which boxes every floating-point result; WebAssembly is compiled before its first
 * call. On the S workload of `npm run bench` (2,000 rows, 11 columns) a whole run takes about
 * 30 ms less with them, M and L less too (see the README, "Benchmark").
 */
import { KERNELS_WASM } from './generated/kernels-wasm.js';

/**
 * The parts of the WebAssembly JavaScript API used here (the project's type libraries, ES2023
 * and Node's, do not declare it).
 */
interface WasmApi {
  Module: new (bytes: Uint8Array) => object;
  Instance: new (module: object) => { exports: object };
}

/** This runtime's WebAssembly, or undefined (`node --jitless` has none). */
const WASM = (globalThis as { WebAssembly?: WasmApi }).WebAssembly;

/** A WebAssembly.Global of the module. */
interface WasmGlobal {
  value: number;
}

/** What kernels.wat exports. */
export interface KernelExports {
  memory: { buffer: ArrayBuffer; grow(pages: number): number };
  badRow: WasmGlobal;
  badColumn: WasmGlobal;
  rss: WasmGlobal;
  fold(R: number, qty: number, X: number, y: number, m: number, p: number, C: number, yc: number, chunk: number): number;
  leverages(R: number, p: number, X: number, m: number, Z: number, out: number): void;
  firstNotFinite(a: number, n: number): number;
  refine(X: number, y: number, m: number, w: number, p: number, hi: number, lo: number, gHi: number, gLo: number): number;
  addProducts(out: number, X: number, m: number, w: number, p: number): void;
  outOfFold(X: number, m: number, p: number, W: number, k: number, folds: number, single: number, y: number, pred: number, column: number, errors: number): void;
  polynomialColumns(x: number, m: number, shift: number, scale: number, raw: number, degree: number, out: number): void;
  firstBeyond(a: number, n: number, max: number): number;
}

/** WebAssembly's page size in bytes. */
const PAGE = 65536;

let kernels: KernelExports | null = null;
let enabled = WASM !== undefined;

/**
 * Whether the fit uses the WebAssembly kernels (default: when WebAssembly is available). Tests
 * turn them off to run the JavaScript kernels on the same data.
 * @param on true to use them (ignored where WebAssembly is not available), false for JavaScript
 * @returns whether they were in use before
 */
export function useWasmKernels(on: boolean): boolean {
  const before = enabled;
  enabled = on && WASM !== undefined;
  return before;
}

/** The kernels, compiled on first use; null when they are not in use. */
export function wasmKernels(): KernelExports | null {
  if (!enabled || WASM === undefined) return null;
  if (kernels === null) kernels = new WASM.Instance(new WASM.Module(Buffer.from(KERNELS_WASM, 'base64'))).exports as KernelExports;
  return kernels;
}

/** A view of the module's memory with room for at least `doubles` float64 values. */
function heap(k: KernelExports, doubles: number): Float64Array {
  const bytes = doubles * 8;
  const have = k.memory.buffer.byteLength;
  if (bytes > have) k.memory.grow(Math.ceil((bytes - have) / PAGE));
  return new Float64Array(k.memory.buffer, 0, doubles);
}

/** Where a kernel found a value that is not finite: its row in the block, and column (-1: y). */
export interface BadValue {
  row: number;
  column: number;
}

/**
 * Folds the m rows of a column-major block into [R; qty] (QrAccumulator's fold, in pieces of
 * `chunk` rows). R (p x p) and qty (p) are updated in place.
 * @param rss the residual sum of squares so far
 * @returns the new residual sum of squares, and where a value was not finite (null when none
 *   was; the pieces before it are folded, as the JavaScript leaves them)
 */
export function foldRows(k: KernelExports, R: Float64Array, qty: Float64Array, rss: number, X: Float64Array, y: Float64Array, m: number, p: number, chunk: number): { rss: number; bad: BadValue | null } {
  const oQty = p * p;
  const oX = oQty + p;
  const oY = oX + m * p;
  const oC = oY + m;
  const oYc = oC + chunk * p;
  const f = heap(k, oYc + chunk);
  f.set(R);
  f.set(qty, oQty);
  f.set(X.subarray(0, m * p), oX);
  f.set(y.subarray(0, m), oY);
  k.rss.value = rss;
  const status = k.fold(0, oQty * 8, oX * 8, oY * 8, m, p, oC * 8, oYc * 8, chunk);
  R.set(f.subarray(0, oQty));
  qty.set(f.subarray(oQty, oQty + p));
  const bad = status === 0 ? null : { row: k.badRow.value, column: k.badColumn.value };
  return { rss: k.rss.value, bad };
}

/**
 * Leverages of the m rows of a column-major block under a full-rank factor R (p x p):
 * out[i] = || R^-T x_i ||^2 for i < m.
 */
export function leverageRows(k: KernelExports, R: Float64Array, p: number, X: Float64Array, m: number, out: Float64Array): void {
  const oX = p * p;
  const oZ = oX + m * p;
  const oOut = oZ + m * p;
  const f = heap(k, oOut + m);
  f.set(R.subarray(0, p * p));
  f.set(X.subarray(0, m * p), oX);
  k.leverages(0, p, oX * 8, m, oZ * 8, oOut * 8);
  out.set(f.subarray(oOut, oOut + m));
}

/**
 * One block of the refinement pass: checks X (m x p, column-major) and y for finiteness, then
 * adds each column's compensated dot product with the residuals y - X w to (gHi, gLo), in place.
 * @returns the sum of squares of the residuals' high parts, or where a value is not finite
 *   (nothing added then)
 */
export function refineRows(k: KernelExports, X: Float64Array, y: Float64Array, m: number, w: Float64Array, gHi: Float64Array, gLo: Float64Array): { sumOfSquares: number; bad: BadValue | null } {
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
 * out[at + i] += sum_j X[j*m + i] w[j] for the m rows of a column-major m x p block (columns
 * whose weight is 0 left out): model/blocks.ts's addProducts.
 */
export function addProductsInto(k: KernelExports, out: Float64Array, at: number, X: Float64Array, m: number, w: ArrayLike<number>, p: number): void {
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
 * Adds one block's squared out-of-fold errors to errors[f] (cross-validation.ts, outOfFoldErrors,
 * one setting).
 * @param W coefficient j fitted without fold f at W[j * k + f]
 * @param folds the fold of each of the m rows
 * @param single the fold of every row, or -1 when they differ
 * @param y the m rows' targets
 * @param errors per fold, added to in place
 */
export function outOfFoldRows(
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
  f.set(W, oW);
  f.set(y.subarray(0, m), oY);
  for (let q = 0; q < kFolds; q++) f[oErrors + q] = errors[q];
  new Int32Array(f.buffer, oFolds * 8, m).set(folds.subarray(0, m));
  k.outOfFold(0, m, p, oW * 8, kFolds, oFolds * 8, single, oY * 8, oPred * 8, oColumn * 8, oErrors * 8);
  for (let q = 0; q < kFolds; q++) errors[q] = f[oErrors + q];
}

/**
 * The `degree` columns of a polynomial term for x[0..m) written to out from `at` (column k at
 * at + k m): z = (x - shift) / scale (x itself when `raw`), then its powers (basis/polynomial.ts).
 */
export function polynomialColumnsInto(k: KernelExports, x: Float64Array, m: number, shift: number, scale: number, raw: boolean, degree: number, out: Float64Array, at: number): void {
  const oOut = m;
  const f = heap(k, oOut + degree * m);
  f.set(x.subarray(0, m));
  k.polynomialColumns(0, m, shift, scale, raw ? 1 : 0, degree, oOut * 8);
  out.set(f.subarray(oOut, oOut + degree * m), at);
}

/** Index of the first of a[0..n) whose magnitude is not within max (NaN included), or -1. */
export function firstBeyondIn(k: KernelExports, a: Float64Array, n: number, max: number): number {
  const f = heap(k, n);
  f.set(a.subarray(0, n));
  return k.firstBeyond(0, n, max);
}
