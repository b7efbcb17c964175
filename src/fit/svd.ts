/**
 * Singular value decomposition of the small p x p matrices of the fitting engine, through
 * ml-matrix (Golub-Kahan-Reinsch SVD as in JAMA). The wrapper only ever passes matrices with
 * at least as many rows as columns and sets `autoTranspose`, so ml-matrix's console warning
 * for wide matrices can never reach the log.
 *
 * The iteration of that algorithm has no iteration cap and can fail to converge on entries near
 * the underflow threshold (seen on factors of rank-deficient designs holding values like
 * 1e-300 and subnormals): the wrapper scales the matrix by a power of two so that its largest
 * entry is about 1 (exact) and sets entries below 2^-600 of it to zero, far below what can move a
 * singular value above the rank tolerance (about 1e-16 of the largest), then scales back.
 */
import { Matrix, SingularValueDecomposition } from 'ml-matrix';

/** A thin SVD A = U diag(s) V^T of an m x k matrix (m >= k), column-major arrays. */
export interface Svd {
  /** Singular values, descending, length k. */
  s: Float64Array;
  /** Left singular vectors, m x k column-major (U[c*m + r]). */
  U: Float64Array;
  /** Right singular vectors, k x k column-major (V[c*k + r]): column c belongs to s[c]. */
  V: Float64Array;
}

/**
 * SVD of a column-major m x k matrix with m >= k >= 1.
 *
 * @param A column-major m x k (A[j*m + i])
 * @param m rows
 * @param k columns (at most m)
 * @returns singular values in descending order with the matching vectors
 * @throws RangeError when m < k or k < 1
 */
export function svd(A: Float64Array, m: number, k: number): Svd {
  if (k < 1 || m < k) throw new RangeError(`svd: need m >= k >= 1, got ${m} x ${k}`);
  let amax = 0;
  for (let i = 0; i < m * k; i++) {
    const a = Math.abs(A[i]);
    if (!(a <= amax)) amax = a;
  }
  if (!Number.isFinite(amax)) throw new RangeError('svd: the matrix has a non-finite entry');
  if (amax === 0) return zeroSvd(m, k);
  // Scale by a power of two (exact) so that the largest entry is near 1; flush what is left of
  // entries below 2^-600 to zero.
  const shift = Math.round(Math.log2(amax));
  const scale = 2 ** -shift;
  const floor = 2 ** -600;
  const M = new Matrix(m, k);
  for (let j = 0; j < k; j++) {
    for (let i = 0; i < m; i++) {
      const v = A[j * m + i] * scale;
      M.set(i, j, Math.abs(v) < floor ? 0 : v);
    }
  }
  const dec = new SingularValueDecomposition(M, { autoTranspose: true });
  const diag = dec.diagonal;
  const Um = dec.leftSingularVectors;
  const Vm = dec.rightSingularVectors;
  // Sort descending (ml-matrix already does; this keeps the contract independent of it).
  const order = Array.from({ length: k }, (_, c) => c).sort((a, b) => diag[b] - diag[a]);
  const s = new Float64Array(k);
  const U = new Float64Array(m * k);
  const V = new Float64Array(k * k);
  order.forEach((c, to) => {
    s[to] = Math.max(0, diag[c]) * 2 ** shift;
    for (let i = 0; i < m; i++) U[to * m + i] = Um.get(i, c);
    for (let i = 0; i < k; i++) V[to * k + i] = Vm.get(i, c);
  });
  return { s, U, V };
}

/** The SVD of an m x k zero matrix: zero singular values, unit vectors. */
function zeroSvd(m: number, k: number): Svd {
  const U = new Float64Array(m * k);
  const V = new Float64Array(k * k);
  for (let c = 0; c < k; c++) {
    U[c * m + c] = 1;
    V[c * k + c] = 1;
  }
  return { s: new Float64Array(k), U, V };
}
