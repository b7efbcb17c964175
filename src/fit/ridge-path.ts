/**
 * Ridge coefficients for many penalties from one factor: the complexity sweep solves each fold's
 * complement for about 20 penalties, and one SVD per fold serves them all.
 *
 * With the data factor R (p x p, upper triangular) and Q^T y = q, the ridge problem is
 *
 *     min ||R w - q||^2 + lambda ||w_P||^2       (P: the penalised columns)
 *
 * - No unpenalised column: R = U diag(s) V^T gives w = V diag(s_i / (s_i^2 + lambda)) U^T q
 *   (Hastie, Tibshirani & Friedman, The Elements of Statistical Learning, 2nd ed., 2009,
 *   eq. 3.47).
 * - An unpenalised intercept in column 0: R = [r00 r^T; 0 R2]. For any w2 the first row is
 *   solved exactly by w0 = (q0 - r^T w2) / r00, which leaves the plain ridge problem
 *   min ||R2 w2 - q2||^2 + lambda ||w2||^2, solved as above.
 */
import type { QrAccumulator } from './qr-accumulator.js';
import { svd } from './svd.js';

/**
 * Coefficients of every penalty, or null when the penalised columns are not all columns or all
 * but the first, when r00 is 0, or when a penalty is not positive (the caller then solves each
 * penalty on its own).
 *
 * @param data factor of the data rows (not modified)
 * @param lambdas penalties, each > 0
 * @param penalised which columns are penalised (length p)
 * @returns one length-p coefficient array per penalty, in order
 */
export function ridgePath(data: QrAccumulator, lambdas: readonly number[], penalised: ArrayLike<boolean>): Float64Array[] | null {
  const p = data.p;
  if (p === 0 || penalised.length !== p || !lambdas.every((l) => l > 0 && Number.isFinite(l))) return null;
  let free = 0;
  while (free < p && !penalised[free]) free++;
  for (let j = free; j < p; j++) if (!penalised[j]) return null;
  if (free > 1) return null;
  const R = data.R;
  const q = data.qty;
  if (free === 1 && !(R[0] !== 0)) return null;
  // The penalised block R2 (k x k) and its right-hand side q2.
  const k = p - free;
  if (k === 0) return null;
  const out = lambdas.map(() => new Float64Array(p));
  const R2 = new Float64Array(k * k);
  for (let c = 0; c < k; c++) for (let r = 0; r <= c; r++) R2[c * k + r] = R[(c + free) * p + (r + free)];
  let decomposition: ReturnType<typeof svd>;
  try {
    decomposition = svd(R2, k, k, 'both');
  } catch {
    return null;
  }
  const { s, U, V } = decomposition;
  // U^T q2 once.
  const uq = new Float64Array(k);
  for (let c = 0; c < k; c++) {
    let t = 0;
    for (let r = 0; r < k; r++) t += U[c * k + r] * q[r + free];
    uq[c] = t;
  }
  const coef = new Float64Array(k);
  lambdas.forEach((lambda, index) => {
    for (let c = 0; c < k; c++) coef[c] = (s[c] / (s[c] * s[c] + lambda)) * uq[c];
    const w = out[index];
    for (let r = 0; r < k; r++) {
      let t = 0;
      for (let c = 0; c < k; c++) t += V[c * k + r] * coef[c];
      w[r + free] = t;
    }
    if (free === 1) {
      let t = q[0];
      for (let j = 1; j < p; j++) t -= R[j * p] * w[j];
      w[0] = t / R[0];
    }
  });
  if (out.some((w) => w.some((v) => !Number.isFinite(v)))) return null;
  return out;
}
