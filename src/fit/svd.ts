/**
 * Singular value decomposition of the small p x p matrices of the fitting engine, through
 * ml-matrix (Golub-Kahan-Reinsch SVD as in JAMA). The wrapper only ever passes matrices with
 * at least as many rows as columns and sets `autoTranspose`, so ml-matrix's console warning
 * for wide matrices can never reach the log.
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
  const M = new Matrix(m, k);
  for (let j = 0; j < k; j++) for (let i = 0; i < m; i++) M.set(i, j, A[j * m + i]);
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
    s[to] = Math.max(0, diag[c]);
    for (let i = 0; i < m; i++) U[to * m + i] = Um.get(i, c);
    for (let i = 0; i < k; i++) V[to * k + i] = Vm.get(i, c);
  });
  return { s, U, V };
}
