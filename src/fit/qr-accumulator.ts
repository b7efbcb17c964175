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

import { foldRows } from '../kernels/index.js';

/** Target size of the internal work block in numbers (m x p chunk plus its right-hand side). */
const WORK_NUMBERS = 16384;

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
  /** Rows per piece of a fold (the leading dimension of the kernel's work block). */
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

  /** Folds a column-major m x p block in pieces of at most `#chunk` rows (kernels/qr-fold.ts). */
  #foldAll(X: Float64Array, y: Float64Array, m: number): void {
    const { rss, bad } = foldRows(this.#R, this.#qty, this.#rss, X, y, m, this.p, this.#chunk);
    this.#rss = rss;
    if (bad !== null) throw notFinite(bad.row, bad.column, bad.column < 0 ? y[bad.row] : X[bad.column * m + bad.row]);
  }
}

/** The error for a value of X (row, column) or of y (column -1) that is NaN or infinite. */
function notFinite(row: number, column: number, value: number): RangeError {
  const what = column < 0 ? `y at row ${row}` : `X at row ${row}, column ${column}`;
  return new RangeError(`addRows: ${what} must be a finite number, got ${String(value)}`);
}
