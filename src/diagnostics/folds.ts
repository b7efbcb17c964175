/**
 * Assignment of training rows to cross-validation folds.
 */
import type { FoldOrder } from '../config/types.js';
import { permutation, seededRandom } from './random.js';

/** Rows of each fold and the fold of each row. */
export interface Folds {
  /** Number of folds k (at most the number of rows). */
  k: number;
  /** Fold index of each row, length n. */
  foldOf: Int32Array;
  /** Rows in each fold, length k. */
  sizes: number[];
  /** How rows were assigned. */
  order: FoldOrder;
  /** Seed of the shuffle (recorded for `blocks` too, where it is unused). */
  seed: number;
}

/**
 * Fold sizes of k-fold cross-validation on n rows: the first n mod k folds hold floor(n/k) + 1
 * rows, the others floor(n/k) (the split of scikit-learn's `KFold`, documented in its user
 * guide, section 3.1.2.1).
 *
 * @param n rows (>= 0)
 * @param k folds (1 <= k <= max(n, 1))
 */
export function foldSizes(n: number, k: number): number[] {
  const base = Math.floor(n / k);
  const extra = n % k;
  return Array.from({ length: k }, (_, f) => base + (f < extra ? 1 : 0));
}

/**
 * Assigns n rows to k folds. `blocks`: contiguous blocks in file order with {@link foldSizes}
 * (right for rows ordered in time). `shuffled`: the rows are permuted by a Fisher-Yates shuffle
 * driven by {@link seededRandom}(seed), and consecutive runs of the permutation form folds of the
 * same sizes.
 *
 * @param n rows (a non-negative integer)
 * @param k requested folds; reduced to n when n < k (leave-one-out), at least 1
 * @param order `shuffled` (default in descriptors) or `blocks`
 * @param seed seed of the shuffle (default in descriptors: 1)
 * @throws RangeError when n or k is not a non-negative / positive integer
 */
export function assignFolds(n: number, k: number, order: FoldOrder, seed: number): Folds {
  if (!Number.isInteger(n) || n < 0) throw new RangeError(`assignFolds: n must be a non-negative integer, got ${String(n)}`);
  if (!Number.isInteger(k) || k < 1) throw new RangeError(`assignFolds: k must be a positive integer, got ${String(k)}`);
  const kk = Math.max(1, Math.min(k, n));
  const sizes = foldSizes(n, kk);
  const foldOf = new Int32Array(n);
  const perm = order === 'shuffled' ? permutation(n, seededRandom(seed)) : null;
  let pos = 0;
  for (let f = 0; f < kk; f++) pos = markFold(foldOf, perm, pos, sizes[f], f);
  return { k: kk, foldOf, sizes, order, seed };
}

/**
 * Assigns fold f to `size` rows from position `pos` (of the permutation, or the file order when
 * none); returns the next position. One loop per function (see DEVELOPERS.md, "Writing hot loops").
 */
function markFold(foldOf: Int32Array, perm: ArrayLike<number> | null, pos: number, size: number, f: number): number {
  let at = pos;
  for (let c = 0; c < size; c++, at++) foldOf[perm === null ? at : perm[at]] = f;
  return at;
}
