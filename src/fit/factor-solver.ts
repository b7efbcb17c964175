/**
 * Rank decisions and solves with a p x p upper-triangular factor R of a design X = Q R.
 *
 * Rank is decided on the column-scaled factor R D^-1 (D = diag of column norms, which equal the
 * design's column norms because ||X e_j|| = ||R e_j||): Householder QR is column-scaling
 * invariant, so the scaled singular values measure collinearity without being fooled by units.
 * Tolerance: a singular value counts when s_i > max(n, p) * eps * s_max (the rule of LAPACK's
 * xGELSS / numpy `matrix_rank`, applied here to the scaled factor; eps = 2^-52).
 */
import { svd, type Svd } from './svd.js';

/** Singular values and rank of the column-scaled factor. */
export interface ScaledSpectrum {
  /** Column 2-norms of R (= of the design); 0 for an all-zero column. */
  columnNorms: Float64Array;
  /** Singular values of R D^-1, descending (a zero column stays zero). */
  singularValues: Float64Array;
  /** Right singular vectors of R D^-1, p x p column-major; column c belongs to singularValues[c]. */
  V: Float64Array;
  /** Relative cutoff used: max(rows, p) * eps * s_max. */
  tolerance: number;
  /** Number of singular values above the cutoff. */
  rank: number;
}

/**
 * Column norms and the SVD of the column-scaled factor, with the numerical rank.
 *
 * @param R p x p upper-triangular, column-major
 * @param p columns (>= 1)
 * @param rows rows the factor stands for (enters the tolerance max(rows, p) * eps * s_max)
 */
export function scaledSpectrum(R: Float64Array, p: number, rows: number): ScaledSpectrum {
  const columnNorms = new Float64Array(p);
  const scaled = new Float64Array(p * p);
  for (let j = 0; j < p; j++) {
    let amax = 0;
    for (let i = 0; i <= j; i++) amax = Math.max(amax, Math.abs(R[j * p + i]));
    let ss = 0;
    if (amax > 0) for (let i = 0; i <= j; i++) ss += (R[j * p + i] / amax) ** 2;
    const d = amax * Math.sqrt(ss);
    columnNorms[j] = d;
    const div = d > 0 ? d : 1;
    for (let i = 0; i <= j; i++) scaled[j * p + i] = R[j * p + i] / div;
  }
  const { s, V } = svd(scaled, p, p, 'right');
  const tolerance = Math.max(rows, p) * Number.EPSILON * s[0];
  let rank = 0;
  while (rank < p && s[rank] > tolerance) rank++;
  return { columnNorms, singularValues: s, V, tolerance, rank };
}

/**
 * Singular values of the factor as it is (no scaling), descending.
 *
 * @param R p x p column-major
 * @param p columns (>= 1)
 */
export function rawSingularValues(R: Float64Array, p: number): Float64Array {
  return svd(R, p, p, 'none').s;
}

/**
 * Solves with R (p x p upper triangular, column-major) given its numerical rank: triangular
 * substitution when rank = p (most accurate), else the truncated SVD of R keeping the `rank`
 * largest singular values (minimum-norm least-squares solutions, pseudo-inverse products).
 */
export class FactorSolver {
  readonly p: number;
  readonly rank: number;
  readonly #R: Float64Array;
  readonly #svd: Svd | undefined;

  /**
   * @param R p x p upper-triangular factor, column-major (not copied: do not change it while in use)
   * @param p columns
   * @param rank numerical rank from {@link scaledSpectrum} (0..p)
   */
  constructor(R: Float64Array, p: number, rank: number) {
    this.p = p;
    this.rank = rank;
    this.#R = R;
    this.#svd = rank < p && rank > 0 ? svd(R, p, p) : undefined;
  }

  /** w = R^+ b (back-substitution R w = b when full rank). Length p in, length p out. */
  solve(b: ArrayLike<number>): Float64Array {
    const p = this.p;
    const R = this.#R;
    const w = new Float64Array(p);
    if (this.rank === p) {
      for (let j = p - 1; j >= 0; j--) {
        let t = b[j];
        for (let k = j + 1; k < p; k++) t -= R[k * p + j] * w[k];
        w[j] = t / R[j * p + j];
      }
      return w;
    }
    const dec = this.#svd;
    if (dec === undefined) return w; // rank 0: the minimum-norm solution is zero
    for (let c = 0; c < this.rank; c++) {
      let t = 0;
      for (let i = 0; i < p; i++) t += dec.U[c * p + i] * b[i];
      t /= dec.s[c];
      for (let i = 0; i < p; i++) w[i] += dec.V[c * p + i] * t;
    }
    return w;
  }

  /**
   * z with ||z||^2 = x^T (R^T R)^+ x: z = R^-T x by forward substitution when full rank, else
   * S_r^-1 V_r^T x from the truncated SVD. Its squared norm is the leverage of row x.
   *
   * @param x a row of the design, length p
   * @param z output, length p (entries beyond the rank are set to 0)
   */
  whiten(x: ArrayLike<number>, z: Float64Array): Float64Array {
    const p = this.p;
    const R = this.#R;
    if (this.rank === p) {
      for (let j = 0; j < p; j++) {
        let t = x[j];
        for (let k = 0; k < j; k++) t -= R[j * p + k] * z[k];
        z[j] = t / R[j * p + j];
      }
      return z;
    }
    z.fill(0);
    const dec = this.#svd;
    if (dec === undefined) return z;
    for (let c = 0; c < this.rank; c++) {
      let t = 0;
      for (let i = 0; i < p; i++) t += dec.V[c * p + i] * x[i];
      z[c] = t / dec.s[c];
    }
    return z;
  }

  /** (R^T R)^+ g: R^-1 R^-T g when full rank, else V_r S_r^-2 V_r^T g. Length p. */
  solveNormal(g: ArrayLike<number>): Float64Array {
    const p = this.p;
    if (this.rank === p) return this.solve(this.whiten(g, new Float64Array(p)));
    const out = new Float64Array(p);
    const dec = this.#svd;
    if (dec === undefined) return out;
    for (let c = 0; c < this.rank; c++) {
      let t = 0;
      for (let i = 0; i < p; i++) t += dec.V[c * p + i] * g[i];
      t /= dec.s[c] * dec.s[c];
      for (let i = 0; i < p; i++) out[i] += dec.V[c * p + i] * t;
    }
    return out;
  }
}
