/**
 * Singular value decomposition of the small p x p matrices of the fitting engine, by one-sided
 * Jacobi rotations (Hestenes 1958; Demmel & Veselić, "Jacobi's method is more accurate than QR",
 * SIAM J. Matrix Anal. Appl. 13(4), 1992): the columns of A are rotated pairwise until they are
 * mutually orthogonal; their norms are then the singular values, the normalised columns the left
 * singular vectors, and the accumulated rotations the right singular vectors.
 *
 * Why not ml-matrix's SVD (Golub-Kahan-Reinsch as in JAMA): its iteration has no cap, and on
 * factors of rank-deficient designs (all-zero and duplicate columns next to values near the
 * underflow threshold) it was seen to run for minutes without ending. Jacobi sweeps converge
 * quadratically and are capped here (60 sweeps); the matrix is scaled by a power of two (exact)
 * so that its largest entry is about 1, and entries below 2^-600 of it are set to zero.
 */

/** A thin SVD A = U diag(s) V^T of an m x k matrix (m >= k), column-major arrays. */
export interface Svd {
  /** Singular values, descending, length k. */
  s: Float64Array;
  /** Left singular vectors, m x k column-major (U[c*m + r]); empty when not asked for. */
  U: Float64Array;
  /** Right singular vectors, k x k column-major (V[c*k + r]): column c belongs to s[c]; empty when not asked for. */
  V: Float64Array;
}

/** Which singular vectors to return (the work is the same; this only saves copies). */
export type SvdVectors = 'both' | 'right' | 'none';

/** Machine epsilon, read once (a property read at the top of a hot function has no type feedback on its first call). */
const EPSILON = Number.EPSILON;

/** Most Jacobi sweeps; convergence is quadratic, so well-scaled matrices need fewer than 15. */
export const MAX_SWEEPS = 60;

/**
 * SVD of a column-major m x k matrix with m >= k >= 1.
 *
 * @param A column-major m x k (A[j*m + i])
 * @param m rows
 * @param k columns (at most m)
 * @param vectors which singular vectors to return; default both
 * @returns singular values in descending order with the matching vectors
 * @throws RangeError when m < k or k < 1, or when A has a non-finite entry
 */
export function svd(A: Float64Array, m: number, k: number, vectors: SvdVectors = 'both'): Svd {
  if (k < 1 || m < k) throw new RangeError(`svd: need m >= k >= 1, got ${m} x ${k}`);
  const amax = largestMagnitude(A, m * k);
  if (!Number.isFinite(amax)) throw new RangeError('svd: the matrix has a non-finite entry');
  if (amax === 0) return zeroSvd(m, k, vectors);
  const shift = Math.round(Math.log2(amax));
  const W = scaledCopy(A, m * k, 2 ** -shift);
  const V = new Float64Array(k * k);
  for (let c = 0; c < k; c++) V[c * k + c] = 1;
  jacobiSweeps(W, V, m, k);

  // Singular values are the column norms; sort descending.
  const norms = columnNorms(W, m, k);
  const order = Array.from({ length: k }, (_, c) => c).sort((a, b) => norms[b] - norms[a]);
  const s = new Float64Array(k);
  const U = new Float64Array(vectors === 'both' ? m * k : 0);
  const Vout = new Float64Array(vectors === 'none' ? 0 : k * k);
  order.forEach((c, to) => {
    s[to] = norms[c] * 2 ** shift;
    if (U.length > 0 && norms[c] > 0) for (let i = 0; i < m; i++) U[to * m + i] = W[c * m + i] / norms[c];
    if (Vout.length > 0) for (let i = 0; i < k; i++) Vout[to * k + i] = V[c * k + i];
  });
  return { s, U, V: Vout };
}

// The loops below are functions of their own, each a loop nest and its return (see DEVELOPERS.md,
// "Writing hot loops").

/** Largest |a_i| over A[0..n); NaN or Infinity when an entry is not finite. */
function largestMagnitude(A: Float64Array, n: number): number {
  let amax = 0;
  for (let i = 0; i < n; i++) {
    const a = Math.abs(A[i]);
    if (!(a <= amax)) amax = a;
  }
  return amax;
}

/** A[0..n) times `scale` (a power of two, so exact), entries below 2^-600 set to zero. */
function scaledCopy(A: Float64Array, n: number, scale: number): Float64Array {
  const floor = 2 ** -600;
  const W = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const v = A[i] * scale;
    W[i] = Math.abs(v) < floor ? 0 : v;
  }
  return W;
}

/**
 * One-sided Jacobi: rotates column pairs (p, q) of W (m x k), and the same pairs of V (k x k),
 * until every pair of W's columns is orthogonal to machine precision, or {@link MAX_SWEEPS}.
 */
function jacobiSweeps(W: Float64Array, V: Float64Array, m: number, k: number): void {
  const eps = EPSILON;
  for (let sweep = 0; sweep < MAX_SWEEPS; sweep++) {
    let rotated = false;
    for (let p = 0; p < k - 1; p++) {
      const cp = p * m;
      for (let q = p + 1; q < k; q++) {
        const cq = q * m;
        let alpha = 0;
        let beta = 0;
        let gamma = 0;
        for (let i = 0; i < m; i++) {
          const x = W[cp + i];
          const y = W[cq + i];
          alpha += x * x;
          beta += y * y;
          gamma += x * y;
        }
        if (gamma === 0 || Math.abs(gamma) <= eps * Math.sqrt(alpha * beta)) continue;
        rotated = true;
        // Rotation angle that zeroes the (p, q) entry of W^T W (Rutishauser's formulas).
        const zeta = (beta - alpha) / (2 * gamma);
        const t = Math.sign(zeta || 1) / (Math.abs(zeta) + Math.sqrt(1 + zeta * zeta));
        const c = 1 / Math.sqrt(1 + t * t);
        const s = c * t;
        rotate(W, cp, cq, m, c, s);
        rotate(V, p * k, q * k, k, c, s);
      }
    }
    if (!rotated) return;
  }
}

/** Euclidean norms of the k columns of the column-major m x k W. */
function columnNorms(W: Float64Array, m: number, k: number): Float64Array {
  const norms = new Float64Array(k);
  for (let c = 0; c < k; c++) {
    let ss = 0;
    for (let i = 0; i < m; i++) ss += W[c * m + i] ** 2;
    norms[c] = Math.sqrt(ss);
  }
  return norms;
}

/** Rotates the columns of length n starting at `a` and `b` of `M` by the angle with cosine c, sine s. */
function rotate(M: Float64Array, a: number, b: number, n: number, c: number, s: number): void {
  for (let i = 0; i < n; i++) {
    const x = M[a + i];
    const y = M[b + i];
    M[a + i] = c * x - s * y;
    M[b + i] = s * x + c * y;
  }
}

/** The SVD of an m x k zero matrix: zero singular values, unit vectors. */
function zeroSvd(m: number, k: number, vectors: SvdVectors): Svd {
  const U = new Float64Array(vectors === 'both' ? m * k : 0);
  const V = new Float64Array(vectors === 'none' ? 0 : k * k);
  for (let c = 0; c < k; c++) {
    if (U.length > 0) U[c * m + c] = 1;
    if (V.length > 0) V[c * k + c] = 1;
  }
  return { s: new Float64Array(k), U, V };
}
