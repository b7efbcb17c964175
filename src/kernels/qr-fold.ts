/**
 * The QR fold: Householder reflections that fold a column-major block of rows (and its
 * right-hand side) into a triangular factor [R; qty], in pieces of a fixed number of rows, with
 * the sum of squares of what leaves the top p rows added to the residual sum of squares
 * (fit/qr-accumulator.ts holds the state and says where the method comes from). In WebAssembly
 * where it is in use (kernels.wat, `fold`), else in JavaScript ({@link foldRowsJs}, the reference).
 */
import { facade } from './engine.js';
import { heap, type KernelExports } from './wasm.js';

/** Sums of squares in this range are computed without rescaling (no overflow or underflow). */
const SAFE_SMALL = 1e-150;
const SAFE_LARGE = 1e150;

/** Where a kernel found a value that is not finite: its row in the block, and column (-1: y). */
export interface BadValue {
  row: number;
  column: number;
}

/** What {@link foldRows} leaves besides the updated R and qty. */
export interface FoldOutcome {
  /** The residual sum of squares after the fold. */
  rss: number;
  /** The first value that is not finite (in column order, then y, within the first piece holding one), or null. */
  bad: BadValue | null;
}

/** The work block of the JavaScript fold (grown as needed; the fold is never re-entered). */
let work = new Float64Array(0);
let workY = new Float64Array(0);

/**
 * The JavaScript reference of {@link foldRows}: for each piece of at most `chunk` rows, copies it
 * into the work block (leading dimension `chunk`) checking every value, annihilates it against R,
 * and adds the sum of squares of what is left of its right-hand side.
 */
export function foldRowsJs(
  R: Float64Array,
  qty: Float64Array,
  rss: number,
  X: Float64Array,
  y: Float64Array,
  m: number,
  p: number,
  chunk: number,
): FoldOutcome {
  const ld = chunk;
  if (work.length < ld * p) work = new Float64Array(ld * p);
  if (workY.length < ld) workY = new Float64Array(ld);
  let sum = rss;
  for (let start = 0; start < m; start += chunk) {
    const mb = Math.min(chunk, m - start);
    const bad = copyChecked(X, m, y, start, mb, p, work, workY, ld);
    if (bad !== null) return { rss: sum, bad };
    annihilate(R, qty, work, workY, ld, p, mb);
    // What is left of the piece's right-hand side is orthogonal to the column space.
    sum += sumOfSquares(workY, mb);
  }
  return { rss: sum, bad: null };
}

/** {@link foldRows} in WebAssembly: the same operations in the same order. */
function foldRowsWasm(
  k: KernelExports,
  R: Float64Array,
  qty: Float64Array,
  rss: number,
  X: Float64Array,
  y: Float64Array,
  m: number,
  p: number,
  chunk: number,
): FoldOutcome {
  const oQty = p * p;
  const oX = oQty + p;
  const oY = oX + m * p;
  const oC = oY + m;
  const oYc = oC + chunk * p;
  const f = heap(k, oYc + chunk);
  f.set(R.subarray(0, oQty));
  f.set(qty.subarray(0, p), oQty);
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
 * Folds the m rows of a column-major m x p block X and their right-hand side y into the
 * triangular R (p x p, column-major) and qty (p), in place, in pieces of `chunk` rows.
 * @param rss the residual sum of squares so far
 * @param chunk rows per piece (at least 1): also the work block's leading dimension
 * @returns the new residual sum of squares, and where a value was not finite (null when none
 *   was; the pieces before it are folded, that piece and the rest are not)
 */
export const foldRows: (
  R: Float64Array,
  qty: Float64Array,
  rss: number,
  X: Float64Array,
  y: Float64Array,
  m: number,
  p: number,
  chunk: number,
) => FoldOutcome = facade(foldRowsWasm, foldRowsJs);

// The loops below are separate functions, each one loop nest, so that V8 optimises each whole
// (a loop that first runs after another loop was optimised mid-function has no type feedback and
// throws the optimised code away, block after block; see DEVELOPERS.md, "Writing hot loops").

/**
 * Copies rows [start, start + mb) of the column-major X (leading dimension ldx) and of y into C
 * (leading dimension ld) and yc.
 * @returns where the first value that is not finite is (columns in order, then y), or null
 */
function copyChecked(
  X: Float64Array,
  ldx: number,
  y: Float64Array,
  start: number,
  mb: number,
  p: number,
  C: Float64Array,
  yc: Float64Array,
  ld: number,
): BadValue | null {
  for (let j = 0; j < p; j++) {
    const at = copyColumnChecked(X, j * ldx + start, C, j * ld, mb);
    if (at >= 0) return { row: start + at, column: j };
  }
  const at = copyColumnChecked(y, start, yc, 0, mb);
  return at >= 0 ? { row: start + at, column: -1 } : null;
}

/**
 * Copies mb values from src[from..] to dst[to..], stopping at the first that is not finite.
 * @returns its index among the mb, or -1
 */
function copyColumnChecked(src: Float64Array, from: number, dst: Float64Array, to: number, mb: number): number {
  for (let i = 0; i < mb; i++) {
    const v = src[from + i];
    if (!Number.isFinite(v)) return i;
    dst[to + i] = v;
  }
  return -1;
}

/** Sum of squares of v[0..m), in order (one loop; shared by the fit's passes). */
export function sumOfSquares(v: Float64Array, m: number): number {
  let s = 0;
  for (let i = 0; i < m; i++) s += v[i] * v[i];
  return s;
}

/**
 * Householder reflections that zero the mb x p block C (leading dimension ld) against the
 * triangular R (p x p, column-major), applied to qty and yc alike. Each step is a function of its
 * own (one loop nest each), so that V8 compiles the small hot pieces separately and soon.
 */
function annihilate(R: Float64Array, qty: Float64Array, C: Float64Array, yc: Float64Array, ld: number, p: number, mb: number): void {
  for (let j = 0; j < p; j++) {
    const cj = j * ld;
    const alpha = R[j * p + j];
    const beta = reflector(C, cj, mb, alpha);
    if (Number.isNaN(beta)) continue; // nothing to annihilate in this column
    const tau = (beta - alpha) / beta;
    let k = j + 1;
    // Four, then two columns at a time: each u_i is loaded once for all of them (per column the
    // operations and their order are those of the single-column loop).
    for (; k + 3 < p; k += 4) reflectFour(R, C, ld, p, j, k, mb, tau);
    for (; k + 1 < p; k += 2) reflectTwo(R, C, ld, p, j, k, mb, tau);
    for (; k < p; k++) reflectOne(R, C, ld, p, j, k, mb, tau);
    reflectTarget(qty, yc, C, cj, mb, tau, j);
    R[j * p + j] = beta;
  }
}

/**
 * The reflector for column j of [R; C] with a = [alpha; C[cj..cj+mb)]: H = I - tau u u^T with
 * u = v / v0 = [1; C[:, j] / v0], v = [alpha - beta; C[:, j]], tau = (beta - alpha) / beta in
 * [1, 2] (the normalisation of LAPACK's dlarfg). Every |u_i| <= 1, so no intermediate overflows or
 * underflows however tiny the column is. Overwrites the column with u's lower part and returns
 * beta; NaN (the column unchanged) when the block part is zero.
 */
function reflector(C: Float64Array, cj: number, mb: number, alpha: number): number {
  const amax = Math.max(Math.abs(alpha), largestMagnitudeIn(C, cj, mb));
  if (amax === 0) return Number.NaN;
  let norm: number;
  if (amax > SAFE_SMALL && amax < SAFE_LARGE) {
    const sigma = sumOfSquaresIn(C, cj, mb); // sum of squares of the block part
    if (sigma === 0) return Number.NaN;
    norm = Math.sqrt(alpha * alpha + sigma);
  } else {
    const scaled = scaledSumOfSquaresIn(C, cj, mb, amax);
    if (scaled === 0) return Number.NaN;
    const a0 = alpha / amax;
    norm = amax * Math.sqrt(a0 * a0 + scaled);
  }
  const beta = alpha >= 0 ? -norm : norm;
  divideIn(C, cj, mb, alpha - beta);
  return beta;
}

function largestMagnitudeIn(C: Float64Array, from: number, n: number): number {
  let amax = 0;
  for (let i = 0; i < n; i++) {
    const a = Math.abs(C[from + i]);
    if (a > amax) amax = a;
  }
  return amax;
}

function sumOfSquaresIn(C: Float64Array, from: number, n: number): number {
  let sigma = 0;
  for (let i = 0; i < n; i++) {
    const c = C[from + i];
    sigma += c * c;
  }
  return sigma;
}

function scaledSumOfSquaresIn(C: Float64Array, from: number, n: number, scale: number): number {
  let scaled = 0;
  for (let i = 0; i < n; i++) {
    const c = C[from + i] / scale;
    scaled += c * c;
  }
  return scaled;
}

function divideIn(C: Float64Array, from: number, n: number, d: number): void {
  for (let i = 0; i < n; i++) C[from + i] /= d;
}

/** Applies the reflector of column j (u in C's column j) to columns k .. k+3 of [R; C]. */
function reflectFour(R: Float64Array, C: Float64Array, ld: number, p: number, j: number, k: number, mb: number, tau: number): void {
  const cj = j * ld;
  const c1 = k * ld;
  const c2 = c1 + ld;
  const c3 = c2 + ld;
  const c4 = c3 + ld;
  const r1 = k * p + j;
  let w1 = R[r1];
  let w2 = R[r1 + p];
  let w3 = R[r1 + 2 * p];
  let w4 = R[r1 + 3 * p];
  for (let i = 0; i < mb; i++) {
    const u = C[cj + i];
    w1 += u * C[c1 + i];
    w2 += u * C[c2 + i];
    w3 += u * C[c3 + i];
    w4 += u * C[c4 + i];
  }
  const f1 = tau * w1;
  const f2 = tau * w2;
  const f3 = tau * w3;
  const f4 = tau * w4;
  if (f1 === 0 && f2 === 0 && f3 === 0 && f4 === 0) return;
  R[r1] -= f1;
  R[r1 + p] -= f2;
  R[r1 + 2 * p] -= f3;
  R[r1 + 3 * p] -= f4;
  for (let i = 0; i < mb; i++) {
    const u = C[cj + i];
    C[c1 + i] -= f1 * u;
    C[c2 + i] -= f2 * u;
    C[c3 + i] -= f3 * u;
    C[c4 + i] -= f4 * u;
  }
}

/** Applies the reflector of column j to columns k and k+1 of [R; C]. */
function reflectTwo(R: Float64Array, C: Float64Array, ld: number, p: number, j: number, k: number, mb: number, tau: number): void {
  const cj = j * ld;
  const ck = k * ld;
  const ck2 = ck + ld;
  const rIdx = k * p + j;
  const rIdx2 = rIdx + p;
  let w1 = R[rIdx];
  let w2 = R[rIdx2];
  for (let i = 0; i < mb; i++) {
    const u = C[cj + i];
    w1 += u * C[ck + i];
    w2 += u * C[ck2 + i];
  }
  const f1 = tau * w1;
  const f2 = tau * w2;
  if (f1 === 0 && f2 === 0) return;
  R[rIdx] -= f1;
  R[rIdx2] -= f2;
  for (let i = 0; i < mb; i++) {
    const u = C[cj + i];
    C[ck + i] -= f1 * u;
    C[ck2 + i] -= f2 * u;
  }
}

/** Applies the reflector of column j to column k of [R; C]. */
function reflectOne(R: Float64Array, C: Float64Array, ld: number, p: number, j: number, k: number, mb: number, tau: number): void {
  const cj = j * ld;
  const ck = k * ld;
  const rIdx = k * p + j;
  let w = R[rIdx];
  for (let i = 0; i < mb; i++) w += C[cj + i] * C[ck + i];
  const f = tau * w;
  if (f === 0) return;
  R[rIdx] -= f;
  for (let i = 0; i < mb; i++) C[ck + i] -= f * C[cj + i];
}

/** Applies the reflector of column j (u in C from cj) to the right-hand side [qty; yc]. */
function reflectTarget(qty: Float64Array, yc: Float64Array, C: Float64Array, cj: number, mb: number, tau: number, j: number): void {
  let w = qty[j];
  for (let i = 0; i < mb; i++) w += C[cj + i] * yc[i];
  const f = tau * w;
  if (f === 0) return;
  qty[j] -= f;
  for (let i = 0; i < mb; i++) yc[i] -= f * C[cj + i];
}
