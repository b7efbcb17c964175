/**
 * Ridge regression as least squares on an augmented system (Hoerl & Kennard 1970,
 * Technometrics 12(1); the augmented-rows form: Hastie, Tibshirani & Friedman, The Elements of
 * Statistical Learning, 2nd ed., exercise 3.12):
 *
 *     minimise ||X w - y||^2 + lambda ||E w||^2   <=>   [X; sqrt(lambda) E] w ~ [y; 0]
 *
 * where E selects the penalised columns (one row e_j^T per penalised column j). Folding these
 * rows into a copy of the data factor keeps the QR route (no normal equations).
 */
import type { QrAccumulator } from './qr-accumulator.js';

/**
 * Checks a penalty and its column mask.
 *
 * @param p number of columns
 * @param ridge lambda (default 0)
 * @param penalised mask of length p (default: every column)
 * @returns lambda and a concrete boolean mask of length p
 * @throws RangeError when lambda is negative or not finite, or the mask has the wrong length
 */
export function checkPenalty(p: number, ridge = 0, penalised?: ArrayLike<boolean>): { lambda: number; mask: boolean[] } {
  if (typeof ridge !== 'number' || !Number.isFinite(ridge) || ridge < 0) {
    throw new RangeError(`ridge must be a finite number >= 0, got ${String(ridge)}`);
  }
  if (penalised !== undefined && penalised.length !== p) {
    throw new RangeError(`penalised must have one entry per column (${p}), got ${penalised.length}`);
  }
  const mask = Array.from({ length: p }, (_, j) => (penalised === undefined ? true : Boolean(penalised[j])));
  return { lambda: ridge, mask };
}

/**
 * The factor of [X; sqrt(lambda) E]: a clone of the data factor with one penalty row per
 * penalised column folded in. The penalty applies to the columns exactly as built (lambda is
 * not rescaled by column norms or row counts).
 *
 * @param data factor of the data rows (not modified)
 * @param lambda penalty >= 0; 0 (or no penalised column) returns a plain clone
 * @param mask length p, true where column j is penalised
 * @returns a new accumulator; its `rows` counts the penalty rows too
 */
export function penalisedFactor(data: QrAccumulator, lambda: number, mask: readonly boolean[]): QrAccumulator {
  const factor = data.clone();
  const p = data.p;
  const cols: number[] = [];
  for (let j = 0; j < p; j++) if (mask[j]) cols.push(j);
  if (lambda === 0 || cols.length === 0) return factor;
  const k = cols.length;
  const E = new Float64Array(k * p);
  const root = Math.sqrt(lambda);
  cols.forEach((j, r) => {
    E[j * k + r] = root;
  });
  factor.addRows(E, new Float64Array(k), k);
  return factor;
}
