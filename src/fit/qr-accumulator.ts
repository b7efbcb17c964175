/**
 * Streaming Householder QR of a tall design: rows are folded into a p x p upper-triangular
 * factor block by block, so memory grows with p^2 and not with the number of rows.
 *
 * Folding a block of m rows computes the QR factorisation of the stacked matrix
 *
 *     [ R    qty ]
 *     [ X_b  y_b ]
 *
 * where R is already triangular. Householder reflector j only has to touch row j of R and the
 * m block rows, so a block costs O(m p^2) flops (Golub & Van Loan, Matrix Computations, 4th ed.,
 * sec. 5.1-5.2 Householder QR, and sec. 6.5.2 on updating a QR factorisation by appending rows).
 * The parts of the transformed right-hand side that leave the top p rows are summed into `rss`.
 */

import { foldRows, wasmKernels } from '../kernels/wasm.js';

/** Target size of the internal work block in numbers (m x p chunk plus its right-hand side). */
const WORK_NUMBERS = 16384;
/** Sums of squares in this range are computed without rescaling (no overflow or underflow). */
const SAFE_SMALL = 1e-150;
const SAFE_LARGE = 1e150;

/**
 * Streaming Householder QR: folds row blocks into an upper-triangular p x p factor R, Q^T y and
 * the residual sum of squares.
 *
 * With X the n x p matrix of every row folded so far and y its right-hand side, the state is
 * X = Q [R; 0], Q^T y = [qty; r] and `rss` = ||r||^2, which is the least-squares residual sum of
 * squares min ||X w - y||^2 when R has full rank. Reflectors use the sign choice
 * beta = -sign(alpha) ||a|| (no cancellation), so diagonal entries of R may be negative.
 *
 * @example
 * const acc = new QrAccumulator(2);
 * acc.addRows(new Float64Array([1, 1, 1, 0, 1, 2]), new Float64Array([1, 2, 3]), 3);
 */
export class QrAccumulator {
  /** Number of columns. */
  readonly p: number;
  #rows = 0;
  #R: Float64Array;
  #qty: Float64Array;
  #rss = 0;
  /** Work block (column-major, leading dimension `#chunk`) and its right-hand side. */
  #work: Float64Array | undefined;
  #workY: Float64Array | undefined;
  readonly #chunk: number;

  /**
   * @param p number of columns of the design (a non-negative integer)
   * @throws RangeError when p is not a non-negative integer
   */
  constructor(p: number) {
    if (!Number.isInteger(p) || p < 0) {
      throw new RangeError(`QrAccumulator: p must be a non-negative integer, got ${String(p)}`);
    }
    this.p = p;
    this.#R = new Float64Array(p * p);
    this.#qty = new Float64Array(p);
    this.#chunk = Math.max(16, Math.floor(WORK_NUMBERS / (p + 1)));
  }

  /** Number of rows folded in so far (all rows, including penalty rows). */
  get rows(): number {
    return this.#rows;
  }

  /**
   * Upper-triangular factor, p x p, column-major (R[j*p + i]); rows beyond the rank are zero
   * (up to rounding) when fewer rows than p were folded. This is the live array: read it, do
   * not write it (use {@link clone} for a copy to change).
   */
  get R(): Float64Array {
    return this.#R;
  }

  /** First p entries of Q^T y (live array: read only). */
  get qty(): Float64Array {
    return this.#qty;
  }

  /** Sum of squares of the remaining entries of Q^T y (the least-squares residual sum of squares when R has full rank). */
  get rss(): number {
    return this.#rss;
  }

  /**
   * Fold m rows into the factor. Large m is processed in internal blocks; the inputs are not
   * modified.
   *
   * @param X column-major m x p block (X[j*m + i] is row i, column j); length at least m*p
   * @param y right-hand side, length m or more (the first m entries are used)
   * @param m number of rows (a non-negative integer; 0 does nothing)
   * @throws RangeError on bad shapes or a NaN / infinite value (the message names row and column)
   */
  addRows(X: Float64Array, y: Float64Array, m: number): void {
    const p = this.p;
    if (!Number.isInteger(m) || m < 0) {
      throw new RangeError(`addRows: m must be a non-negative integer, got ${String(m)}`);
    }
    if (X.length < m * p) {
      throw new RangeError(`addRows: X must hold m*p = ${m * p} numbers (column-major ${m} x ${p}), got ${X.length}`);
    }
    if (y.length < m) {
      throw new RangeError(`addRows: y must hold at least m = ${m} numbers, got ${y.length}`);
    }
    this.#foldAll(X, y, m);
    this.#rows += m;
  }

  /**
   * Fold another accumulator's factor into this one: stack [R1; R2] (with their Q^T y) and
   * re-triangularise; residual sums of squares and row counts add. Used for k-fold
   * cross-validation: the fit without fold k is the merge of the other folds.
   *
   * @param other an accumulator with the same p (not modified)
   * @throws RangeError when the column counts differ
   */
  merge(other: QrAccumulator): void {
    if (other.p !== this.p) {
      throw new RangeError(`merge: column counts differ (${this.p} and ${other.p})`);
    }
    // R2 is column-major p x p with leading dimension p: exactly the block layout of addRows.
    // Copy first so that merging an accumulator into itself reads the old factor.
    const R2 = Float64Array.from(other.#R);
    const qty2 = Float64Array.from(other.#qty);
    const rss2 = other.#rss;
    const rows2 = other.#rows;
    this.#foldAll(R2, qty2, this.p);
    this.#rss += rss2;
    this.#rows += rows2;
  }

  /** An independent copy (same factor, right-hand side, rss and row count). */
  clone(): QrAccumulator {
    const copy = new QrAccumulator(this.p);
    copy.#R.set(this.#R);
    copy.#qty.set(this.#qty);
    copy.#rss = this.#rss;
    copy.#rows = this.#rows;
    return copy;
  }

  /**
   * Folds a column-major m x p block in pieces of at most `#chunk` rows: in WebAssembly where it
   * is in use (wasm-kernels.ts; the same operations in the same order), else below.
   */
  #foldAll(X: Float64Array, y: Float64Array, m: number): void {
    const chunk = this.#chunk;
    const kernels = wasmKernels();
    if (kernels !== null) {
      const { rss, bad } = foldRows(kernels, this.#R, this.#qty, this.#rss, X, y, m, this.p, chunk);
      this.#rss = rss;
      if (bad !== null) throw notFinite(bad.row, bad.column, bad.column < 0 ? y[bad.row] : X[bad.column * m + bad.row]);
      return;
    }
    for (let start = 0; start < m; start += chunk) {
      this.#fold(X, m, y, start, Math.min(chunk, m - start));
    }
  }

  /**
   * Copies rows [start, start + mb) of the column-major block X (leading dimension ldx) into
   * the work block, checking every value, then annihilates them against R.
   */
  #fold(X: Float64Array, ldx: number, y: Float64Array, start: number, mb: number): void {
    const p = this.p;
    const ld = this.#chunk;
    if (this.#work === undefined || this.#workY === undefined) {
      this.#work = new Float64Array(ld * p);
      this.#workY = new Float64Array(ld);
    }
    copyChecked(X, ldx, y, start, mb, p, this.#work, this.#workY, ld);
    annihilate(this.#R, this.#qty, this.#work, this.#workY, ld, p, mb);
    // What is left of the block's right-hand side is orthogonal to the column space.
    this.#rss += sumOfSquares(this.#workY, mb);
  }
}

// The kernels below are separate functions, each one loop nest, so that V8 optimises each
// whole (a loop that first runs after another loop was optimised mid-function has no type
// feedback and throws the optimised code away, block after block).

/**
 * Copies rows [start, start + mb) of the column-major X (leading dimension ldx) and of y into C
 * (leading dimension ld) and yc.
 * @throws RangeError naming row and column when a value is NaN or infinite
 */
function copyChecked(X: Float64Array, ldx: number, y: Float64Array, start: number, mb: number, p: number, C: Float64Array, yc: Float64Array, ld: number): void {
  for (let j = 0; j < p; j++) copyColumnChecked(X, j * ldx + start, C, j * ld, mb, start, j);
  copyColumnChecked(y, start, yc, 0, mb, start, -1);
}

/**
 * Copies mb values from src[from..] to dst[to..] (one loop per function; see DEVELOPERS.md,
 * "Writing hot loops").
 * @param firstRow the row of src[from], for the error
 * @param column the column of X, or -1 for y, for the error
 * @throws RangeError naming row and column when a value is NaN or infinite
 */
function copyColumnChecked(src: Float64Array, from: number, dst: Float64Array, to: number, mb: number, firstRow: number, column: number): void {
  for (let i = 0; i < mb; i++) {
    const v = src[from + i];
    if (!Number.isFinite(v)) throw notFinite(firstRow + i, column, v);
    dst[to + i] = v;
  }
}

/** The error for a value of X (row, column) or of y (column -1) that is NaN or infinite. */
function notFinite(row: number, column: number, value: number): RangeError {
  const what = column < 0 ? `y at row ${row}` : `X at row ${row}, column ${column}`;
  return new RangeError(`addRows: ${what} must be a finite number, got ${String(value)}`);
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
