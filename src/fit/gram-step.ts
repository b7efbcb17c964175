/**
 * Newton steps of a logistic fit from the weighted Gram matrix (normal equations) instead of a
 * QR factor, for well-conditioned problems.
 *
 * A pass accumulates the upper triangle of the Gram matrix of the extended block [sqrt(W) X | u]
 * with u_i = (y_i - p_i) / sqrt(W_i): its leading p x p part is X^T W X and its last column the
 * gradient X^T (y - p) of the log-likelihood. A symmetric rank-k update costs about p^2 / 2
 * multiply-adds per row, a Householder fold of the same row about 2 p^2 (Golub & Van Loan,
 * Matrix Computations, 4th ed., sec. 5.3.2 and 5.2.1). Gram matrices of disjoint sets of rows
 * at the same coefficients add exactly as matrices (no down-dating), so the Gram of the rows
 * without one cross-validation fold is the sum of the other folds' Grams.
 *
 * The step d solves (X^T W X + ridge E) d = X^T (y - p) - ridge E w by Cholesky on the
 * symmetrically scaled matrix S = D H D, D = diag(H)^-1/2 (Golub & Van Loan, sec. 4.2). The
 * normal equations square the condition number, so the Gram route is taken only when an upper
 * bound of the 2-norm condition number of S, p trace(S^-1) (lambda_max(S) <= trace(S) = p and
 * 1 / lambda_min(S) <= trace(S^-1)), is at most {@link GRAM_MAX_CONDITION}; the caller then falls
 * back to the QR engine. The step's relative error is then about p eps cond(S) <= 1e-8, which
 * changes the path of Newton's method, never its limit: the optimum is where the gradient, summed
 * row by row and exact up to rounding, vanishes.
 *
 * Under the same bound, the Cholesky factor of the scaled Gram (no penalty) also gives the R
 * factor of the weighted design itself ({@link gramFactor}), for its rank and condition numbers.
 */

/** Largest bound p trace(S^-1) on the condition number of the scaled Hessian for a Gram step (about the square of the design's 3e3). */
export const GRAM_MAX_CONDITION = 1e7;

/**
 * Size of the Gram matrix of a p-column design extended by one column, rounded up to even (the
 * kernel, kernels/gram.ts, works on column pairs; the padding column is zero).
 */
export function gramSize(p: number): number {
  const q = p + 1;
  return q + (q & 1);
}

/** out += a, entry by entry (Gram matrices of disjoint rows at the same coefficients add). */
export function addInto(out: Float64Array, a: Float64Array): void {
  for (let i = 0; i < out.length; i++) out[i] += a[i];
}

/**
 * The Cholesky factor of the symmetrically scaled matrix S = D H D, D = diag(H)^-1/2 (Golub & Van
 * Loan, sec. 4.2), when S is certainly well conditioned: null when a diagonal entry of H is not
 * positive and finite, Cholesky breaks down, or the bound p trace(S^-1) on the 2-norm condition
 * number of S exceeds {@link GRAM_MAX_CONDITION} (trace(S^-1) = ||L^-1||_F^2, by forward
 * substitution for each unit vector).
 * @param H symmetric positive (semi-)definite p x p, column-major, both triangles filled
 * @returns D (length p) and the lower-triangular L (column-major, L[j * p + i] for i >= j) with S = L L^T
 */
export function scaledCholesky(H: Float64Array, p: number): { D: Float64Array; L: Float64Array } | null {
  const D = new Float64Array(p);
  for (let j = 0; j < p; j++) {
    const h = H[j * p + j];
    if (!(h > 0 && Number.isFinite(h))) return null;
    D[j] = 1 / Math.sqrt(h);
  }
  // Cholesky S = L L^T of S = D H D (lower triangle, column-major L[j * p + i], i >= j).
  const L = new Float64Array(p * p);
  for (let j = 0; j < p; j++) {
    for (let i = j; i < p; i++) {
      let s = H[j * p + i] * D[i] * D[j];
      for (let k = 0; k < j; k++) s -= L[k * p + i] * L[k * p + j];
      if (i === j) {
        if (!(s > 0)) return null;
        L[j * p + j] = Math.sqrt(s);
      } else L[j * p + i] = s / L[j * p + j];
    }
  }
  let trace = 0;
  const x = new Float64Array(p);
  for (let c = 0; c < p; c++) {
    for (let i = c; i < p; i++) {
      let s = i === c ? 1 : 0;
      for (let k = c; k < i; k++) s -= L[k * p + i] * x[k];
      x[i] = s / L[i * p + i];
      trace += x[i] * x[i];
    }
  }
  if (!(p * trace <= GRAM_MAX_CONDITION)) return null;
  return { D, L };
}

/**
 * The upper-triangular factor R (p x p, column-major, positive diagonal) with R^T R = X^T W X,
 * the leading p x p part of an extended Gram (no penalty), from the Cholesky factor of its scaled
 * form ({@link scaledCholesky}: R = L^T D^-1), or null when that is not certainly well conditioned.
 * R is the R factor of the weighted design sqrt(W) X up to the signs of its rows (the factor is
 * unique with a positive diagonal), so its singular values and right singular vectors are the
 * design's, as from a QR factor of the same rows up to rounding: forming the Gram perturbs the
 * smallest singular value by about p eps cond(S) / 2 relative (cond(S) = cond(sqrt(W) X D)^2,
 * the squaring of the normal equations, Golub & Van Loan, sec. 5.3.7), against about p eps
 * cond(sqrt(W) X D) for the QR factor: at most about 3e-8 under the bound, about 1e-12 at a
 * scaled condition number of 70 (test/fit/gram-factor.test.ts compares both).
 * @param G extended Gram (size {@link gramSize}(p) squared, upper triangle)
 * @param p design columns (>= 1)
 */
export function gramFactor(G: Float64Array, p: number): Float64Array | null {
  const q = gramSize(p);
  const H = new Float64Array(p * p);
  for (let k = 0; k < p; k++) {
    for (let j = 0; j <= k; j++) {
      H[k * p + j] = G[k * q + j];
      H[j * p + k] = G[k * q + j];
    }
  }
  const scaled = scaledCholesky(H, p);
  if (scaled === null) return null;
  const { D, L } = scaled;
  const R = new Float64Array(p * p);
  for (let j = 0; j < p; j++) for (let i = 0; i <= j; i++) R[j * p + i] = L[i * p + j] / D[j];
  return R;
}

/**
 * The Newton step of a Gram pass, or null when the scaled Hessian is not certainly well
 * conditioned (Cholesky breaks down, a value is not finite, or the bound exceeds
 * {@link GRAM_MAX_CONDITION}): the caller then solves with the QR engine.
 * @param G extended Gram (size {@link gramSize}(p)) at coefficients w
 * @param w the coefficients the Gram was taken at (length p)
 * @returns the new coefficients w + d and the Newton decrement d^T H d
 */
export function gramStep(
  G: Float64Array,
  w: Float64Array,
  ridge: number,
  penalised: readonly boolean[],
): { w: Float64Array; decrement: number } | null {
  const p = w.length;
  const q = gramSize(p);
  // H = X^T W X + ridge E and the right-hand side b = X^T (y - p) - ridge E w.
  const H = new Float64Array(p * p);
  const b = new Float64Array(p);
  for (let k = 0; k < p; k++) {
    for (let j = 0; j <= k; j++) {
      const v = G[k * q + j];
      H[k * p + j] = v;
      H[j * p + k] = v;
    }
    b[k] = G[p * q + k];
    if (penalised[k]) {
      H[k * p + k] += ridge;
      b[k] -= ridge * w[k];
    }
  }
  const scaled = scaledCholesky(H, p);
  if (scaled === null) return null;
  const { D, L } = scaled;
  // S (D^-1 d) = D b.
  const t = new Float64Array(p);
  for (let i = 0; i < p; i++) {
    let s = D[i] * b[i];
    for (let k = 0; k < i; k++) s -= L[k * p + i] * t[k];
    t[i] = s / L[i * p + i];
  }
  for (let i = p - 1; i >= 0; i--) {
    let s = t[i];
    for (let k = i + 1; k < p; k++) s -= L[i * p + k] * t[k];
    t[i] = s / L[i * p + i];
  }
  const next = new Float64Array(p);
  let decrement = 0;
  for (let j = 0; j < p; j++) {
    const d = D[j] * t[j];
    next[j] = w[j] + d;
    let hd = 0;
    for (let k = 0; k < p; k++) hd += H[k * p + j] * D[k] * t[k];
    decrement += d * hd;
  }
  if (!next.every(Number.isFinite)) return null;
  return { w: next, decrement };
}
